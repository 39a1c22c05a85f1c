// Newton's method on D(f) from a seed, with Maehly's deflation of the zeros already found nearby, so that
// it cannot converge onto one of them: the step is 1 / (D'/D - sum 1/(f - z_i)) (Maehly 1954, as in
// Press et al., Numerical Recipes, 3rd ed., section 9.5). Stops once the error left, estimated from the
// shrinking of the steps in the quadratic regime, is below the target. Where D is smooth and far from any
// single zero, Newton crawls by nearly the same step again and again; there the steps are lengthened.
// From the second sample on (the probe's counts as the first), the step goes to the zero of a model that
// also carries the other zeros' background (two-point-step.ts) wherever that agrees with Newton's.
import type { NetworkEvaluator } from '../network/evaluator';
import type { NaturalFrequency } from './natural-frequencies';
import { RatioSample } from './ratio-sample';
import { twoPointZero } from './two-point-step';
import type { ZeroList } from './zero-list';

const MAX_NEWTON_ITERATIONS = 40;
/**
 * Near a close pair of zeros Newton's steps first shrink only linearly (by about half each step, as at a
 * double zero) until they are inside the pair; a seed is abandoned only when its steps shrink slower than this.
 */
const LINEAR_STEP_RATIO = 0.75;
/**
 * Target error of a refined zero, Hz, relative to its frequency (1e-7 Hz at 1 kHz): far below what any
 * result shows (0.1 Hz, Q to two figures) or a deflation needs. Not looser: the oracle test checks each zero
 * by one Newton step of the oracle's own mismatch, which a pole of the input reflection close by magnifies.
 */
const CONVERGED_RELATIVE = 1e-10;
const CONVERGED_FLOOR_HZ = 1e-8;
/** Newton steps shrinking at least this fast are in the quadratic regime, where the error estimate holds. */
const QUADRATIC_STEP_RATIO = 0.1;
/**
 * The error estimate must fall this far below the target: it stands in for one more polishing step (in the
 * quadratic regime the estimate matches the next step within a factor of about two).
 */
const ESTIMATE_MARGIN = 0.1;
/**
 * Steps that repeat (size within REPEAT_SIZE_RATIO of the last, direction within about 25 degrees) mean D'/D is
 * nearly constant along the way: no single zero is near, as below a row of broad, overlapping modes, where each
 * Newton step moves only about spacing / pi. Each repeat doubles the step (a line search along Newton's
 * direction), up to REPEAT_MAX_GROWTH and REPEAT_MAX_STEPS longest steps; near a zero the steps change and plain
 * Newton resumes.
 */
const REPEAT_SIZE_RATIO = 1.25;
const REPEAT_MIN_COSINE = 0.9;
const REPEAT_GROWTH = 2;
const REPEAT_MAX_GROWTH = 64;
const REPEAT_MAX_STEPS = 4;
/** The two-point model's zero is taken only within this many Newton steps of Newton's own prediction. */
const TWO_POINT_TRUST = 1;

const previousSample = new RatioSample();
const currentSample = new RatioSample();
const modelZero = new Float64Array(2);

export interface RefineBounds {
  lowHz: number;
  highHz: number;
  /** Longest Newton step, Hz (about a local mode spacing). */
  maxStepHz: number;
  /** Lowest imaginary part allowed, Hz (slightly below the real axis). */
  floorImHz: number;
  /** Highest damping as a fraction of the real part (Q >= 1 / (2 ratio)). */
  maxDampingRatio: number;
  /** Known zeros within this distance (real part) are deflated. */
  deflationWindowHz: number;
  /** Highest damping allowed, Hz. */
  maxDampingHz: number;
  /** From this iteration on, a seed whose steps stop shrinking is abandoned. */
  patientIterations: number;
}

/**
 * Refined zero from (seedRe, seedIm); previousStepHz is the size of the step that produced the seed, and
 * probe (when held) the deflated D'/D it came from, deflated as the refinement deflates. Null if it fails or leaves bounds.
 */
export function refineZero(evaluator: NetworkEvaluator, seedRe: number, seedIm: number, previousStepHz: number, found: ZeroList, bounds: RefineBounds, probe?: RatioSample): NaturalFrequency | null {
  if (probe) previousSample.copy(probe);
  else previousSample.held = false;
  let zRe = seedRe;
  let zIm = seedIm;
  let previousStepSize = previousStepHz;
  let previousStepRe = 0;
  let previousStepIm = 0;
  let growth = 1;
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
    if (!found.deflate(zRe, zIm, ratioRe, ratioIm, bounds.deflationWindowHz)) return null;
    const deflatedRe = found.ratioRe;
    const deflatedIm = found.ratioIm;
    const ratioNorm = deflatedRe * deflatedRe + deflatedIm * deflatedIm;
    if (ratioNorm === 0) return null;
    let stepRe = -deflatedRe / ratioNorm;
    let stepIm = deflatedIm / ratioNorm;
    currentSample.set(zRe, zIm, deflatedRe, deflatedIm, found.deflatedFirst, found.deflatedLast);
    const sameDeflation = previousSample.firstDeflated === currentSample.firstDeflated && previousSample.lastDeflated === currentSample.lastDeflated;
    if (previousSample.held && sameDeflation && twoPointZero(previousSample, currentSample, modelZero)) {
      const modelStepRe = modelZero[0] - zRe;
      const modelStepIm = modelZero[1] - zIm;
      if (Math.hypot(modelStepRe - stepRe, modelStepIm - stepIm) < TWO_POINT_TRUST * Math.hypot(stepRe, stepIm)) {
        stepRe = modelStepRe;
        stepIm = modelStepIm;
      }
    }
    previousSample.copy(currentSample);
    const stepSize = Math.hypot(stepRe, stepIm);
    const cosine = (stepRe * previousStepRe + stepIm * previousStepIm) / (stepSize * previousStepSize);
    const repeats = iteration > 0 && cosine > REPEAT_MIN_COSINE && stepSize < REPEAT_SIZE_RATIO * previousStepSize && previousStepSize < REPEAT_SIZE_RATIO * stepSize;
    growth = repeats ? Math.min(REPEAT_MAX_GROWTH, REPEAT_GROWTH * growth) : 1;
    previousStepRe = stepRe;
    previousStepIm = stepIm;
    const longestHz = growth > 1 ? REPEAT_MAX_STEPS * bounds.maxStepHz : bounds.maxStepHz;
    const movedHz = growth * stepSize;
    const scale = movedHz > longestHz ? longestHz / stepSize : growth;
    stepRe *= scale;
    stepIm *= scale;
    zRe += stepRe;
    zIm += stepIm;
    if (zRe < bounds.lowHz || zRe > bounds.highHz || zIm > bounds.maxDampingRatio * zRe || zIm < bounds.floorImHz || zIm > bounds.maxDampingHz) return null;
    const toleranceHz = Math.max(CONVERGED_FLOOR_HZ, CONVERGED_RELATIVE * zRe);
    if (stepSize < toleranceHz) return { frequencyHz: zRe, dampingHz: zIm };
    // Quadratic regime: e_(n+1) ~ C e_n^2 with C ~ s_n / s_(n-1)^2, so the error left after this step is
    // ~ s_n^3 / s_(n-1)^2; with a wide margin it replaces one more evaluation.
    const quadratic = stepSize < QUADRATIC_STEP_RATIO * previousStepSize;
    if (quadratic && (stepSize * stepSize * stepSize) / (previousStepSize * previousStepSize) < ESTIMATE_MARGIN * toleranceHz) {
      return { frequencyHz: zRe, dampingHz: zIm };
    }
    // Near a simple zero Newton's steps shrink quadratically; a seed whose steps stop shrinking is abandoned.
    if (iteration >= bounds.patientIterations && stepSize > LINEAR_STEP_RATIO * previousStepSize) return null;
    previousStepSize = stepSize;
  }
  return null;
}
