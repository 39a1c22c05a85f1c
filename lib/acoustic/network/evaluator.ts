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
import { terminationReflection } from '../terminations';
import { OP_SEGMENT, OP_SHUNT, OP_TERMINATION, type CompiledNetwork } from './compile';

const SLOT = 8;
const RELATIVE_DERIVATIVE_STEP = 1e-6;
const RESCALE_ABOVE = 1e100;

export class NetworkEvaluator {
  readonly network: CompiledNetwork;
  private readonly stack: Float64Array;
  private readonly reflection = new Float64Array(4);
  /** D(f) and dD/df after characteristic(). */
  valueRe = 0;
  valueIm = 0;
  derivativeRe = 0;
  derivativeIm = 0;

  constructor(network: CompiledNetwork) {
    this.network = network;
    this.stack = new Float64Array(SLOT * (network.stackDepth + 2));
  }

  /** Reflection coefficient (and dR/df) of termination at complex frequency, into this.reflection. */
  private terminationAt(index: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): void {
    const compiled = this.network.terminations[index];
    const out = this.reflection;
    const speed = this.network.speedOfSoundMps;
    const value = terminationReflection(compiled.termination, { re: frequencyRe, im: frequencyIm }, compiled.radiusM, speed);
    out[0] = value.re;
    out[1] = value.im;
    out[2] = 0;
    out[3] = 0;
    if (withDerivative && compiled.termination.kind === 'open') {
      const step = RELATIVE_DERIVATIVE_STEP * Math.hypot(frequencyRe, frequencyIm) + 1e-9;
      const above = terminationReflection(compiled.termination, { re: frequencyRe + step, im: frequencyIm }, compiled.radiusM, speed);
      const below = terminationReflection(compiled.termination, { re: frequencyRe - step, im: frequencyIm }, compiled.radiusM, speed);
      out[2] = (above.re - below.re) / (2 * step);
      out[3] = (above.im - below.im) / (2 * step);
    }
  }

  /**
   * Runs program ops [opStart, opEnd) at complex frequency; returns the stack slot offset of the
   * resulting state (p, U, dp/df, dU/df as re/im pairs).
   */
  run(opStart: number, opEnd: number, frequencyRe: number, frequencyIm: number, withDerivative: boolean): number {
    const network = this.network;
    const program = network.program;
    const lengths = network.segmentLengthM;
    const impedances = network.segmentImpedance;
    const kirchhoff = network.segmentKirchhoffPerSqrtHz;
    const lining = network.segmentLiningNpPerM;
    const stack = this.stack;
    const wavenumberPerHz = (2 * Math.PI) / network.speedOfSoundMps;
    // Free-field wavenumber k0 = 2 pi f / c and the boundary-layer factor (1 - j) sqrt(f).
    const freeRe = wavenumberPerHz * frequencyRe;
    const freeIm = wavenumberPerHz * frequencyIm;
    const magnitude = Math.hypot(frequencyRe, frequencyIm);
    const sqrtRe = Math.sqrt((magnitude + frequencyRe) / 2);
    const sqrtImAbs = Math.sqrt(Math.max(0, (magnitude - frequencyRe) / 2));
    const sqrtIm = frequencyIm < 0 ? -sqrtImAbs : sqrtImAbs;
    const layerRe = sqrtRe + sqrtIm;
    const layerIm = sqrtIm - sqrtRe;
    // d/df of (1 - j) sqrt(f) = (1 - j) / (2 sqrt(f))
    const sqrtNorm = 2 * (sqrtRe * sqrtRe + sqrtIm * sqrtIm);
    const halfInvRe = sqrtRe / sqrtNorm;
    const halfInvIm = -sqrtIm / sqrtNorm;
    const layerSlopeRe = halfInvRe + halfInvIm;
    const layerSlopeIm = halfInvIm - halfInvRe;
    let top = -SLOT;
    for (let op = opStart; op < opEnd; op += 2) {
      const code = program[op];
      const operand = program[op + 1];
      if (code === OP_SEGMENT) {
        const lengthM = lengths[operand];
        const impedance = impedances[operand];
        const loss = kirchhoff[operand];
        const phase = (freeRe + loss * layerRe) * lengthM;
        const growth = (freeIm + loss * layerIm - lining[operand]) * lengthM;
        const cosPhase = Math.cos(phase);
        const sinPhase = Math.sin(phase);
        const expGrowth = Math.exp(growth);
        const coshGrowth = 0.5 * (expGrowth + 1 / expGrowth);
        const sinhGrowth = coshGrowth - 1 / expGrowth;
        // cos(kL) and sin(kL) for complex kL
        const cosRe = cosPhase * coshGrowth;
        const cosIm = -sinPhase * sinhGrowth;
        const sinRe = sinPhase * coshGrowth;
        const sinIm = cosPhase * sinhGrowth;
        // Inverse transfer matrix [[cos, j Zc sin], [j sin / Zc, cos]] (Munjal, Acoustics of Ducts and Mufflers, ch. 2)
        const upperRe = -impedance * sinIm;
        const upperIm = impedance * sinRe;
        const lowerRe = -sinIm / impedance;
        const lowerIm = sinRe / impedance;
        const pRe = stack[top];
        const pIm = stack[top + 1];
        const uRe = stack[top + 2];
        const uIm = stack[top + 3];
        stack[top] = cosRe * pRe - cosIm * pIm + upperRe * uRe - upperIm * uIm;
        stack[top + 1] = cosRe * pIm + cosIm * pRe + upperRe * uIm + upperIm * uRe;
        stack[top + 2] = lowerRe * pRe - lowerIm * pIm + cosRe * uRe - cosIm * uIm;
        stack[top + 3] = lowerRe * pIm + lowerIm * pRe + cosRe * uIm + cosIm * uRe;
        if (withDerivative) {
          // d(kL)/df, then d cos = -sin d(kL), d sin = cos d(kL)
          const slopeRe = (wavenumberPerHz + loss * layerSlopeRe) * lengthM;
          const slopeIm = loss * layerSlopeIm * lengthM;
          const dCosRe = -(sinRe * slopeRe - sinIm * slopeIm);
          const dCosIm = -(sinRe * slopeIm + sinIm * slopeRe);
          const dSinRe = cosRe * slopeRe - cosIm * slopeIm;
          const dSinIm = cosRe * slopeIm + cosIm * slopeRe;
          const dUpperRe = -impedance * dSinIm;
          const dUpperIm = impedance * dSinRe;
          const dLowerRe = -dSinIm / impedance;
          const dLowerIm = dSinRe / impedance;
          const dpRe = stack[top + 4];
          const dpIm = stack[top + 5];
          const duRe = stack[top + 6];
          const duIm = stack[top + 7];
          stack[top + 4] =
            cosRe * dpRe - cosIm * dpIm + upperRe * duRe - upperIm * duIm +
            dCosRe * pRe - dCosIm * pIm + dUpperRe * uRe - dUpperIm * uIm;
          stack[top + 5] =
            cosRe * dpIm + cosIm * dpRe + upperRe * duIm + upperIm * duRe +
            dCosRe * pIm + dCosIm * pRe + dUpperRe * uIm + dUpperIm * uRe;
          stack[top + 6] =
            lowerRe * dpRe - lowerIm * dpIm + cosRe * duRe - cosIm * duIm +
            dLowerRe * pRe - dLowerIm * pIm + dCosRe * uRe - dCosIm * uIm;
          stack[top + 7] =
            lowerRe * dpIm + lowerIm * dpRe + cosRe * duIm + cosIm * duRe +
            dLowerRe * pIm + dLowerIm * pRe + dCosRe * uIm + dCosIm * uRe;
        }
      } else if (code === OP_TERMINATION) {
        top += SLOT;
        this.terminationAt(operand, frequencyRe, frequencyIm, withDerivative);
        const impedance = network.terminations[operand].characteristicImpedance;
        const reflection = this.reflection;
        stack[top] = impedance * (1 + reflection[0]);
        stack[top + 1] = impedance * reflection[1];
        stack[top + 2] = 1 - reflection[0];
        stack[top + 3] = -reflection[1];
        stack[top + 4] = impedance * reflection[2];
        stack[top + 5] = impedance * reflection[3];
        stack[top + 6] = -reflection[2];
        stack[top + 7] = -reflection[3];
      } else if (code === OP_SHUNT) {
        this.joinBranch(top - SLOT, top, withDerivative);
        top -= SLOT;
      }
    }
    return top;
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

  /** Evaluates D(f) and dD/df at complex frequency into valueRe/valueIm and derivativeRe/derivativeIm. */
  characteristic(frequencyRe: number, frequencyIm: number, withDerivative = true): void {
    const network = this.network;
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
