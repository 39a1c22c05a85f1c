// Risk flags: duct resonances that meet a fan tone, or an axial room mode excited or heard at the
// mode's pressure maximum, anywhere over the operating envelope (the fan's speed range and the supply
// air's temperature range), graded by what the run's standing waves add there in dB; tones above the
// run's plane-wave cut-off, stated as not assessed; and predicted octave levels above the room's NC criterion.
import { analyzeRun } from '../analyze-run';
import { bladePassHarmonicsHz } from '../blade-pass';
import { DEFAULT_NEAR_MAXIMUM_WAVELENGTHS, DEFAULT_TEMPERATURE_C, GAIN_HIGH_DB, GAIN_LOW_DB, GAIN_MEDIUM_DB } from '../constants';
import { requireAbove, requireAboveAtMost } from '../input-error';
import { MAX_FAN_BLADES, MAX_FAN_HARMONICS, MAX_FAN_RPM } from '../input-limits';
import { outletLevels } from '../room/outlet-level';
import { roomSpeedOfSound } from '../room/room-acoustics';
import { validateRoomInput, type Point3 } from '../room/room-input';
import { axialRoomModes } from '../room-modes';
import type { Resonance, RoomMode, RunAnalysis, RunInput } from '../types';
import { describeResonance, formatHz, PERCENT } from './coincidence';
import { describeEnvelope, operatingEnvelope, temperatureIntervalHz, toneIntervalHz, type OperatingEnvelope } from './operating-envelope';
import type { FlaggedQuantity, RiskFlag, RiskInput, Severity } from './risk-types';
import { RunResponse } from './run-response';

const DEFAULT_HARMONICS = 3;
/** Level flags: more than this over the criterion is high, more than MEDIUM_EXCESS_DB medium (product rule). */
const HIGH_EXCESS_DB = 5;
const MEDIUM_EXCESS_DB = 2;

/** Severity from the dB the run adds over its smooth response; null below the low mark (no flag). */
export function gainSeverity(gainDb: number): Severity | null {
  if (gainDb >= GAIN_HIGH_DB) return 'high';
  if (gainDb >= GAIN_MEDIUM_DB) return 'medium';
  if (gainDb >= GAIN_LOW_DB) return 'low';
  return null;
}

/** How far fr lies outside the interval, Hz (0 inside). */
function outsideBy(frequencyHz: number, [lowHz, highHz]: [number, number]): number {
  return frequencyHz < lowHz ? lowHz - frequencyHz : frequencyHz > highHz ? frequencyHz - highHz : 0;
}

/** The distinct resonances whose -3 dB band overlaps the interval. */
function overlapping(resonances: readonly Resonance[], interval: [number, number]): Resonance[] {
  return resonances.filter((resonance) => !resonance.broadband && outsideBy(resonance.frequencyHz, interval) <= (resonance.bandwidthHz ?? 0) / 2);
}

/** The engine's measurement of one target (a tone or a mode) on a run: the resonance that meets it and the gain over the interval. */
export interface TargetMeasurement {
  resonance: Resonance | null;
  quantity: FlaggedQuantity;
}

export function measureTarget(response: RunResponse, analysis: RunAnalysis, interval: [number, number]): TargetMeasurement {
  const peak = response.peakGain(interval[0], interval[1], analysis.resonances);
  const met = overlapping(analysis.resonances, interval);
  // the resonance nearest the peak (among those that meet the interval, else any distinct one): the one the
  // flag names, and what a treatment would have to keep away
  const centreHz = peak.atHz;
  const nearest = (met.length > 0 ? met : analysis.resonances.filter((resonance) => !resonance.broadband)).reduce<Resonance | null>(
    (best, resonance) => (best === null || Math.abs(resonance.frequencyHz - centreHz) < Math.abs(best.frequencyHz - centreHz) ? resonance : best),
    null,
  );
  const quantity: FlaggedQuantity = { gainDb: peak.gainDb, gainAtHz: peak.atHz, envelopeHz: interval };
  if (nearest) {
    quantity.valueHz = nearest.frequencyHz;
    quantity.distanceHz = outsideBy(nearest.frequencyHz, interval);
    quantity.windowHz = (nearest.bandwidthHz ?? 0) / 2;
  }
  return { resonance: met.length > 0 ? nearest : null, quantity };
}

/** The run's envelope for its fan (the room-mode flags use its temperature range alone). */
export function envelopeOf(input: RiskInput): OperatingEnvelope {
  const fan = input.fan ?? { blades: 1, rpm: 1 };
  return operatingEnvelope(fan, input.run.temperatureC ?? DEFAULT_TEMPERATURE_C, input.options);
}

/** The interval a tone sweeps on the analysed run. */
export function toneInterval(input: RiskInput, toneHz: number): [number, number] {
  return toneIntervalHz(toneHz, input.fan!.rpm, envelopeOf(input), input.run.temperatureC ?? DEFAULT_TEMPERATURE_C);
}

function harmonicsOf(input: RiskInput): number[] {
  const fan = input.fan!;
  return bladePassHarmonicsHz(
    requireAboveAtMost(fan.blades, 0, MAX_FAN_BLADES, 'fan.blades'),
    requireAboveAtMost(fan.rpm, 0, MAX_FAN_RPM, 'fan.rpm'),
    requireAboveAtMost(fan.harmonics ?? DEFAULT_HARMONICS, 0, MAX_FAN_HARMONICS, 'fan.harmonics'),
  );
}

const toneName = (harmonic: number) => (harmonic === 1 ? 'blade-pass tone' : `blade-pass harmonic ${harmonic}`);

function toneFlags(input: RiskInput, analysis: RunAnalysis, response: () => RunResponse): RiskFlag[] {
  const fan = input.fan;
  if (!fan) return [];
  const envelope = envelopeOf(input);
  const flags: RiskFlag[] = [];
  harmonicsOf(input).forEach((toneHz, index) => {
    const harmonic = index + 1;
    const interval = toneInterval(input, toneHz);
    const range = `${formatHz(interval[0])}–${formatHz(interval[1])}`;
    if (interval[1] > analysis.cutoffHz) {
      flags.push({
        id: `tone-above-cutoff:h${harmonic}`,
        kind: 'tone-above-cutoff',
        subject: `tone:h${harmonic}`,
        severity: 'low',
        reason:
          `The ${formatHz(toneHz)} ${toneName(harmonic)} reaches ${range} over the operating envelope (${describeEnvelope(envelope)}), ` +
          `above the run's plane-wave cut-off of ${formatHz(analysis.cutoffHz)}: cross-modes carry it there and it is not assessed here.`,
        targetHz: toneHz,
        quantity: { envelopeHz: interval },
      });
      return;
    }
    if (overlapping(analysis.resonances, interval).length === 0) return;
    const measured = measureTarget(response(), analysis, interval);
    const severity = gainSeverity(measured.quantity.gainDb ?? -Infinity);
    if (severity === null || measured.resonance === null) return;
    const resonance = measured.resonance;
    flags.push({
      id: `resonance-near-tone:h${harmonic}:${resonance.frequencyHz.toFixed(1)}`,
      kind: 'resonance-near-tone',
      subject: `tone:h${harmonic}`,
      severity,
      reason:
        `${describeResonance(resonance)} meets the ${toneName(harmonic)} (${formatHz(toneHz)} at ${Math.round(fan.rpm)} rpm), which sweeps ${range} over the operating envelope ` +
        `(${describeEnvelope(envelope)}): the run adds up to ${(measured.quantity.gainDb ?? 0).toFixed(1)} dB there over its smooth response.`,
      targetHz: toneHz,
      resonanceOrder: resonance.order,
      quantity: measured.quantity,
    });
  });
  return flags;
}

/** Distance from the coordinate to the nearest pressure maximum x = mL/n of axial mode n, m. */
function distanceToMaximumM(coordinateM: number, lengthM: number, order: number): number {
  const spacingM = lengthM / order;
  const nearest = Math.round(coordinateM / spacingM) * spacingM;
  return Math.abs(coordinateM - nearest);
}

function roomModeFlags(input: RiskInput, analysis: RunAnalysis, nearWavelengths: number, response: () => RunResponse): RiskFlag[] {
  if (!input.room) return [];
  const room = input.room;
  const envelope = envelopeOf(input);
  const runTemperatureC = input.run.temperatureC ?? DEFAULT_TEMPERATURE_C;
  const axial = axialRoomModes(room.box, analysis.maxHz);
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
    // the room's air keeps its mode where it is; the run's supply air moves the duct's resonances
    const interval = temperatureIntervalHz(mode.frequencyHz, envelope, runTemperatureC);
    if (overlapping(analysis.resonances, interval).length === 0) continue;
    const measured = measureTarget(response(), analysis, interval);
    if (measured.resonance === null || gainSeverity(measured.quantity.gainDb ?? -Infinity) === null) continue;
    const resonance = measured.resonance;
    flags.push({
      id: `resonance-near-room-mode:${mode.indices.join(',')}:${resonance.frequencyHz.toFixed(1)}`,
      kind: 'resonance-near-room-mode',
      subject: `room-mode:${mode.indices.join(',')}`,
      // high when both the outlet (excitation) and the listener sit at the mode's maximum, medium for one (product rule)
      severity: places.length === 2 ? 'high' : 'medium',
      reason:
        `${describeResonance(resonance)} meets the ${formatHz(mode.frequencyHz)} axial room mode (${mode.indices.join(',')}) ` +
        `with the supply air at ${envelope.lowTemperatureC.toFixed(0)}–${envelope.highTemperatureC.toFixed(0)} °C, adding up to ${(measured.quantity.gainDb ?? 0).toFixed(1)} dB there; ` +
        `the ${places.join(' and the ')} ${places.length === 2 ? 'sit' : 'sits'} within ${(nearWavelengths * PERCENT).toFixed(1)} % of a wavelength (${nearM.toFixed(2)} m) of its pressure maximum.`,
      targetHz: mode.frequencyHz,
      resonanceOrder: resonance.order,
      quantity: measured.quantity,
    });
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

/** The run's response, built once per run and reused by every flag and treatment on it. */
const responses = new WeakMap<RunInput, RunResponse>();

export function responseOf(run: RunInput): RunResponse {
  let response = responses.get(run);
  if (!response) {
    response = new RunResponse(run);
    responses.set(run, response);
  }
  return response;
}

/** Every flag for the input, tone flags first, then room-mode flags, then level flags. */
export function assessRisks(input: RiskInput, analysis: RunAnalysis = analyzeRun(input.run)): RiskFlag[] {
  if (input.room) validateRoomInput(input.room);
  const nearWavelengths = requireAbove(input.options?.nearMaximumWavelengths ?? DEFAULT_NEAR_MAXIMUM_WAVELENGTHS, 0, 'options.nearMaximumWavelengths');
  const response = () => responseOf(input.run);
  return [...toneFlags(input, analysis, response), ...roomModeFlags(input, analysis, nearWavelengths, response), ...levelFlags(input)];
}
