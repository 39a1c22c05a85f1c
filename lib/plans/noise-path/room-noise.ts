// The noise in a room from every outlet that feeds it, at every listener: each outlet's path from its
// own fan (read off the drawing), into the room by the room's correction (Schultz's relation when
// furnished, the room equation with its own absorption when bare), summed by energy at each listener
// (the decibel sum of incoherent sources, 10 log10 Σ 10^(L/10)); ratings, the criterion and the margin
// per band at each listener, the band that governs, and the bands below the Schroeder frequency.
import {
  aWeightedLevelDb, bandsBelowSchroederHz, NC_CURVES, ncCriterionCurveDb, ncRating, noisePath, nrRating, OCTAVE_BANDS_HZ, roomBands, roomEquationCorrectionDb,
  schroederFrequencyHz, schroederWarning, sumLevelsDb, SURFACE_NAMES, type NoisePathStep, type PathElement, type RoomSurfaces,
} from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { planLabels } from '@/lib/plan/labels';
import { roomListeners, roomOutlets } from '@/lib/plan/rooms/room-places';
import type { PlanRoom, RoomCorrectionChoice } from '@/lib/plan/rooms/room-types';
import { deriveOutletPath, listenerDistanceM, type PathElementSource } from './derive-path';
import type { FanSpeedChange } from './fan-start';

/** The Schroeder frequency takes the mean T60 of these bands (as the room analysis does; common practice, from memory). */
const MID_BANDS = [3, 4];

export interface OutletPath {
  /** 'outlet' for the room's first outlet, else the further outlet's id. */
  outletId: string;
  nodeId: string;
  /** "Outlet A3 end". */
  label: string;
  runId: string;
  runName: string;
  /** As typed into the run, dB re 1 pW. */
  fanSoundPowerDb: number[];
  /** The fan laws' change to the top of the fan's speed range, when it has one. */
  fanSpeed: FanSpeedChange | null;
  /** What the path starts from: the fan's sound power at its loudest speed. */
  startPowerDb: number[];
  elements: PathElement[];
  sources: PathElementSource[];
  steps: NoisePathStep[];
  /** Sound power into the room after the last element. */
  powerIntoRoomDb: number[];
  warnings: string[];
}

export interface ListenerContribution {
  outletId: string;
  distanceM: number;
  /** Lp - Lw of this outlet at this listener. */
  roomCorrectionDb: number[];
  levelDb: number[];
}

export interface ListenerLevel {
  listenerId: string;
  name: string;
  contributions: ListenerContribution[];
  /** Energy sum over the outlets, dB re 20 µPa. */
  levelDb: number[];
  nc: number;
  nr: number;
  dba: number;
  /** Criterion minus level per band (negative where the level is above it). */
  marginDb: number[];
  /** The band with the least margin. */
  governingHz: number;
}

export interface RoomNoise {
  correction: RoomCorrectionChoice;
  criterionNc: number;
  criterionDb: number[];
  outlets: OutletPath[];
  listeners: ListenerLevel[];
  /** The listener with the least margin anywhere. */
  worstListenerId: string;
  schroederHz: number;
  bandsBelowSchroederHz: number[];
  /** In words: Schroeder bands, extrapolated ratings, limited figures, outlets not yet fed. */
  warnings: string[];
}

const LOWEST_NC = NC_CURVES[0].rating;
const HIGHEST_NC = NC_CURVES[NC_CURVES.length - 1].rating;

function ncWords(name: string, nc: number): string[] {
  if (nc < LOWEST_NC) return [`At ${name} the level lies below NC-${LOWEST_NC}, the lowest published curve: NC ${nc.toFixed(0)} is extrapolated, a rough figure only.`];
  if (nc > HIGHEST_NC) return [`At ${name} the level lies above NC-${HIGHEST_NC}, the highest published curve: NC ${nc.toFixed(0)} is extrapolated, a rough figure only.`];
  return [];
}

function surfacesOf(room: PlanRoom): RoomSurfaces {
  return Object.fromEntries(SURFACE_NAMES.map((name) => [name, [...room.surfaces[name].absorption]])) as RoomSurfaces;
}

/** Schroeder frequency of the room, Hz, from the mean Sabine T60 (with the air) of the 500 Hz and 1 kHz bands. */
function roomSchroederHz(room: PlanRoom): number {
  const box = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const bands = roomBands(box, surfacesOf(room), OCTAVE_BANDS_HZ);
  const t60 = MID_BANDS.reduce((sum, band) => sum + bands[band].reverberationTimeS, 0) / MID_BANDS.length;
  return Number.isFinite(t60) ? schroederFrequencyHz(t60, room.lengthM * room.widthM * room.heightM) : Infinity;
}

/** Every outlet's path and every listener's level. Throws PlanError (or the engine's RangeError) when an outlet with a run end has no path. */
export function roomNoise(doc: PlanDocument, metresPerPixel: number, room: PlanRoom): RoomNoise {
  const labels = planLabels(doc);
  const correction = room.roomCorrection ?? 'furnished';
  const volumeM3 = room.lengthM * room.widthM * room.heightM;
  const box = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const surfaces = correction === 'bare' ? surfacesOf(room) : null;
  const places = roomOutlets(room);
  const fed = places.filter((place, index) => index === 0 || place.nodeId !== null);
  const warnings: string[] = places.flatMap((place, index) => (index > 0 && place.nodeId === null ? [`Outlet ${index + 1} has no run end chosen yet: it is left out until one feeds it.`] : []));
  const listeners = roomListeners(room);
  const outlets: OutletPath[] = [];
  const contributions = new Map<string, ListenerContribution[]>(listeners.map((listener) => [listener.id, []]));
  for (const place of fed) {
    const path = deriveOutletPath(doc, metresPerPixel, room, place.nodeId, labels);
    let steps: NoisePathStep[] = [];
    const pathWarnings = new Set<string>();
    for (const listener of listeners) {
      const distanceM = listenerDistanceM(place, listener);
      const correctionDb = surfaces ? roomEquationCorrectionDb({ box, surfaces, outlet: place, listener }) : undefined;
      const result = noisePath({ soundPowerDb: path.fan.startPowerDb, elements: path.elements, temperatureC: path.temperatureC, room: { volumeM3, distanceM, ...(correctionDb ? { correctionDb } : {}) } });
      steps = result.steps;
      // NC of one outlet alone is not the room's; the listener's own NC is rated on the sum below
      for (const warning of result.warnings) if (!warning.startsWith('NC ')) pathWarnings.add(warning);
      contributions.get(listener.id)!.push({ outletId: place.id, distanceM, roomCorrectionDb: result.roomCorrectionDb, levelDb: result.listenerDb });
    }
    outlets.push({
      outletId: place.id, nodeId: path.outletNodeId, label: path.outletLabel, runId: path.runId, runName: path.runName,
      fanSoundPowerDb: path.fan.fanSoundPowerDb, fanSpeed: path.fan.speed, startPowerDb: path.fan.startPowerDb,
      elements: path.elements, sources: path.sources, steps, powerIntoRoomDb: steps.at(-1)?.powerDb ?? path.fan.startPowerDb, warnings: [...pathWarnings],
    });
  }
  if (outlets.length === 0) throw new PlanError(`${room.name}: no run feeds it yet; choose the run end that is its outlet.`, { roomId: room.id });
  const criterionDb = ncCriterionCurveDb(room.criterionNc);
  const levels: ListenerLevel[] = listeners.map((listener) => {
    const parts = contributions.get(listener.id)!;
    // energy sum of the outlets at this listener, band by band (definition of the decibel, ISO 80000-8)
    const levelDb = OCTAVE_BANDS_HZ.map((_, band) => sumLevelsDb(parts.map((part) => part.levelDb[band])));
    const marginDb = levelDb.map((value, band) => criterionDb[band] - value);
    const governing = marginDb.reduce((best, margin, band) => (margin < marginDb[best] ? band : best), 0);
    return { listenerId: listener.id, name: listener.name, contributions: parts, levelDb, nc: ncRating(levelDb), nr: nrRating(levelDb), dba: aWeightedLevelDb(levelDb), marginDb, governingHz: OCTAVE_BANDS_HZ[governing] };
  });
  const worst = levels.reduce((least, level) => (Math.min(...level.marginDb) < Math.min(...least.marginDb) ? level : least));
  const schroederHz = roomSchroederHz(room);
  const schroeder = schroederWarning(schroederHz);
  return {
    correction, criterionNc: room.criterionNc, criterionDb, outlets, listeners: levels, worstListenerId: worst.listenerId,
    schroederHz, bandsBelowSchroederHz: bandsBelowSchroederHz(schroederHz),
    warnings: [...(schroeder ? [schroeder] : []), ...warnings, ...levels.flatMap((level) => ncWords(level.name, level.nc)), ...outlets.flatMap((outlet) => outlet.warnings.map((warning) => `${outlet.label}: ${warning}`))],
  };
}
