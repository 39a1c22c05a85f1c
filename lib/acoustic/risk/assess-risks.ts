// Risk flags: duct resonances on fan tones, duct resonances on axial room modes excited or heard at
// the mode's pressure maximum, and predicted octave levels above the room's NC criterion.
import { analyzeRun } from '../analyze-run';
import { bladePassHarmonicsHz } from '../blade-pass';
import { DEFAULT_COINCIDENCE_PERCENT, DEFAULT_NEAR_MAXIMUM_WAVELENGTHS } from '../constants';
import { requireAbove, requireAboveAtMost } from '../input-error';
import { MAX_FAN_BLADES, MAX_FAN_HARMONICS, MAX_FAN_RPM } from '../input-limits';
import { outletLevels } from '../room/outlet-level';
import { roomSpeedOfSound } from '../room/room-acoustics';
import { validateRoomInput, type Point3 } from '../room/room-input';
import { axialRoomModes } from '../room-modes';
import type { Resonance, RoomMode, RunAnalysis } from '../types';
import { coincidenceWindowHz, describeResonance, formatHz, PERCENT } from './coincidence';
import type { RiskFlag, RiskInput, Severity } from './risk-types';

const DEFAULT_HARMONICS = 3;
/** Level flags: more than this over the criterion is high, more than MEDIUM_EXCESS_DB medium (product rule). */
const HIGH_EXCESS_DB = 5;
const MEDIUM_EXCESS_DB = 2;

/** Severity of a resonance on a tone: high inside its -3 dB band, medium within the window at harmonics 1-2, else low. */
function toneSeverity(resonance: Resonance, distanceHz: number, harmonic: number): Severity {
  if (resonance.bandwidthHz === null || distanceHz <= resonance.bandwidthHz / 2) return 'high';
  return harmonic <= 2 ? 'medium' : 'low';
}

function toneFlags(input: RiskInput, analysis: RunAnalysis, percent: number): RiskFlag[] {
  if (!input.fan) return [];
  const harmonics = bladePassHarmonicsHz(
    requireAboveAtMost(input.fan.blades, 0, MAX_FAN_BLADES, 'fan.blades'),
    requireAboveAtMost(input.fan.rpm, 0, MAX_FAN_RPM, 'fan.rpm'),
    requireAboveAtMost(input.fan.harmonics ?? DEFAULT_HARMONICS, 0, MAX_FAN_HARMONICS, 'fan.harmonics'),
  );
  const flags: RiskFlag[] = [];
  harmonics.forEach((toneHz, index) => {
    for (const resonance of analysis.resonances) {
      const distanceHz = Math.abs(resonance.frequencyHz - toneHz);
      const windowHz = coincidenceWindowHz(resonance, toneHz, percent);
      if (distanceHz > windowHz) continue;
      const harmonic = index + 1;
      const tone = harmonic === 1 ? 'blade-pass tone' : `blade-pass harmonic ${harmonic}`;
      flags.push({
        id: `resonance-near-tone:h${harmonic}:${resonance.frequencyHz.toFixed(1)}`,
        kind: 'resonance-near-tone',
        subject: `tone:h${harmonic}`,
        severity: toneSeverity(resonance, distanceHz, harmonic),
        reason: `${describeResonance(resonance)} is ${formatHz(distanceHz)} from the ${formatHz(toneHz)} ${tone} (window ${formatHz(windowHz)}).`,
        targetHz: toneHz,
        resonanceOrder: resonance.order,
        quantity: { valueHz: resonance.frequencyHz, distanceHz, windowHz },
      });
    }
  });
  return flags;
}

/** Distance from the coordinate to the nearest pressure maximum x = mL/n of axial mode n, m. */
function distanceToMaximumM(coordinateM: number, lengthM: number, order: number): number {
  const spacingM = lengthM / order;
  const nearest = Math.round(coordinateM / spacingM) * spacingM;
  return Math.abs(coordinateM - nearest);
}

function roomModeFlags(input: RiskInput, analysis: RunAnalysis, percent: number, nearWavelengths: number): RiskFlag[] {
  if (!input.room) return [];
  const room = input.room;
  const axial = axialRoomModes(room.box, analysis.maxHz * (1 + percent / PERCENT));
  const axes: Array<[keyof Point3, number]> = [['xM', room.box.lengthM], ['yM', room.box.widthM], ['zM', room.box.heightM]];
  const speedMps = roomSpeedOfSound(room.box);
  const flags: RiskFlag[] = [];
  for (const mode of axial as RoomMode[]) {
    const axis = mode.indices.findIndex((index) => index > 0);
    const order = mode.indices[axis];
    const [coordinate, lengthM] = axes[axis];
    const nearM = nearWavelengths * (speedMps / mode.frequencyHz);
    const places = (['outlet', 'listener'] as const).filter((place) => distanceToMaximumM(room[place][coordinate], lengthM, order) <= nearM);
    if (places.length === 0) continue;
    for (const resonance of analysis.resonances) {
      const distanceHz = Math.abs(resonance.frequencyHz - mode.frequencyHz);
      const windowHz = coincidenceWindowHz(resonance, mode.frequencyHz, percent);
      if (distanceHz > windowHz) continue;
      const subject = `room-mode:${mode.indices.join(',')}`;
      flags.push({
        id: `resonance-near-room-mode:${mode.indices.join(',')}:${resonance.frequencyHz.toFixed(1)}`,
        kind: 'resonance-near-room-mode',
        subject,
        // high when both the outlet (excitation) and the listener sit at the mode's maximum, medium for one (product rule)
        severity: places.length === 2 ? 'high' : 'medium',
        reason:
          `${describeResonance(resonance)} is ${formatHz(distanceHz)} from the ${formatHz(mode.frequencyHz)} axial room mode ` +
          `(${mode.indices.join(',')}) (window ${formatHz(windowHz)}); the ${places.join(' and the ')} ${places.length === 2 ? 'sit' : 'sits'} ` +
          `within ${(nearWavelengths * PERCENT).toFixed(1)} % of a wavelength (${nearM.toFixed(2)} m) of its pressure maximum.`,
        targetHz: mode.frequencyHz,
        resonanceOrder: resonance.order,
        quantity: { valueHz: resonance.frequencyHz, distanceHz, windowHz },
      });
    }
  }
  return flags;
}

function levelFlags(input: RiskInput): RiskFlag[] {
  if (!input.room || !input.outletSoundPowerDb) return [];
  return outletLevels(input.run, input.room, input.outletSoundPowerDb, input.baselineRun ?? input.run)
    .filter((band) => band.levelDb > band.criterionDb)
    .map((band) => {
      const excessDb = band.levelDb - band.criterionDb;
      return {
        id: `level-above-criterion:${band.hz}:${band.levelDb.toFixed(1)}`,
        kind: 'level-above-criterion' as const,
        subject: `band:${band.hz}`,
        severity: excessDb > HIGH_EXCESS_DB ? 'high' : excessDb > MEDIUM_EXCESS_DB ? 'medium' : 'low',
        reason: `Predicted ${band.hz} Hz band level ${band.levelDb.toFixed(1)} dB is ${excessDb.toFixed(1)} dB above the NC-${input.room?.criterionNc} curve (${band.criterionDb.toFixed(1)} dB).`,
        targetHz: band.hz,
        quantity: { levelDb: band.levelDb, criterionDb: band.criterionDb },
      };
    });
}

/** Every flag for the input, tone flags first, then room-mode flags, then level flags. */
export function assessRisks(input: RiskInput, analysis: RunAnalysis = analyzeRun(input.run)): RiskFlag[] {
  if (input.room) validateRoomInput(input.room);
  const percent = requireAbove(input.options?.coincidencePercent ?? DEFAULT_COINCIDENCE_PERCENT, 0, 'options.coincidencePercent');
  const nearWavelengths = requireAbove(input.options?.nearMaximumWavelengths ?? DEFAULT_NEAR_MAXIMUM_WAVELENGTHS, 0, 'options.nearMaximumWavelengths');
  return [...toneFlags(input, analysis, percent), ...roomModeFlags(input, analysis, percent, nearWavelengths), ...levelFlags(input)];
}
