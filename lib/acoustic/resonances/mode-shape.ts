// Pressure nodes, antinodes and the pressure envelope of a resonance along the main path.
//
// At the resonance frequency the state (p, U) leaves the start end satisfying the start's boundary
// condition, p = Zc (1 + Rs), U = -(1 - Rs), U towards the end; each segment carries it outward with
// the plane-wave transfer matrix and each tee takes the branch's shunt (homogeneous form, as in the
// evaluator). Inside a segment p(x) = p0 cos kx - j Zc U0 sin kx, so, with the real part of k,
//   |p(x)|^2 = M + C cos 2kx + S sin 2kx,  C = (|p0|^2 - |Zc U0|^2)/2,  S = Re(p0 conj(-j Zc U0)),
// whose maxima lie at 2kx = atan2(S, C) + 2 m pi and minima half a period later (Kinsler & Frey,
// Fundamentals of Acoustics, ch. 10, standing waves). Extrema at kinks where sections change are not reported.
// The envelope samples |p(x)| itself, with the segment's complex k (losses included).
import { terminationReflection } from '../terminations';
import type { NetworkEvaluator } from '../network/evaluator';
import { BAND_COUNT, BandCurveWeights, bandCurveValue } from '../network/band-curve';
import { complexCosSin } from '../network/complex-trig';
import type { PressureEnvelopePoint } from '../types';
import { EnvelopeSampler } from './pressure-envelope';

export interface ModeShape {
  antinodesM: number[];
  nodesM: number[];
  /** Only when a sampler is given. */
  pressureEnvelope?: PressureEnvelopePoint[];
}

/** Standing-wave ratio below which the wave is treated as travelling (no nodes). */
const MIN_STANDING_FRACTION = 1e-6;
/** Extrema this close to the run's ends (in wavelengths) are snapped onto them. */
const END_SNAP_WAVELENGTHS = 1 / 100;
/** Extrema closer than this (in wavelengths) are one. */
const SAME_EXTREMUM_WAVELENGTHS = 1 / 1000;
/** Inner segment ends: extrema within this distance, m, count as inside the segment. */
const INNER_END_TOLERANCE_M = 1e-9;

function pushUnique(list: number[], positionM: number, toleranceM: number): void {
  if (list.length === 0 || Math.abs(list[list.length - 1] - positionM) > toleranceM) list.push(positionM);
}

/** Appends the extrema firstX + m period inside [-lowTolerance, lengthM + highTolerance], clamped to the segment. */
function pushExtrema(list: number[], firstX: number, period: number, lengthM: number, offsetM: number, lowTolerance: number, highTolerance: number, sameM: number): void {
  const firstIndex = Math.ceil((-lowTolerance - firstX) / period);
  for (let index = firstIndex; firstX + index * period <= lengthM + highTolerance; index++) {
    const x = Math.min(lengthM, Math.max(0, firstX + index * period));
    pushUnique(list, offsetM + x, sameM);
  }
}

const trig = new Float64Array(4);
// Read once: under module loaders that turn imports into getters, each read of an import is a call.
const bandCount = BAND_COUNT;
const curveValue = bandCurveValue;
const cosSin = complexCosSin;
const bandWeights = new BandCurveWeights();

export function modeShape(evaluator: NetworkEvaluator, frequencyHz: number, sampler?: EnvelopeSampler): ModeShape {
  const network = evaluator.network;
  const start = network.terminations[network.startTermination];
  const reflection = terminationReflection(start.termination, { re: frequencyHz, im: 0 }, start.radiusM, network.speedOfSoundMps);
  let pRe = start.characteristicImpedance * (1 + reflection.re);
  let pIm = start.characteristicImpedance * reflection.im;
  let uRe = -(1 - reflection.re);
  let uIm = reflection.im;
  const wavenumberPerHz = (2 * Math.PI) / network.speedOfSoundMps;
  const wavelengthM = network.speedOfSoundMps / frequencyHz;
  const endToleranceM = wavelengthM * END_SNAP_WAVELENGTHS;
  const sameM = wavelengthM * SAME_EXTREMUM_WAVELENGTHS;
  const antinodesM: number[] = [];
  const nodesM: number[] = [];
  const stretches = network.mainStretches;
  sampler?.reset(wavelengthM);
  const rootHz = Math.sqrt(frequencyHz);
  bandWeights.prepare(frequencyHz, 0);
  let offsetM = 0;
  for (let position = 0; position < stretches.length; position++) {
    const stretch = stretches[position];
    const segment = stretch.segment;
    const lengthM = stretch.lengthM;
    const impedance = network.segmentImpedance[segment];
    const loss = network.segmentKirchhoffPerSqrtHz[segment] * rootHz;
    const wavenumberRe = wavenumberPerHz * frequencyHz + loss;
    const wavenumberIm = -loss - curveValue(network.segmentBandNpPerM, network.segmentBandSlopes, segment * bandCount, bandWeights);
    // b = -j Zc U0
    const bRe = impedance * uIm;
    const bIm = -impedance * uRe;
    const pressureSquared = pRe * pRe + pIm * pIm;
    const velocitySquared = bRe * bRe + bIm * bIm;
    const cosineWeight = (pressureSquared - velocitySquared) / 2;
    const sineWeight = pRe * bRe + pIm * bIm;
    const standing = Math.sqrt(cosineWeight * cosineWeight + sineWeight * sineWeight);
    if (standing > MIN_STANDING_FRACTION * (pressureSquared + velocitySquared)) {
      const phase = Math.atan2(sineWeight, cosineWeight);
      const lowTolerance = position === 0 ? endToleranceM : INNER_END_TOLERANCE_M;
      const highTolerance = position === stretches.length - 1 ? endToleranceM : INNER_END_TOLERANCE_M;
      const period = Math.PI / wavenumberRe;
      pushExtrema(antinodesM, phase / (2 * wavenumberRe), period, lengthM, offsetM, lowTolerance, highTolerance, sameM);
      pushExtrema(nodesM, (phase + Math.PI) / (2 * wavenumberRe), period, lengthM, offsetM, lowTolerance, highTolerance, sameM);
    }
    sampler?.sampleSegment(offsetM, lengthM, wavenumberRe, wavenumberIm, pRe, pIm, bRe, bIm);
    // Carry the state to the segment's far end: [[cos, -j Zc sin], [-j sin / Zc, cos]]
    cosSin(wavenumberRe * lengthM, wavenumberIm * lengthM, trig);
    const cosRe = trig[0], cosIm = trig[1], sinRe = trig[2], sinIm = trig[3];
    const upperRe = impedance * sinIm;
    const upperIm = -impedance * sinRe;
    const lowerRe = sinIm / impedance;
    const lowerIm = -sinRe / impedance;
    const nextPRe = cosRe * pRe - cosIm * pIm + upperRe * uRe - upperIm * uIm;
    const nextPIm = cosRe * pIm + cosIm * pRe + upperRe * uIm + upperIm * uRe;
    const nextURe = lowerRe * pRe - lowerIm * pIm + cosRe * uRe - cosIm * uIm;
    const nextUIm = lowerRe * pIm + lowerIm * pRe + cosRe * uIm + cosIm * uRe;
    pRe = nextPRe;
    pIm = nextPIm;
    uRe = nextURe;
    uIm = nextUIm;
    for (const branch of stretch.branches) {
      const slot = evaluator.run(branch.programStart, branch.programEnd, frequencyHz, 0, false);
      const bpRe = evaluator.state(slot, 0), bpIm = evaluator.state(slot, 1);
      const buRe = evaluator.state(slot, 2), buIm = evaluator.state(slot, 3);
      // (p, U) <- (p pb, U pb - Ub p): the branch draws Ub/pb of the pressure as volume velocity
      const joinedPRe = pRe * bpRe - pIm * bpIm;
      const joinedPIm = pRe * bpIm + pIm * bpRe;
      const joinedURe = uRe * bpRe - uIm * bpIm - (buRe * pRe - buIm * pIm);
      const joinedUIm = uRe * bpIm + uIm * bpRe - (buRe * pIm + buIm * pRe);
      const joinedSize = Math.sqrt(joinedPRe * joinedPRe + joinedPIm * joinedPIm) + impedance * Math.sqrt(joinedURe * joinedURe + joinedUIm * joinedUIm);
      const scale = 1 / (joinedSize || 1);
      // The state was multiplied by pb * scale; the envelope divides it out to keep one amplitude along the path.
      sampler?.rescale(Math.sqrt(bpRe * bpRe + bpIm * bpIm) * scale);
      pRe = joinedPRe * scale;
      pIm = joinedPIm * scale;
      uRe = joinedURe * scale;
      uIm = joinedUIm * scale;
    }
    offsetM += lengthM;
  }
  const sortedNodesM = nodesM.sort((first, second) => first - second);
  if (sampler === undefined) return { antinodesM, nodesM: sortedNodesM };
  sampler.sampleEnd(offsetM, pRe, pIm);
  return { antinodesM, nodesM: sortedNodesM, pressureEnvelope: sampler.finish() };
}
