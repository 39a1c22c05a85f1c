// The one place an analysis answer's numbers are rounded, on the way out of the routes (POST
// /api/v1/analyze and the plan results), to the precisions stated in answer-precision.ts. Fields it
// does not know pass through as they are.
import type { Echo, PressureEnvelopePoint, Reflection, ReflectionBand, Resonance, RunAnalysis } from '@/lib/acoustic';
import type { PathPiece, RunResult } from '@/lib/plans/results';
import {
  DELAY_STEP_S, FREQUENCY_STEP_HZ, PHASE_STEP_RAD, POSITION_STEP_M, SPEED_STEP_MPS, toSignificant, toStep,
} from './answer-precision';

const hz = (value: number) => toStep(value, FREQUENCY_STEP_HZ);
const metres = (value: number) => toStep(value, POSITION_STEP_M);
const significant = (value: number) => toSignificant(value);
const orNull = (value: number | null, round: (value: number) => number) => (value === null ? null : round(value));

function roundedBand(band: ReflectionBand): ReflectionBand {
  return { ...band, hz: hz(band.hz), magnitude: significant(band.magnitude), phaseRad: toStep(band.phaseRad, PHASE_STEP_RAD) };
}

function roundedReflection(reflection: Reflection): Reflection {
  const rounded: Reflection = { ...reflection, atM: metres(reflection.atM), bands: reflection.bands.map(roundedBand) };
  if (reflection.bandsWithBranch) rounded.bandsWithBranch = reflection.bandsWithBranch.map(roundedBand);
  return rounded;
}

function roundedEchoes(echo: Echo): Echo {
  return { ...echo, delayS: toStep(echo.delayS, DELAY_STEP_S), amplitude: significant(echo.amplitude) };
}

export function roundedEnvelope(points: readonly PressureEnvelopePoint[]): PressureEnvelopePoint[] {
  const rounded = new Array<PressureEnvelopePoint>(points.length);
  for (let index = 0; index < points.length; index++) {
    rounded[index] = { positionM: metres(points[index].positionM), relative: significant(points[index].relative) };
  }
  return rounded;
}

/** A resonance as plain data; it must carry no lazily computed envelope (see select-envelopes.ts). */
function roundedResonance(resonance: Resonance): Resonance {
  const rounded: Resonance = {
    ...resonance,
    frequencyHz: hz(resonance.frequencyHz),
    q: orNull(resonance.q, significant),
    bandwidthHz: orNull(resonance.bandwidthHz, significant),
    dampingHz: significant(resonance.dampingHz),
    antinodesM: resonance.antinodesM.map(metres),
    nodesM: resonance.nodesM.map(metres),
  };
  if (resonance.pressureEnvelope) rounded.pressureEnvelope = roundedEnvelope(resonance.pressureEnvelope);
  return rounded;
}

export function roundedRunAnalysis(analysis: RunAnalysis): RunAnalysis {
  return {
    ...analysis,
    speedOfSoundMps: toStep(analysis.speedOfSoundMps, SPEED_STEP_MPS),
    lengthM: metres(analysis.lengthM),
    cutoffHz: hz(analysis.cutoffHz),
    endCorrectionM: { ...analysis.endCorrectionM, start: metres(analysis.endCorrectionM.start), end: metres(analysis.endCorrectionM.end) },
    reflections: analysis.reflections.map(roundedReflection),
    resonances: analysis.resonances.map(roundedResonance),
    echoes: analysis.echoes.map(roundedEchoes),
    minHz: hz(analysis.minHz),
    maxHz: hz(analysis.maxHz),
  };
}

function roundedPiece(piece: PathPiece): PathPiece {
  return { ...piece, startM: metres(piece.startM), endM: metres(piece.endM) };
}

/** One run of a plan's results: its analysis as above, its path's places and its fan tones. */
export function roundedRunResult(result: RunResult): RunResult {
  const nearFanTone: Record<number, number | null> = {};
  for (const [order, toneHz] of Object.entries(result.nearFanTone)) nearFanTone[Number(order)] = orNull(toneHz, hz);
  return {
    ...result,
    analysis: result.analysis && roundedRunAnalysis(result.analysis),
    path: result.path.map(roundedPiece),
    fanTonesHz: result.fanTonesHz.map(hz),
    nearFanTone,
  };
}
