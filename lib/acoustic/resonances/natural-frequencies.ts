// Natural frequencies of the network: the complex zeros f = fr + j fi of the characteristic function
// D(f) of network/evaluator.ts (time convention exp(+j omega t), so damped modes have fi > 0).
//
// Method: a march of probes, two per local mode spacing, at the height (damping) of the zeros found
// last: there the zeros' own terms dominate D'/D even when the modes are broad and overlap (on the
// real axis a long lossy run's D'/D is nearly constant and shows no zero at all). Where broad modes of
// low Q have lifted the probes, a second probe looks from the real axis for sharp ones beneath. At each
// probe one pass along the chain gives D and D'. The logarithmic derivative D'/D is deflated by the zeros already
// found near the probe (Maehly: subtract 1/(f - z_i)), so the Newton prediction
// f - 1/(D'/D - sum 1/(f - z_i)) points at the nearest zero not yet found. A prediction within the
// probe's claim window (or further back, over ground the earlier probes covered: a zero their
// predictions overshot, if it still points there once the known zeros further around are deflated too)
// is refined by Newton's method on the deflated function (newton-refine.ts, with two-point steps that
// carry the other zeros' background, the probe's sample the first of them), which cannot return to a
// known zero. Each new zero is deflated from the same probe's ratio at no extra cost and the probe
// predicts again, so a close pair or a cluster of branch modes is found from one probe.
//
// What it promises: every zero damped less than half the run's mean mode spacing (fi < c / 4L, a modal
// overlap 2 fi / spacing under 1: modes that stand clear of each other) is found, once. More damped zeros
// are reported when a probe's prediction reaches them, which it does less surely the more they overlap.
// Checked against an independent count of the zeros (the argument principle) and the mathjs oracle over
// 500 random supply runs (tests/unit/acoustic/oracle/zero-count.test.ts). Up to the full spacing the same
// count over 2000 runs of four draws (the test's and three others) found all but two, damped 0.83 and 0.85
// spacings.
//
// The local mode spacing is the mean gap of the last few zeros (bounded to a quarter and twice
// the run's mean spacing c / (2 L)), so the probes follow the density of modes as it changes along
// frequency (sections that change, branch modes): no fixed scan step to refine. A zero costs about 2.5
// probes and 3 to 4.5 refinement steps, and 0.5 to 3 more on predictions that lead nowhere, the most on
// long sheet-metal runs (bench/search.bench.ts prints the count), each one pass along the chain, so an
// analysis costs about (segments x resonances) work.

import { BROADBAND_Q } from '../constants';
import type { NetworkEvaluator } from '../network/evaluator';
import { refineZero, type RefineBounds } from './newton-refine';
import { RatioSample } from './ratio-sample';
import { ZeroList } from './zero-list';

/** The promise: every zero damped less than this fraction of the run's mean mode spacing c / 2L is found. */
export const PROMISED_DAMPING_SPACINGS = 0.5;

export interface NaturalFrequency {
  frequencyHz: number;
  dampingHz: number;
}

export interface NaturalFrequencySearch {
  minHz: number;
  maxHz: number;
  /** The run's mean mode spacing, c / (2 L) with L every segment's length plus end corrections, Hz. */
  modeSpacingHz: number;
}

/** Probes per local mode spacing. */
const PROBES_PER_SPACING = 2;
/** A probe claims a predicted zero whose real part lies within this many probe steps of it. */
const CLAIM_WINDOW_STEPS = 0.75;
/**
 * A prediction that points back, over ground the earlier probes covered, is claimed from further away: it
 * means a zero those probes' predictions overshot (an isolated mode between two probes, or the second of
 * a close pair), and a zero already known there is deflated, so it cannot be one of those.
 */
const BACKWARD_CLAIM_STEPS = 2;
/**
 * A backward prediction is refined only if deflating the known zeros within this many steps of the probe
 * (not only those within PREDICTION_DEFLATION_STEPS) leaves it where it was (within BACKWARD_CHECK_SHIFT times
 * its length): one that moves further was pulled back by known zeros just outside the prediction's deflation
 * window, not by a zero the earlier probes overshot. The check costs no evaluation.
 */
const BACKWARD_CHECK_DEFLATION_STEPS = 4;
const BACKWARD_CHECK_SHIFT = 1;
/** Newton steps a refinement may take before steps that stop shrinking abandon it (broad modes may wander first). */
const PATIENT_ITERATIONS = 6;
/** A backward prediction is a long shot: its refinement is abandoned as soon as its steps stop shrinking. */
const BACKWARD_PATIENT_ITERATIONS = 2;
/** Zeros found from one probe at most (a cluster of close modes). */
const MAX_CLAIMS_PER_PROBE = 8;
/** Longest Newton step, in probe steps. */
const MAX_NEWTON_STEP_IN_STEPS = 1.5;
/**
 * Known zeros deflated from a probe's ratio: those within this many steps (about 3/4 of a mode
 * spacing), so that the zeros left on either side of the probe roughly balance and the prediction
 * points at the nearest new zero rather than short of it.
 */
const PREDICTION_DEFLATION_STEPS = 1.5;
/** Known zeros deflated during a refinement that fell back to deflation. */
const REFINEMENT_DEFLATION_STEPS = 2;
/** Zeros whose mean gap gives the local spacing. */
const SPACING_ZEROS = 4;
/** Bounds of the local spacing, in mean spacings. */
const MIN_SPACING_FRACTION = 0.25;
const MAX_SPACING_FRACTION = 2;
/**
 * Probes lifted above this fraction of the mean mode spacing by broad modes of low Q (under BROADBAND_Q:
 * open or absorbing ends, say) could pass over a sharp mode beneath them. A second probe on the real axis then
 * looks for it, claims only predictions damped less than the spacing and refines them no higher. Broad modes of high Q (the overlapping modes of long sheet-metal runs) do not call for it.
 */
const LOW_PROBE_TRIGGER_FRACTION = 0.25;
/** Zeros whose least damping gives the probes' height. */
const HEIGHT_ZEROS = 3;
/** Probes stay below this fraction of their real part. */
const MAX_PROBE_HEIGHT_RATIO = 0.25;
/**
 * Zeros with Q below 1 (fi > fr / 2) are overdamped, not resonances; the search also stays inside that
 * region because far from the real axis the state's terms grow as exp(|Im kL|) and D cancels into rounding noise.
 */
const MIN_QUALITY_FACTOR = 1;
const MAX_DAMPING_RATIO = 1 / (2 * MIN_QUALITY_FACTOR);

/** The local mode spacing and the damping of the zeros found last. */
class ZeroTrack {
  private readonly recentRe: number[] = [];
  private readonly recentIm: number[] = [];
  constructor(private readonly meanSpacingHz: number) {}

  add(frequencyHz: number, dampingHz: number): void {
    this.recentRe.push(frequencyHz);
    this.recentIm.push(dampingHz);
    if (this.recentRe.length > SPACING_ZEROS + 1) this.recentRe.shift();
    if (this.recentIm.length > HEIGHT_ZEROS) this.recentIm.shift();
  }

  spacingHz(): number {
    const known = this.recentRe.length;
    if (known < 2) return this.meanSpacingHz;
    let low = Infinity;
    let high = -Infinity;
    for (const re of this.recentRe) {
      low = Math.min(low, re);
      high = Math.max(high, re);
    }
    const gap = (high - low) / (known - 1);
    return Math.min(MAX_SPACING_FRACTION * this.meanSpacingHz, Math.max(MIN_SPACING_FRACTION * this.meanSpacingHz, gap));
  }

  heightHz(): number {
    if (this.recentIm.length === 0) return 0;
    // The least damped of them: a strongly damped mode among sharp ones must not lift the probes away from the next sharp one.
    return Math.max(0, Math.min(...this.recentIm));
  }
}

/** Whether the probe's Newton step (stepRe, stepIm) stays put when the known zeros within windowHz are deflated from its D'/D. */
function survivesWiderDeflation(found: ZeroList, probeRe: number, probeIm: number, ratioRe: number, ratioIm: number, stepRe: number, stepIm: number, windowHz: number): boolean {
  // A probe on a known zero cannot tell: the prediction is refined, as it would be without the check.
  if (!found.deflate(probeRe, probeIm, ratioRe, ratioIm, windowHz)) return true;
  const wideNorm = found.ratioRe * found.ratioRe + found.ratioIm * found.ratioIm;
  if (wideNorm === 0) return true;
  const wideStepRe = -found.ratioRe / wideNorm;
  const wideStepIm = found.ratioIm / wideNorm;
  return Math.hypot(wideStepRe - stepRe, wideStepIm - stepIm) <= BACKWARD_CHECK_SHIFT * Math.hypot(stepRe, stepIm);
}

/** All natural frequencies with real part in [minHz, maxHz] and Q >= 1, ascending. */
export function findNaturalFrequencies(evaluator: NetworkEvaluator, search: NaturalFrequencySearch): NaturalFrequency[] {
  const { minHz, maxHz, modeSpacingHz } = search;
  const found = new ZeroList();
  const track = new ZeroTrack(modeSpacingHz);
  const bounds: RefineBounds = {
    lowHz: minHz / 4,
    highHz: maxHz + 2 * MAX_SPACING_FRACTION * modeSpacingHz,
    maxStepHz: modeSpacingHz,
    floorImHz: -modeSpacingHz / 2,
    maxDampingRatio: MAX_DAMPING_RATIO,
    deflationWindowHz: 0,
    patientIterations: PATIENT_ITERATIONS,
    maxDampingHz: Infinity,
  };
  const probeSample = new RatioSample();
  let probeRe = Math.max(minHz / 2, minHz - modeSpacingHz / PROBES_PER_SPACING);
  let stepHz = 0;
  let claimWindowHz = 0;
  /** One probe at (probeRe, probeIm): its prediction, and the zeros it claims (damped at most highestHz), refined. */
  const probeAt = (probeIm: number, highestHz: number): void => {
    bounds.maxDampingHz = highestHz;
    evaluator.characteristic(probeRe, probeIm, true);
    const valueNorm = evaluator.valueRe * evaluator.valueRe + evaluator.valueIm * evaluator.valueIm;
    if (valueNorm === 0) {
      // The probe is itself a zero (lossless run): refinement confirms it at once.
      bounds.deflationWindowHz = 0;
      const zero = refineZero(evaluator, probeRe, probeIm, stepHz, found, bounds);
      if (zero !== null && !found.contains(zero.frequencyHz, zero.dampingHz)) {
        found.add(zero.frequencyHz, zero.dampingHz);
        track.add(zero.frequencyHz, zero.dampingHz);
      }
      return;
    }
    const ratioRe = (evaluator.derivativeRe * evaluator.valueRe + evaluator.derivativeIm * evaluator.valueIm) / valueNorm;
    const ratioIm = (evaluator.derivativeIm * evaluator.valueRe - evaluator.derivativeRe * evaluator.valueIm) / valueNorm;
    if (found.deflate(probeRe, probeIm, ratioRe, ratioIm, PREDICTION_DEFLATION_STEPS * stepHz)) {
      let deflatedRe = found.ratioRe;
      let deflatedIm = found.ratioIm;
      for (let claim = 0; claim < MAX_CLAIMS_PER_PROBE; claim++) {
        const ratioNorm = deflatedRe * deflatedRe + deflatedIm * deflatedIm;
        if (ratioNorm === 0) break;
        // Newton prediction f - 1 / (deflated D'/D)
        const stepRe = -deflatedRe / ratioNorm;
        const stepIm = deflatedIm / ratioNorm;
        const predictedRe = probeRe + stepRe;
        const predictedIm = probeIm + stepIm;
        if (stepRe > claimWindowHz || -stepRe > BACKWARD_CLAIM_STEPS * stepHz) break;
        if (predictedIm < -stepHz || predictedIm > MAX_DAMPING_RATIO * predictedRe || predictedIm > highestHz) break;
        const backward = stepRe < -claimWindowHz;
        if (backward && !survivesWiderDeflation(found, probeRe, probeIm, ratioRe, ratioIm, stepRe, stepIm, BACKWARD_CHECK_DEFLATION_STEPS * stepHz)) break;
        const seedIm = Math.max(0, predictedIm);
        const seedStep = Math.hypot(stepRe, stepIm);
        // Newton's method on D deflated by the zeros known near the probe (Maehly), so it cannot land on one of them.
        bounds.deflationWindowHz = REFINEMENT_DEFLATION_STEPS * stepHz;
        bounds.patientIterations = backward ? BACKWARD_PATIENT_ITERATIONS : PATIENT_ITERATIONS;
        // The probe's ratio, deflated as the refinement deflates, is the first sample of its two-point steps.
        probeSample.held = found.deflate(probeRe, probeIm, ratioRe, ratioIm, bounds.deflationWindowHz);
        if (probeSample.held) probeSample.set(probeRe, probeIm, found.ratioRe, found.ratioIm, found.deflatedFirst, found.deflatedLast);
        const zero = refineZero(evaluator, predictedRe, seedIm, seedStep, found, bounds, probeSample);
        if (zero === null || found.contains(zero.frequencyHz, zero.dampingHz)) break;
        found.add(zero.frequencyHz, zero.dampingHz);
        track.add(zero.frequencyHz, zero.dampingHz);
        // Deflate the new zero from this probe's ratio too: 1/(f - z).
        const offsetRe = probeRe - zero.frequencyHz;
        const offsetIm = probeIm - zero.dampingHz;
        const offsetNorm = offsetRe * offsetRe + offsetIm * offsetIm;
        deflatedRe -= offsetRe / offsetNorm;
        deflatedIm += offsetIm / offsetNorm;
      }
    }
  };
  for (;;) {
    stepHz = track.spacingHz() / PROBES_PER_SPACING;
    if (probeRe - CLAIM_WINDOW_STEPS * stepHz > maxHz) break;
    const probeIm = Math.min(track.heightHz(), MAX_PROBE_HEIGHT_RATIO * probeRe);
    bounds.maxStepHz = MAX_NEWTON_STEP_IN_STEPS * stepHz;
    bounds.floorImHz = -stepHz;
    claimWindowHz = CLAIM_WINDOW_STEPS * stepHz;
    probeAt(probeIm, Infinity);
    // Lifted by broad modes of low Q (fi > fr / 2 Q): a second probe looks from the real axis.
    if (probeIm > LOW_PROBE_TRIGGER_FRACTION * modeSpacingHz && probeIm > probeRe / (2 * BROADBAND_Q)) probeAt(0, modeSpacingHz);
    probeRe += stepHz;
  }
  return found
    .toArray()
    .filter((zero) => zero.frequencyHz >= minHz && zero.frequencyHz <= maxHz)
    .filter((zero) => zero.dampingHz <= MAX_DAMPING_RATIO * zero.frequencyHz);
}
