// Octave-band level at the listener from the sound power arriving at the run's outlet: the end
// reflection loss is taken off the sound power, then the room equation with the outlet's boundary Q,
// the outlet-listener distance and the room constant of each band.
import { airProperties } from '../air';
import { DB_PER_NEPER, DEFAULT_TEMPERATURE_C, OCTAVE_BANDS_HZ } from '../constants';
import { endReflectionLoss } from '../end-reflection-loss';
import { inputError, requireFinite } from '../input-error';
import { bandCurveAt, bandCurveSlopes } from '../network/band-curve';
import { segmentAttenuation } from '../walls/segment-attenuation';
import { ncCriterionCurveDb } from '../ratings/nc-criterion';
import { equivalentRadiusM, sectionArea, sectionPerimeter } from '../section';
import type { Mounting, RunInput } from '../types';
import { kirchhoffAttenuationNpPerM } from '../wall-losses';
import { boundaryGain, directivityAt } from './boundary-gain';
import { roomBands } from './room-acoustics';
import type { RoomInput } from './room-input';
import { roomEquationDb } from './room-level';

/** The room equation's near field is not modelled: distances below this are taken as this, m (product rule). */
const MIN_DISTANCE_M = 0.1;

export interface OutletLevelBand {
  hz: number;
  /** Sound power into the room after the end reflection loss, dB re 1 pW. */
  soundPowerDb: number;
  endReflectionLossDb: number;
  q: number;
  roomConstantM2: number;
  levelDb: number;
  criterionDb: number;
}

/**
 * Attenuation along the main path per band, dB, segment by segment: walls and lining as the chain
 * carries them (walls/segment-attenuation.ts, each segment capped by flanking) plus the air's boundary
 * layer (Kirchhoff).
 */
export function pathAttenuationDb(run: RunInput, bandsHz: readonly number[] = OCTAVE_BANDS_HZ): number[] {
  const air = airProperties(run.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const wallLosses = run.wallLosses !== false;
  const curves = run.segments.map((segment) => {
    const npPerM = segmentAttenuation(segment, run.walls, wallLosses).npPerM;
    return { npPerM, slopes: bandCurveSlopes(npPerM) };
  });
  return bandsHz.map((hz) =>
    run.segments.reduce((sum, segment, index) => {
      const perimeterM = sectionPerimeter(segment.section);
      const areaM2 = sectionArea(segment.section);
      const wallsDbPerM = bandCurveAt(curves[index].npPerM, curves[index].slopes, hz) * DB_PER_NEPER;
      const airDbPerM = wallLosses ? kirchhoffAttenuationNpPerM(hz, perimeterM, areaM2, air) * DB_PER_NEPER : 0;
      return sum + (wallsDbPerM + airDbPerM) * segment.lengthM;
    }, 0),
  );
}

export function outletMounting(run: RunInput, room: RoomInput): Mounting {
  return room.outletMounting ?? (run.end.kind === 'open' && run.end.flange === 'flanged' ? 'flush' : 'free');
}

/**
 * Levels at the listener. outletSoundPowerDb is the power arriving at the outlet through baselineRun
 * (the run as given); a changed run (a treatment) adds the change of its path attenuation.
 */
export function outletLevels(run: RunInput, room: RoomInput, outletSoundPowerDb: number[], baselineRun: RunInput = run): OutletLevelBand[] {
  if (!Array.isArray(outletSoundPowerDb) || outletSoundPowerDb.length !== OCTAVE_BANDS_HZ.length) {
    throw inputError('outletSoundPowerDb', `must have ${OCTAVE_BANDS_HZ.length} octave-band levels`);
  }
  outletSoundPowerDb.forEach((levelDb, band) => requireFinite(levelDb, `outletSoundPowerDb[${band}]`));
  const lastSection = run.segments[run.segments.length - 1].section;
  const erl = endReflectionLoss(2 * equivalentRadiusM(lastSection), outletMounting(run, room), [...OCTAVE_BANDS_HZ], run.temperatureC);
  const baselineAttenuation = pathAttenuationDb(baselineRun);
  const extraAttenuation = pathAttenuationDb(run).map((attenuation, band) => attenuation - baselineAttenuation[band]);
  const gain = boundaryGain(room.box, room.outlet);
  const bands = roomBands(room.box, room.surfaces, OCTAVE_BANDS_HZ);
  const criterion = ncCriterionCurveDb(room.criterionNc);
  const { outlet, listener } = room;
  const distanceM = Math.max(Math.hypot(outlet.xM - listener.xM, outlet.yM - listener.yM, outlet.zM - listener.zM), MIN_DISTANCE_M);
  return OCTAVE_BANDS_HZ.map((hz, band) => {
    const soundPowerDb = outletSoundPowerDb[band] - extraAttenuation[band] - erl[band];
    const q = directivityAt(gain, hz);
    return {
      hz,
      soundPowerDb,
      endReflectionLossDb: erl[band],
      q,
      roomConstantM2: bands[band].roomConstantM2,
      levelDb: soundPowerDb + roomEquationDb(q, distanceM, bands[band].roomConstantM2),
      criterionDb: criterion[band],
    };
  });
}
