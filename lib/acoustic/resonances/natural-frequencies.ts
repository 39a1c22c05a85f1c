// Natural frequencies of the network: the complex zeros f = fr + j fi of the characteristic function
// D(f) of network/evaluator.ts (time convention exp(+j omega t), so damped modes have fi > 0).
//
// Method: a march along the real axis at scanStepHz (analyze-run.ts uses half the mean mode spacing
// c / (2 L), L the total length of every segment, branches included, plus end corrections). At each
// point one pass along the chain gives D and D'. The logarithmic derivative D'/D is deflated by the
// zeros already found near the point (Maehly: subtract 1/(f - z_i)), so the Newton prediction
// f - 1/(D'/D - sum 1/(f - z_i)) points at the nearest zero not yet found. A prediction within the
// claim window is refined by Newton's method on D (quadratic, and fastest from a good seed: known
// zeros left and right balance); if that lands on a known zero, the refinement is redone on the
// deflated function (step 1 / (D'/D - sum 1/(f - z_i))), which cannot return to one. Each new zero is
// deflated from the same point's ratio at no extra cost and the point predicts again, so a close pair
// is found from one point: no missed or doubled modes. Refinement stops one polishing step after the
// quadratic-convergence error estimate |s_n|^3 / |s_(n-1)|^2 (s the Newton steps) falls below 1e-8 Hz.
// About 4.5 evaluations of D per zero in all, against some 11 for a fine scan with a Newton claim per point.

import type { NetworkEvaluator } from '../network/evaluator';
import { ZeroList } from './zero-list';

export interface NaturalFrequency {
  frequencyHz: number;
  dampingHz: number;
}

export interface NaturalFrequencySearch {
  minHz: number;
  maxHz: number;
  scanStepHz: number;
}

/** A point claims a predicted zero whose real part lies within this many scan steps of it. */
const CLAIM_WINDOW_STEPS = 0.75;
/** Zeros found from one point at most (a cluster of close modes). */
const MAX_CLAIMS_PER_POINT = 8;
const MAX_NEWTON_ITERATIONS = 16;
const MAX_NEWTON_STEP_IN_SCAN_STEPS = 1.5;
/** Target error of a refined zero, Hz (scaled up above 1 kHz). */
const CONVERGED_HZ = 1e-8;
const CONVERGED_REFERENCE_HZ = 1000;
/** Newton steps shrinking at least this fast are in the quadratic regime, where the error estimate holds. */
const QUADRATIC_STEP_RATIO = 0.1;
/**
 * Known zeros deflated from a scan point's ratio: those within this many steps (about 3/4 of a mode
 * spacing), so that the zeros left on either side of the point roughly balance and the prediction
 * points at the nearest new zero rather than short of it.
 */
const PREDICTION_DEFLATION_STEPS = 1.5;
/** Known zeros deflated during a refinement that fell back to deflation. */
const REFINEMENT_DEFLATION_STEPS = 2;
/**
 * Zeros with Q below 1 (fi > fr / 2) are overdamped, not resonances; the search also stays inside that
 * region because far from the real axis the state's terms grow as exp(|Im kL|) and D cancels into rounding noise.
 */
const MIN_QUALITY_FACTOR = 1;
const MAX_DAMPING_RATIO = 1 / (2 * MIN_QUALITY_FACTOR);

interface Bounds {
  lowHz: number;
  highHz: number;
  scanStepHz: number;
}

/** Deflated Newton refinement from (seedRe, seedIm); previousStepHz is the step that produced the seed. */
function refineZero(
  evaluator: NetworkEvaluator,
  seedRe: number,
  seedIm: number,
  previousStepHz: number,
  found: ZeroList,
  bounds: Bounds,
  deflationWindowHz: number,
): NaturalFrequency | null {
  let zRe = seedRe;
  let zIm = seedIm;
  const { lowHz, highHz, scanStepHz } = bounds;
  const maxStep = MAX_NEWTON_STEP_IN_SCAN_STEPS * scanStepHz;
  let previousStepSize = previousStepHz;
  let polishing = false;
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
    const ratioRe = (evaluator.derivativeRe * valueRe + evaluator.derivativeIm * valueIm) / valueNorm;
    const ratioIm = (evaluator.derivativeIm * valueRe - evaluator.derivativeRe * valueIm) / valueNorm;
    if (!found.deflate(zRe, zIm, ratioRe, ratioIm, deflationWindowHz)) return null;
    const deflatedRe = found.ratioRe;
    const deflatedIm = found.ratioIm;
    const ratioNorm = deflatedRe * deflatedRe + deflatedIm * deflatedIm;
    if (ratioNorm === 0) return null;
    let stepRe = -deflatedRe / ratioNorm;
    let stepIm = deflatedIm / ratioNorm;
    const stepSize = Math.hypot(stepRe, stepIm);
    if (stepSize > maxStep) {
      stepRe *= maxStep / stepSize;
      stepIm *= maxStep / stepSize;
    }
    zRe += stepRe;
    zIm += stepIm;
    if (zRe < lowHz || zRe > highHz || zIm > MAX_DAMPING_RATIO * zRe || zIm < -scanStepHz) return null;
    const toleranceHz = CONVERGED_HZ * Math.max(1, zRe / CONVERGED_REFERENCE_HZ);
    if (stepSize < toleranceHz || polishing) return { frequencyHz: zRe, dampingHz: zIm };
    // Quadratic regime: e_(n+1) ~ C e_n^2 with C ~ s_n / s_(n-1)^2, so the error left after this step is
    // ~ s_n^3 / s_(n-1)^2. The estimate can be fooled by a step that happens to be short, so one more
    // Newton step polishes the zero (it squares the error again) before it is returned.
    const quadratic = stepSize < QUADRATIC_STEP_RATIO * previousStepSize;
    if (quadratic && (stepSize * stepSize * stepSize) / (previousStepSize * previousStepSize) < toleranceHz) polishing = true;
    // Near a simple zero Newton's steps shrink quadratically; a seed whose steps stop shrinking is abandoned.
    if (iteration >= 5 && stepSize > 0.5 * previousStepSize) return null;
    previousStepSize = stepSize;
  }
  return null;
}

/** All natural frequencies with real part in [minHz, maxHz], ascending. */
export function findNaturalFrequencies(evaluator: NetworkEvaluator, search: NaturalFrequencySearch): NaturalFrequency[] {
  const { minHz, maxHz, scanStepHz } = search;
  const scanStartHz = Math.max(minHz - scanStepHz, minHz / 2);
  const scanEndHz = maxHz + scanStepHz;
  const bounds: Bounds = {
    lowHz: Math.max(scanStartHz - 2 * scanStepHz, minHz / 4),
    highHz: scanEndHz + 2 * scanStepHz,
    scanStepHz,
  };
  const predictionWindowHz = PREDICTION_DEFLATION_STEPS * scanStepHz;
  const refinementWindowHz = REFINEMENT_DEFLATION_STEPS * scanStepHz;
  const claimWindowHz = CLAIM_WINDOW_STEPS * scanStepHz;
  const pointCount = Math.ceil((scanEndHz - scanStartHz) / scanStepHz) + 1;
  const found = new ZeroList();
  for (let index = 0; index < pointCount; index++) {
    const frequencyHz = scanStartHz + index * scanStepHz;
    evaluator.characteristic(frequencyHz, 0, true);
    const valueNorm = evaluator.valueRe * evaluator.valueRe + evaluator.valueIm * evaluator.valueIm;
    if (valueNorm === 0) {
      // The point is itself a zero (lossless run): refinement confirms it at once.
      const zero = refineZero(evaluator, frequencyHz, 0, scanStepHz, found, bounds, 0);
      if (zero !== null) found.add(zero.frequencyHz, zero.dampingHz);
      continue;
    }
    const ratioRe = (evaluator.derivativeRe * evaluator.valueRe + evaluator.derivativeIm * evaluator.valueIm) / valueNorm;
    const ratioIm = (evaluator.derivativeIm * evaluator.valueRe - evaluator.derivativeRe * evaluator.valueIm) / valueNorm;
    if (!found.deflate(frequencyHz, 0, ratioRe, ratioIm, predictionWindowHz)) continue;
    let deflatedRe = found.ratioRe;
    let deflatedIm = found.ratioIm;
    for (let claim = 0; claim < MAX_CLAIMS_PER_POINT; claim++) {
      const ratioNorm = deflatedRe * deflatedRe + deflatedIm * deflatedIm;
      if (ratioNorm === 0) break;
      // Newton prediction f - 1 / (deflated D'/D)
      const stepRe = -deflatedRe / ratioNorm;
      const stepIm = deflatedIm / ratioNorm;
      const predictedRe = frequencyHz + stepRe;
      if (Math.abs(stepRe) > claimWindowHz) break;
      if (stepIm < -scanStepHz || stepIm > MAX_DAMPING_RATIO * predictedRe) break;
      const seedIm = Math.max(0, stepIm);
      const seedStep = Math.hypot(stepRe, stepIm);
      // Plain Newton first (fastest from a good seed); Maehly's deflation when it lands on a known zero.
      let zero = refineZero(evaluator, predictedRe, seedIm, seedStep, found, bounds, 0);
      if (zero === null || found.contains(zero.frequencyHz, zero.dampingHz)) {
        zero = refineZero(evaluator, predictedRe, seedIm, seedStep, found, bounds, refinementWindowHz);
      }
      if (zero === null || found.contains(zero.frequencyHz, zero.dampingHz)) break;
      found.add(zero.frequencyHz, zero.dampingHz);
      // Deflate the new zero from this point's ratio too: 1/(f - z).
      const offsetRe = frequencyHz - zero.frequencyHz;
      const offsetIm = -zero.dampingHz;
      const offsetNorm = offsetRe * offsetRe + offsetIm * offsetIm;
      deflatedRe -= offsetRe / offsetNorm;
      deflatedIm += offsetIm / offsetNorm;
    }
  }
  return found
    .toArray()
    .filter((zero) => zero.frequencyHz >= minHz && zero.frequencyHz <= maxHz)
    .filter((zero) => zero.dampingHz <= MAX_DAMPING_RATIO * zero.frequencyHz);
}
