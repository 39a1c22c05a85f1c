// Inner loops of the transfer-matrix chain: carry the state inward through a run of consecutive
// segment ops, holding it in locals, with hand-written complex arithmetic and no allocation.
import { BAND_COUNT } from './band-curve';
import type { CompiledNetwork } from './compile';
import { SMALL_GROWTH } from './complex-trig';

// Read once: under module loaders that turn imports into getters, each read of an import is a call.
const smallGrowth = SMALL_GROWTH;
const bandCount = BAND_COUNT;

/**
 * Per-frequency factors shared by all segments: k0 = 2 pi f / c, (1 - j) sqrt(f) and its derivative
 * (1 - j) / (2 sqrt(f)); and the weights of the band curves of wall and lining attenuation (band-curve.ts):
 * the piece's first band and its value and d/df weights as re/im pairs.
 */
export interface WaveFactors {
  freeRe: number;
  freeIm: number;
  layerRe: number;
  layerIm: number;
  layerSlopeRe: number;
  layerSlopeIm: number;
  band: number;
  weights: Float64Array;
  weightSlopes: Float64Array;
}

/** Carries the top state inward through consecutive segment ops, in locals; returns the next op. */
export function propagateSegments(network: CompiledNetwork, stack: Float64Array, wave: WaveFactors, opStart: number, opEnd: number, top: number): number {
  // Segment constants laid out by op position (op / 2), so the loop reads them in program order.
  const lengths = network.opLengthM;
  const impedances = network.opImpedance;
  const kirchhoff = network.opKirchhoffPerSqrtHz;
  const bandNp = network.opBandNpPerM;
  const bandSlopes = network.opBandSlopes;
  const freeRe = wave.freeRe, freeIm = wave.freeIm, layerRe = wave.layerRe, layerIm = wave.layerIm;
  const band = wave.band, weights = wave.weights;
  const w0 = weights[0], w1 = weights[1], w2 = weights[2], w3 = weights[3], w4 = weights[4], w5 = weights[5], w6 = weights[6], w7 = weights[7];
  let pRe = stack[top], pIm = stack[top + 1], uRe = stack[top + 2], uIm = stack[top + 3];
  const runEnd = Math.min(opEnd, network.opSegmentRunEnd[opStart >> 1]);
  let op = opStart;
  for (; op < runEnd; op += 2) {
    const segment = op >> 1;
    const lengthM = lengths[segment];
    const impedance = impedances[segment];
    const loss = kirchhoff[segment];
    // walls and lining: k -= j alpha(f), alpha on the segment's band curve
    const base = segment * bandCount + band;
    const y0 = bandNp[base], m0 = bandSlopes[base], y1 = bandNp[base + 1], m1 = bandSlopes[base + 1];
    const alphaRe = y0 * w0 + m0 * w2 + y1 * w4 + m1 * w6;
    const alphaIm = y0 * w1 + m0 * w3 + y1 * w5 + m1 * w7;
    const phase = (freeRe + loss * layerRe + alphaIm) * lengthM;
    const growth = (freeIm + loss * layerIm - alphaRe) * lengthM;
    const cosPhase = Math.cos(phase);
    const sinPhase = Math.sin(phase);
    let coshGrowth: number;
    let sinhGrowth: number;
    if (growth < smallGrowth && growth > -smallGrowth) {
      // Taylor series of cosh and sinh, as in complex-trig.ts; written out so the hot loop keeps them in registers (a call through a scratch array costs ~10 %)
      const squared = growth * growth;
      coshGrowth = 1 + squared * (0.5 + squared * (1 / 24 + squared * (1 / 720 + squared / 40320)));
      sinhGrowth = growth * (1 + squared * (1 / 6 + squared * (1 / 120 + squared * (1 / 5040 + squared / 362880))));
    } else {
      const expGrowth = Math.exp(growth);
      coshGrowth = 0.5 * (expGrowth + 1 / expGrowth);
      sinhGrowth = coshGrowth - 1 / expGrowth;
    }
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
    const nextPRe = cosRe * pRe - cosIm * pIm + upperRe * uRe - upperIm * uIm;
    const nextPIm = cosRe * pIm + cosIm * pRe + upperRe * uIm + upperIm * uRe;
    const nextURe = lowerRe * pRe - lowerIm * pIm + cosRe * uRe - cosIm * uIm;
    uIm = lowerRe * pIm + lowerIm * pRe + cosRe * uIm + cosIm * uRe;
    pRe = nextPRe;
    pIm = nextPIm;
    uRe = nextURe;
  }
  stack[top] = pRe;
  stack[top + 1] = pIm;
  stack[top + 2] = uRe;
  stack[top + 3] = uIm;
  return op;
}

/** As propagateSegments, also carrying d/df of the state; d cos kL = -sin kL d(kL), d sin kL = cos kL d(kL). */
export function propagateSegmentsWithDerivative(
network: CompiledNetwork,
stack: Float64Array,
wave: WaveFactors,
opStart: number,
opEnd: number,
top: number,
): number {
  // Segment constants laid out by op position (op / 2), so the loop reads them in program order.
  const lengths = network.opLengthM;
  const impedances = network.opImpedance;
  const kirchhoff = network.opKirchhoffPerSqrtHz;
  const bandNp = network.opBandNpPerM;
  const bandSlopes = network.opBandSlopes;
  const wavenumberPerHz = (2 * Math.PI) / network.speedOfSoundMps;
  const freeRe = wave.freeRe, freeIm = wave.freeIm, layerRe = wave.layerRe, layerIm = wave.layerIm;
  const layerSlopeRe = wave.layerSlopeRe, layerSlopeIm = wave.layerSlopeIm;
  const band = wave.band, weights = wave.weights, slopes = wave.weightSlopes;
  const w0 = weights[0], w1 = weights[1], w2 = weights[2], w3 = weights[3], w4 = weights[4], w5 = weights[5], w6 = weights[6], w7 = weights[7];
  const d0 = slopes[0], d1 = slopes[1], d2 = slopes[2], d3 = slopes[3], d4 = slopes[4], d5 = slopes[5], d6 = slopes[6], d7 = slopes[7];
  let pRe = stack[top], pIm = stack[top + 1], uRe = stack[top + 2], uIm = stack[top + 3];
  let dpRe = stack[top + 4], dpIm = stack[top + 5], duRe = stack[top + 6], duIm = stack[top + 7];
  const runEnd = Math.min(opEnd, network.opSegmentRunEnd[opStart >> 1]);
  let op = opStart;
  for (; op < runEnd; op += 2) {
    const segment = op >> 1;
    const lengthM = lengths[segment];
    const impedance = impedances[segment];
    const loss = kirchhoff[segment];
    // walls and lining: k -= j alpha(f), alpha on the segment's band curve
    const base = segment * bandCount + band;
    const y0 = bandNp[base], m0 = bandSlopes[base], y1 = bandNp[base + 1], m1 = bandSlopes[base + 1];
    const alphaRe = y0 * w0 + m0 * w2 + y1 * w4 + m1 * w6;
    const alphaIm = y0 * w1 + m0 * w3 + y1 * w5 + m1 * w7;
    const phase = (freeRe + loss * layerRe + alphaIm) * lengthM;
    const growth = (freeIm + loss * layerIm - alphaRe) * lengthM;
    const cosPhase = Math.cos(phase);
    const sinPhase = Math.sin(phase);
    let coshGrowth: number;
    let sinhGrowth: number;
    if (growth < smallGrowth && growth > -smallGrowth) {
      // Taylor series of cosh and sinh, as in complex-trig.ts; written out so the hot loop keeps them in registers (a call through a scratch array costs ~10 %)
      const squared = growth * growth;
      coshGrowth = 1 + squared * (0.5 + squared * (1 / 24 + squared * (1 / 720 + squared / 40320)));
      sinhGrowth = growth * (1 + squared * (1 / 6 + squared * (1 / 120 + squared * (1 / 5040 + squared / 362880))));
    } else {
      const expGrowth = Math.exp(growth);
      coshGrowth = 0.5 * (expGrowth + 1 / expGrowth);
      sinhGrowth = coshGrowth - 1 / expGrowth;
    }
    const cosRe = cosPhase * coshGrowth;
    const cosIm = -sinPhase * sinhGrowth;
    const sinRe = sinPhase * coshGrowth;
    const sinIm = cosPhase * sinhGrowth;
    const upperRe = -impedance * sinIm;
    const upperIm = impedance * sinRe;
    const lowerRe = -sinIm / impedance;
    const lowerIm = sinRe / impedance;
    // d(kL)/df, with d(-j alpha)/df = dalpha_im - j dalpha_re
    const alphaSlopeRe = y0 * d0 + m0 * d2 + y1 * d4 + m1 * d6;
    const alphaSlopeIm = y0 * d1 + m0 * d3 + y1 * d5 + m1 * d7;
    const slopeRe = (wavenumberPerHz + loss * layerSlopeRe + alphaSlopeIm) * lengthM;
    const slopeIm = (loss * layerSlopeIm - alphaSlopeRe) * lengthM;
    const dCosRe = -(sinRe * slopeRe - sinIm * slopeIm);
    const dCosIm = -(sinRe * slopeIm + sinIm * slopeRe);
    const dSinRe = cosRe * slopeRe - cosIm * slopeIm;
    const dSinIm = cosRe * slopeIm + cosIm * slopeRe;
    const dUpperRe = -impedance * dSinIm;
    const dUpperIm = impedance * dSinRe;
    const dLowerRe = -dSinIm / impedance;
    const dLowerIm = dSinRe / impedance;
    const nextDpRe = cosRe * dpRe - cosIm * dpIm + upperRe * duRe - upperIm * duIm + dCosRe * pRe - dCosIm * pIm + dUpperRe * uRe - dUpperIm * uIm;
    const nextDpIm = cosRe * dpIm + cosIm * dpRe + upperRe * duIm + upperIm * duRe + dCosRe * pIm + dCosIm * pRe + dUpperRe * uIm + dUpperIm * uRe;
    const nextDuRe = lowerRe * dpRe - lowerIm * dpIm + cosRe * duRe - cosIm * duIm + dLowerRe * pRe - dLowerIm * pIm + dCosRe * uRe - dCosIm * uIm;
    duIm = lowerRe * dpIm + lowerIm * dpRe + cosRe * duIm + cosIm * duRe + dLowerRe * pIm + dLowerIm * pRe + dCosRe * uIm + dCosIm * uRe;
    dpRe = nextDpRe;
    dpIm = nextDpIm;
    duRe = nextDuRe;
    const nextPRe = cosRe * pRe - cosIm * pIm + upperRe * uRe - upperIm * uIm;
    const nextPIm = cosRe * pIm + cosIm * pRe + upperRe * uIm + upperIm * uRe;
    const nextURe = lowerRe * pRe - lowerIm * pIm + cosRe * uRe - cosIm * uIm;
    uIm = lowerRe * pIm + lowerIm * pRe + cosRe * uIm + cosIm * uRe;
    pRe = nextPRe;
    pIm = nextPIm;
    uRe = nextURe;
  }
  stack[top] = pRe;
  stack[top + 1] = pIm;
  stack[top + 2] = uRe;
  stack[top + 3] = uIm;
  stack[top + 4] = dpRe;
  stack[top + 5] = dpIm;
  stack[top + 6] = duRe;
  stack[top + 7] = duIm;
  return op;
}
