// Natural frequencies of the network: the complex zeros f = fr + j fi of the characteristic function
// D(f) of network/evaluator.ts (time convention exp(+j omega t), so damped modes have fi > 0).
//
// Method: a coarse scan along the real axis at about a third of the mean mode spacing c / (2 L),
// L the total length of every segment (branches included) plus end corrections. At each scan point
// one Newton step f - D/D' predicts the nearest zero; a point claims the zero when the prediction
// falls within 0.6 of a scan step of it. Each claimed prediction is then refined by Newton's method on
// D with Maehly's deflation of the zeros already found (the step is 1 / (D'/D - sum 1/(f - z_i))),
// so a second seed near a known zero is driven to its neighbour instead of back to it: close pairs are
// neither doubled nor, as long as both are claimed, missed. A prediction that lands on a zero already
// found (within 0.05 scan steps) is not refined again. D and D' come from one pass along the
// chain that reuses each segment's sin/cos for the derivative. Newton converges quadratically, to
// better than 1e-7 Hz.

import type { NetworkEvaluator } from '../network/evaluator';

export interface NaturalFrequency {
  frequencyHz: number;
  dampingHz: number;
}

export interface NaturalFrequencySearch {
  minHz: number;
  maxHz: number;
  scanStepHz: number;
}

const CLAIM_WINDOW_STEPS = 0.6;
const MAX_NEWTON_ITERATIONS = 16;
/** A prediction this close (in scan steps) to a zero already found is that zero again: not refined. */
const SAME_ZERO_STEPS = 0.05;
const MAX_NEWTON_STEP_IN_SCAN_STEPS = 1.5;
const CONVERGED_HZ = 1e-8;
const DEFLATION_WINDOW_STEPS = 12;
/**
 * Zeros with Q below 1 (fi > fr / 2) are overdamped, not resonances; the search also stays inside that
 * region because far from the real axis the state's terms grow as exp(|Im kL|) and D cancels into rounding noise.
 */
const MIN_QUALITY_FACTOR = 1;
const MAX_DAMPING_RATIO = 1 / (2 * MIN_QUALITY_FACTOR);

function refineZero(
  evaluator: NetworkEvaluator,
  seedRe: number,
  seedIm: number,
  found: NaturalFrequency[],
  scanStepHz: number,
  lowHz: number,
  highHz: number,
): NaturalFrequency | null {
  let zRe = seedRe;
  let zIm = seedIm;
  const maxStep = MAX_NEWTON_STEP_IN_SCAN_STEPS * scanStepHz;
  let previousStepSize = Infinity;
  for (let iteration = 0; iteration < MAX_NEWTON_ITERATIONS; iteration++) {
    evaluator.characteristic(zRe, zIm, true);
    const valueRe = evaluator.valueRe;
    const valueIm = evaluator.valueIm;
    const valueNorm = valueRe * valueRe + valueIm * valueIm;
    if (valueNorm === 0) {
      const exact = evaluator.derivativeRe !== 0 || evaluator.derivativeIm !== 0;
      return exact ? { frequencyHz: zRe, dampingHz: zIm } : null;
    }
    // Logarithmic derivative D'/D, deflated by the zeros already found nearby.
    let ratioRe = (evaluator.derivativeRe * valueRe + evaluator.derivativeIm * valueIm) / valueNorm;
    let ratioIm = (evaluator.derivativeIm * valueRe - evaluator.derivativeRe * valueIm) / valueNorm;
    for (const zero of found) {
      const offsetRe = zRe - zero.frequencyHz;
      if (Math.abs(offsetRe) > DEFLATION_WINDOW_STEPS * scanStepHz) continue;
      const offsetIm = zIm - zero.dampingHz;
      const offsetNorm = offsetRe * offsetRe + offsetIm * offsetIm;
      if (offsetNorm === 0) return null;
      ratioRe -= offsetRe / offsetNorm;
      ratioIm += offsetIm / offsetNorm;
    }
    const ratioNorm = ratioRe * ratioRe + ratioIm * ratioIm;
    if (ratioNorm === 0) return null;
    let stepRe = -ratioRe / ratioNorm;
    let stepIm = ratioIm / ratioNorm;
    const stepSize = Math.hypot(stepRe, stepIm);
    if (stepSize > maxStep) {
      stepRe *= maxStep / stepSize;
      stepIm *= maxStep / stepSize;
    }
    zRe += stepRe;
    zIm += stepIm;
    if (zRe < lowHz || zRe > highHz || zIm > MAX_DAMPING_RATIO * zRe || zIm < -scanStepHz) return null;
    if (stepSize < CONVERGED_HZ * Math.max(1, zRe / 1000)) return { frequencyHz: zRe, dampingHz: zIm };
    // Near a simple zero Newton's steps shrink quadratically; a seed whose steps stop shrinking is abandoned.
    if (iteration >= 5 && stepSize > 0.5 * previousStepSize) return null;
    previousStepSize = stepSize;
  }
  return null;
}

/** All natural frequencies with real part in [minHz, maxHz], ascending. */
export function findNaturalFrequencies(evaluator: NetworkEvaluator, search: NaturalFrequencySearch): NaturalFrequency[] {
  const { minHz, maxHz, scanStepHz } = search;
  const scanStartHz = Math.max(minHz - 2 * scanStepHz, minHz / 2);
  const scanEndHz = maxHz + 2 * scanStepHz;
  const lowHz = Math.max(scanStartHz - 4 * scanStepHz, minHz / 4);
  const highHz = scanEndHz + 4 * scanStepHz;
  const pointCount = Math.ceil((scanEndHz - scanStartHz) / scanStepHz) + 1;
  const seedsRe: number[] = [];
  const seedsIm: number[] = [];
  for (let index = 0; index < pointCount; index++) {
    const frequencyHz = scanStartHz + index * scanStepHz;
    evaluator.characteristic(frequencyHz, 0, true);
    const derivativeNorm = evaluator.derivativeRe * evaluator.derivativeRe + evaluator.derivativeIm * evaluator.derivativeIm;
    if (derivativeNorm === 0) continue;
    // Newton prediction f - D / D'
    const quotientRe = (evaluator.valueRe * evaluator.derivativeRe + evaluator.valueIm * evaluator.derivativeIm) / derivativeNorm;
    const quotientIm = (evaluator.valueIm * evaluator.derivativeRe - evaluator.valueRe * evaluator.derivativeIm) / derivativeNorm;
    const predictedRe = frequencyHz - quotientRe;
    const predictedIm = -quotientIm;
    if (Math.abs(predictedRe - frequencyHz) > CLAIM_WINDOW_STEPS * scanStepHz) continue;
    if (predictedIm < -scanStepHz || predictedIm > MAX_DAMPING_RATIO * predictedRe) continue;
    seedsRe.push(predictedRe);
    seedsIm.push(Math.max(0, predictedIm));
  }
  const found: NaturalFrequency[] = [];
  for (let index = 0; index < seedsRe.length; index++) {
    const known = found.some(
      (zero) => Math.hypot(zero.frequencyHz - seedsRe[index], zero.dampingHz - seedsIm[index]) < SAME_ZERO_STEPS * scanStepHz,
    );
    if (known) continue;
    const zero = refineZero(evaluator, seedsRe[index], seedsIm[index], found, scanStepHz, lowHz, highHz);
    if (zero === null) continue;
    const tolerance = 1e-6 * Math.max(1, zero.frequencyHz);
    const duplicate = found.some(
      (known) => Math.abs(known.frequencyHz - zero.frequencyHz) < tolerance && Math.abs(known.dampingHz - zero.dampingHz) < tolerance,
    );
    if (!duplicate) found.push(zero);
  }
  return found
    .filter((zero) => zero.frequencyHz >= minHz && zero.frequencyHz <= maxHz)
    .filter((zero) => zero.dampingHz <= MAX_DAMPING_RATIO * zero.frequencyHz)
    .sort((first, second) => first.frequencyHz - second.frequencyHz);
}
