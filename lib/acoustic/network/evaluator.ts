// The hot path: runs a compiled network's program at one complex frequency, with hand-written
// complex arithmetic on plain numbers and a preallocated Float64Array stack (no allocation per segment).
//
// State: pressure p and volume velocity U (flowing outward, away from the start end), plus their
// derivatives with respect to frequency. Each outward end starts from the homogeneous state
// (Zc (1 + R), 1 - R), which satisfies p (1 - R) = Zc (1 + R) U. A segment carries the state inward
// with the inverse plane-wave transfer matrix; a tee joins a branch state (pb, Ub) to the path state
// (p, U) as (p pb, U pb + Ub p): the shunt admittance Ub/pb multiplied through by pb, so that
// nothing has a pole. At the start end, with the start reflection Rs,
//   D(f) = p (1 - Rs) + Zc (1 + Rs) U
// vanishes exactly at the natural frequencies of the whole network (complex f, time convention exp(+j omega t)).
import { openEndReflectionInto } from '../terminations';
import { BandCurveWeights } from './band-curve';
import { OP_MOUTH, OP_SEGMENT, OP_SHUNT, OP_TERMINATION, type CompiledNetwork } from './compile';
import { propagateSegments, propagateSegmentsWithDerivative, type WaveFactors } from './propagate-segments';

// Read once: under module loaders that turn imports into getters, each read of an import is a call,
// and the search runs the program some 1,500 times per analysis.
const SEGMENT_OP = OP_SEGMENT;
const TERMINATION_OP = OP_TERMINATION;
const SHUNT_OP = OP_SHUNT;
const MOUTH_OP = OP_MOUTH;
const carrySegments = propagateSegments;
const carrySegmentsWithDerivative = propagateSegmentsWithDerivative;
const openEndReflection = openEndReflectionInto;

const SLOT = 8;
const RELATIVE_DERIVATIVE_STEP = 1e-6;
const RESCALE_ABOVE = 1e100;

export class NetworkEvaluator {
  readonly network: CompiledNetwork;
  private readonly stack: Float64Array;
  private readonly reflection = new Float64Array(4);
  /** R just above and below the frequency, for dR/df. */
  private readonly neighbourReflections = new Float64Array(4);
  /** D(f) and dD/df after characteristic(). */
  valueRe = 0;
  valueIm = 0;
  derivativeRe = 0;
  derivativeIm = 0;

  constructor(network: CompiledNetwork) {
    this.network = network;
    this.stack = new Float64Array(SLOT * (network.stackDepth + 2));
    this.openGroupOf = new Int32Array(network.terminations.length).fill(-1);
    network.terminations.forEach((compiled, index) => {
      if (compiled.termination.kind !== 'open') return;
      const flange = compiled.termination.flange;
      let group = this.groupFlange.findIndex((known, at) => known === flange && this.groupRadiusM[at] === compiled.radiusM);
      if (group < 0) {
        group = this.groupFlange.length;
        this.groupFlange.push(flange);
        this.groupRadiusM.push(compiled.radiusM);
      }
      this.openGroupOf[index] = group;
    });
    this.groupReflections = new Float64Array(4 * this.groupFlange.length);
    this.groupStamp = new Int32Array(this.groupFlange.length).fill(-1);
    this.groupHasDerivative = new Uint8Array(this.groupFlange.length);
  }

  /**
   * Open ends of one flange and radius share their reflection at a frequency: each group's R and dR/df
   * are computed once per frequency (on first use) and read by every end of the group.
   */
  private readonly openGroupOf: Int32Array;
  private readonly groupFlange: Array<'flanged' | 'unflanged'> = [];
  private readonly groupRadiusM: number[] = [];
  /** Per group: R and dR/df as re/im pairs, and the frequency stamp (and derivative) they were computed for. */
  private readonly groupReflections: Float64Array;
  private readonly groupStamp: Int32Array;
  private readonly groupHasDerivative: Uint8Array;
  private stamp = 0;
  private stampRe = NaN;
  private stampIm = NaN;
  /** Evaluations of D(f) by characteristic() since the evaluator was made (the search's cost). */
  evaluations = 0;

  /** Reflection coefficient (and dR/df) of termination at complex frequency, into this.reflection. */
  private terminationAt(index: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): void {
    const compiled = this.network.terminations[index];
    const out = this.reflection;
    const group = this.openGroupOf[index];
    if (group < 0) {
      // Frequency-independent reflection, precomputed at compile time.
      out[0] = compiled.constantReflection;
      out[1] = 0;
      out[2] = 0;
      out[3] = 0;
      return;
    }
    if (frequencyRe !== this.stampRe || frequencyIm !== this.stampIm) {
      this.stamp++;
      this.stampRe = frequencyRe;
      this.stampIm = frequencyIm;
    }
    const cached = this.groupReflections;
    const at = 4 * group;
    if (this.groupStamp[group] !== this.stamp || (withDerivative && this.groupHasDerivative[group] === 0)) {
      this.groupReflectionAt(group, frequencyRe, frequencyIm, withDerivative);
      this.groupStamp[group] = this.stamp;
      this.groupHasDerivative[group] = withDerivative ? 1 : 0;
    }
    out[0] = cached[at];
    out[1] = cached[at + 1];
    out[2] = withDerivative ? cached[at + 2] : 0;
    out[3] = withDerivative ? cached[at + 3] : 0;
  }

  private groupReflectionAt(group: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): void {
    const speed = this.network.speedOfSoundMps;
    const flange = this.groupFlange[group];
    const radiusM = this.groupRadiusM[group];
    const out = this.groupReflections;
    const at = 4 * group;
    openEndReflection(flange, frequencyRe, frequencyIm, radiusM, speed, out, at);
    out[at + 2] = 0;
    out[at + 3] = 0;
    if (withDerivative) {
      // dR/df by central difference: a slightly inexact D' only changes Newton's path, not the zeros of D it converges to.
      const step = RELATIVE_DERIVATIVE_STEP * Math.hypot(frequencyRe, frequencyIm) + 1e-9;
      const neighbours = this.neighbourReflections;
      openEndReflection(flange, frequencyRe + step, frequencyIm, radiusM, speed, neighbours, 0);
      openEndReflection(flange, frequencyRe - step, frequencyIm, radiusM, speed, neighbours, 2);
      out[at + 2] = (neighbours[0] - neighbours[2]) / (2 * step);
      out[at + 3] = (neighbours[1] - neighbours[3]) / (2 * step);
    }
  }

  /**
   * Runs program ops [opStart, opEnd) at complex frequency; returns the stack slot offset of the
   * resulting state (p, U, dp/df, dU/df as re/im pairs).
   */
  run(opStart: number, opEnd: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): number {
    const program = this.network.program;
    this.prepareFrequency(frequencyRe, frequencyIm);
    let top = -SLOT;
    let op = opStart;
    while (op < opEnd) {
      const code = program[op];
      if (code === SEGMENT_OP) {
        op = withDerivative
          ? carrySegmentsWithDerivative(this.network, this.stack, this.wave, op, opEnd, top)
          : carrySegments(this.network, this.stack, this.wave, op, opEnd, top);
        continue;
      }
      if (code === TERMINATION_OP) {
        top += SLOT;
        this.pushTermination(program[op + 1], top, frequencyRe, frequencyIm, withDerivative);
      } else if (code === SHUNT_OP) {
        this.joinBranch(top - SLOT, top, withDerivative);
        top -= SLOT;
      } else if (code === MOUTH_OP) {
        this.throughMouth(this.network.mouthInertance[program[op + 1]], top, frequencyRe, frequencyIm, withDerivative);
      }
      op += 2;
    }
    return top;
  }

  // Per-frequency quantities shared by all segments: k0 = 2 pi f / c, the boundary-layer factor
  // (1 - j) sqrt(f) and its derivative (1 - j) / (2 sqrt(f)).
  private readonly bandWeights = new BandCurveWeights();
  private readonly wave: WaveFactors = {
    freeRe: 0, freeIm: 0, layerRe: 0, layerIm: 0, layerSlopeRe: 0, layerSlopeIm: 0,
    band: 0, weights: this.bandWeights.value, weightSlopes: this.bandWeights.slope,
  };

  private preparedRe = NaN;
  private preparedIm = NaN;

  private prepareFrequency(frequencyRe: number, frequencyIm: number): void {
    // The mode shapes run each branch on its own at one frequency: prepare once for them all.
    if (frequencyRe === this.preparedRe && frequencyIm === this.preparedIm) return;
    this.preparedRe = frequencyRe;
    this.preparedIm = frequencyIm;
    const wavenumberPerHz = (2 * Math.PI) / this.network.speedOfSoundMps;
    const wave = this.wave;
    wave.freeRe = wavenumberPerHz * frequencyRe;
    wave.freeIm = wavenumberPerHz * frequencyIm;
    const magnitude = Math.hypot(frequencyRe, frequencyIm);
    const sqrtRe = Math.sqrt((magnitude + frequencyRe) / 2);
    const sqrtImAbs = Math.sqrt(Math.max(0, (magnitude - frequencyRe) / 2));
    const sqrtIm = frequencyIm < 0 ? -sqrtImAbs : sqrtImAbs;
    wave.layerRe = sqrtRe + sqrtIm;
    wave.layerIm = sqrtIm - sqrtRe;
    const sqrtNorm = 2 * (sqrtRe * sqrtRe + sqrtIm * sqrtIm) || 1;
    const halfInvRe = sqrtRe / sqrtNorm;
    const halfInvIm = -sqrtIm / sqrtNorm;
    wave.layerSlopeRe = halfInvRe + halfInvIm;
    wave.layerSlopeIm = halfInvIm - halfInvRe;
    this.bandWeights.prepare(frequencyRe, frequencyIm);
    wave.band = this.bandWeights.band;
  }

  private pushTermination(index: number, top: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): void {
    const stack = this.stack;
    this.terminationAt(index, frequencyRe, frequencyIm, withDerivative);
    const impedance = this.network.terminations[index].characteristicImpedance;
    const reflection = this.reflection;
    stack[top] = impedance * (1 + reflection[0]);
    stack[top + 1] = impedance * reflection[1];
    stack[top + 2] = 1 - reflection[0];
    stack[top + 3] = -reflection[1];
    stack[top + 4] = impedance * reflection[2];
    stack[top + 5] = impedance * reflection[3];
    stack[top + 6] = -reflection[2];
    stack[top + 7] = -reflection[3];
  }

  /**
   * Through a branch mouth's series mass M towards the host duct: p <- p + j omega M U, U unchanged
   * (a lumped inertance, Kinsler & Frey, Fundamentals of Acoustics, ch. 10); j omega = 2 pi (-fi + j fr).
   */
  private throughMouth(inertance: number, top: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): void {
    const stack = this.stack;
    const massRe = -2 * Math.PI * inertance * frequencyIm;
    const massIm = 2 * Math.PI * inertance * frequencyRe;
    const uRe = stack[top + 2], uIm = stack[top + 3];
    if (withDerivative) {
      // d/df (j omega M U) = j 2 pi M U + j omega M dU/df
      const slope = 2 * Math.PI * inertance;
      const duRe = stack[top + 6], duIm = stack[top + 7];
      stack[top + 4] += -slope * uIm + massRe * duRe - massIm * duIm;
      stack[top + 5] += slope * uRe + massRe * duIm + massIm * duRe;
    }
    stack[top] += massRe * uRe - massIm * uIm;
    stack[top + 1] += massRe * uIm + massIm * uRe;
  }

  /** (p, U) <- (p pb, U pb + Ub p), with the product rule for the derivatives; rescales if large. */
  private joinBranch(path: number, branch: number, withDerivative: boolean): void {
    const stack = this.stack;
    const pRe = stack[path], pIm = stack[path + 1], uRe = stack[path + 2], uIm = stack[path + 3];
    const bpRe = stack[branch], bpIm = stack[branch + 1], buRe = stack[branch + 2], buIm = stack[branch + 3];
    stack[path] = pRe * bpRe - pIm * bpIm;
    stack[path + 1] = pRe * bpIm + pIm * bpRe;
    stack[path + 2] = uRe * bpRe - uIm * bpIm + buRe * pRe - buIm * pIm;
    stack[path + 3] = uRe * bpIm + uIm * bpRe + buRe * pIm + buIm * pRe;
    if (withDerivative) {
      const dpRe = stack[path + 4], dpIm = stack[path + 5], duRe = stack[path + 6], duIm = stack[path + 7];
      const dbpRe = stack[branch + 4], dbpIm = stack[branch + 5], dbuRe = stack[branch + 6], dbuIm = stack[branch + 7];
      stack[path + 4] = dpRe * bpRe - dpIm * bpIm + pRe * dbpRe - pIm * dbpIm;
      stack[path + 5] = dpRe * bpIm + dpIm * bpRe + pRe * dbpIm + pIm * dbpRe;
      stack[path + 6] =
        duRe * bpRe - duIm * bpIm + uRe * dbpRe - uIm * dbpIm + dbuRe * pRe - dbuIm * pIm + buRe * dpRe - buIm * dpIm;
      stack[path + 7] =
        duRe * bpIm + duIm * bpRe + uRe * dbpIm + uIm * dbpRe + dbuRe * pIm + dbuIm * pRe + buRe * dpIm + buIm * dpRe;
    }
    const size = Math.abs(stack[path]) + Math.abs(stack[path + 1]) + Math.abs(stack[path + 2]) + Math.abs(stack[path + 3]);
    if (size > RESCALE_ABOVE || (size > 0 && size < 1 / RESCALE_ABOVE)) {
      // A constant factor leaves the zeros of D and the Newton ratio D / D' unchanged.
      const factor = 1 / size;
      for (let offset = 0; offset < SLOT; offset++) stack[path + offset] *= factor;
    }
  }

  /** Reads a state component at a slot offset returned by run(). */
  state(slot: number, component: number): number {
    return this.stack[slot + component];
  }

  /** After startReflections(): the reflection looking into the run from its start, and the start end's own. */
  inputReflectionRe = 0;
  inputReflectionIm = 0;
  startReflectionRe = 0;
  startReflectionIm = 0;

  /**
   * At a real frequency: the reflection coefficient looking from the start plane into the run,
   * Gamma_in = (p - Zc U) / (p + Zc U) (every reflection downstream folded in; a ratio, so the
   * evaluator's scaling of the state cancels), and the start termination's reflection Rs.
   */
  startReflections(frequencyHz: number): void {
    const network = this.network;
    const slot = this.run(0, network.program.length, frequencyHz, 0, false);
    const stack = this.stack;
    const impedance = network.terminations[network.startTermination].characteristicImpedance;
    const pRe = stack[slot], pIm = stack[slot + 1];
    const zuRe = impedance * stack[slot + 2], zuIm = impedance * stack[slot + 3];
    const numRe = pRe - zuRe, numIm = pIm - zuIm;
    const denRe = pRe + zuRe, denIm = pIm + zuIm;
    const norm = denRe * denRe + denIm * denIm;
    this.inputReflectionRe = (numRe * denRe + numIm * denIm) / norm;
    this.inputReflectionIm = (numIm * denRe - numRe * denIm) / norm;
    this.terminationAt(network.startTermination, frequencyHz, 0, false);
    this.startReflectionRe = this.reflection[0];
    this.startReflectionIm = this.reflection[1];
  }

  /** Evaluates D(f) and dD/df at complex frequency into valueRe/valueIm and derivativeRe/derivativeIm. */
  characteristic(frequencyRe: number, frequencyIm: number, withDerivative = true): void {
    const network = this.network;
    this.evaluations++;
    const slot = this.run(0, network.program.length, frequencyRe, frequencyIm, withDerivative);
    const stack = this.stack;
    this.terminationAt(network.startTermination, frequencyRe, frequencyIm, withDerivative);
    const impedance = network.terminations[network.startTermination].characteristicImpedance;
    const rRe = this.reflection[0], rIm = this.reflection[1], drRe = this.reflection[2], drIm = this.reflection[3];
    const pRe = stack[slot], pIm = stack[slot + 1], uRe = stack[slot + 2], uIm = stack[slot + 3];
    // D = p (1 - Rs) + Zc (1 + Rs) U
    const aRe = 1 - rRe, aIm = -rIm;
    const bRe = impedance * (1 + rRe), bIm = impedance * rIm;
    this.valueRe = pRe * aRe - pIm * aIm + bRe * uRe - bIm * uIm;
    this.valueIm = pRe * aIm + pIm * aRe + bRe * uIm + bIm * uRe;
    if (!withDerivative) return;
    const dpRe = stack[slot + 4], dpIm = stack[slot + 5], duRe = stack[slot + 6], duIm = stack[slot + 7];
    // dD = dp (1 - Rs) - p dRs + Zc dRs U + Zc (1 + Rs) dU
    const dbRe = impedance * drRe, dbIm = impedance * drIm;
    this.derivativeRe = dpRe * aRe - dpIm * aIm - (pRe * drRe - pIm * drIm) + dbRe * uRe - dbIm * uIm + bRe * duRe - bIm * duIm;
    this.derivativeIm = dpRe * aIm + dpIm * aRe - (pRe * drIm + pIm * drRe) + dbRe * uIm + dbIm * uRe + bRe * duIm + bIm * duRe;
  }
}
