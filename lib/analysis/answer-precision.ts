// The precision an analysis answer states its numbers to, applied on the way out (the engine and the
// stored analyses keep full precision). Each is finer than any quantity the model predicts can mean
// (product rule): a resonance frequency to 0.001 Hz, a place along a duct to 0.1 mm, a ratio to four
// significant figures. A new number in an answer gets its precision in lib/analysis/round-answer.ts.

/** frequencyHz, cutoffHz, minHz, maxHz, reflection band hz, fan tones: 0.001 Hz. */
export const FREQUENCY_STEP_HZ = 0.001;
/** lengthM, atM, nodesM, antinodesM, endCorrectionM, envelope positionM, path startM / endM: 0.1 mm. */
export const POSITION_STEP_M = 0.0001;
/** speedOfSoundMps: 1 mm/s. */
export const SPEED_STEP_MPS = 0.001;
/** Echo delayS: 1 µs. */
export const DELAY_STEP_S = 0.000001;
/** Reflection phaseRad: 0.0001 rad. */
export const PHASE_STEP_RAD = 0.0001;
/** q, bandwidthHz, dampingHz, reflection magnitude, echo amplitude, envelope relative: significant figures. */
export const SIGNIFICANT_FIGURES = 4;

/** Decimal places of a step that is a power of ten (0.001 -> 3). */
function decimalsOf(step: number): number {
  return Math.round(-Math.log10(step));
}

const POWERS_OF_TEN = Array.from({ length: 23 }, (_, exponent) => 10 ** exponent);

/**
 * value rounded to a multiple of step (a power of ten at most 1): an integer divided by an exact power of
 * ten gives the double nearest the decimal, so JSON prints it in its short form ("12.3457").
 */
export function toStep(value: number, step: number): number {
  if (!Number.isFinite(value)) return value;
  const scale = POWERS_OF_TEN[decimalsOf(step)];
  return Math.round(value * scale) / scale;
}

/** value rounded to `figures` significant figures (0, NaN and the infinities as they are). */
export function toSignificant(value: number, figures = SIGNIFICANT_FIGURES): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const shift = figures - 1 - exponent;
  if (shift >= 0 && shift < POWERS_OF_TEN.length) return Math.round(value * POWERS_OF_TEN[shift]) / POWERS_OF_TEN[shift];
  if (shift < 0 && -shift < POWERS_OF_TEN.length) return Math.round(value / POWERS_OF_TEN[-shift]) * POWERS_OF_TEN[-shift];
  return Number(value.toPrecision(figures));
}
