// Pressure nodes and antinodes of a resonance along the main path.
//
// At the resonance frequency the state (p, U) leaves the start end satisfying the start's boundary
// condition, p = Zc (1 + Rs), U = -(1 - Rs), U towards the end; each segment carries it outward with
// the plane-wave transfer matrix and each tee takes the branch's shunt (homogeneous form, as in the
// evaluator). Inside a segment p(x) = p0 cos kx - j Zc U0 sin kx, so, with the real part of k,
//   |p(x)|^2 = M + C cos 2kx + S sin 2kx,  C = (|p0|^2 - |Zc U0|^2)/2,  S = Re(p0 conj(-j Zc U0)),
// whose maxima lie at 2kx = atan2(S, C) + 2 m pi and minima half a period later (Kinsler & Frey,
// Fundamentals of Acoustics, ch. 10, standing waves). Extrema at kinks where sections change are not reported.
import { terminationReflection } from '../terminations';
import type { NetworkEvaluator } from '../network/evaluator';

export interface ModeShape {
  antinodesM: number[];
  nodesM: number[];
}

/** Standing-wave ratio below which the wave is treated as travelling (no nodes). */
const MIN_STANDING_FRACTION = 1e-6;

function pushUnique(list: number[], positionM: number, toleranceM: number): void {
  if (list.length === 0 || Math.abs(list[list.length - 1] - positionM) > toleranceM) list.push(positionM);
}

export function modeShape(evaluator: NetworkEvaluator, frequencyHz: number): ModeShape {
  const network = evaluator.network;
  const start = network.terminations[network.startTermination];
  const reflection = terminationReflection(start.termination, { re: frequencyHz, im: 0 }, start.radiusM, network.speedOfSoundMps);
  let pRe = start.characteristicImpedance * (1 + reflection.re);
  let pIm = start.characteristicImpedance * reflection.im;
  let uRe = -(1 - reflection.re);
  let uIm = reflection.im;
  const wavenumberPerHz = (2 * Math.PI) / network.speedOfSoundMps;
  const wavelengthM = network.speedOfSoundMps / frequencyHz;
  const endToleranceM = wavelengthM / 100;
  const antinodesM: number[] = [];
  const nodesM: number[] = [];
  let offsetM = 0;
  network.mainSegments.forEach((segment, position) => {
    const lengthM = network.segmentLengthM[segment];
    const impedance = network.segmentImpedance[segment];
    const loss = network.segmentKirchhoffPerSqrtHz[segment] * Math.sqrt(frequencyHz);
    const wavenumberRe = wavenumberPerHz * frequencyHz + loss;
    const wavenumberIm = -loss - network.segmentLiningNpPerM[segment];
    // b = -j Zc U0
    const bRe = impedance * uIm;
    const bIm = -impedance * uRe;
    const pressureSquared = pRe * pRe + pIm * pIm;
    const velocitySquared = bRe * bRe + bIm * bIm;
    const cosineWeight = (pressureSquared - velocitySquared) / 2;
    const sineWeight = pRe * bRe + pIm * bIm;
    const standing = Math.hypot(cosineWeight, sineWeight);
    if (standing > MIN_STANDING_FRACTION * (pressureSquared + velocitySquared)) {
      const phase = Math.atan2(sineWeight, cosineWeight);
      const lowTolerance = position === 0 ? endToleranceM : 1e-9;
      const highTolerance = position === network.mainSegments.length - 1 ? endToleranceM : 1e-9;
      const period = Math.PI / wavenumberRe;
      for (const [list, shift] of [[antinodesM, 0], [nodesM, Math.PI]] as const) {
        const firstX = (phase + shift) / (2 * wavenumberRe);
        const firstIndex = Math.ceil((-lowTolerance - firstX) / period);
        for (let index = firstIndex; firstX + index * period <= lengthM + highTolerance; index++) {
          const x = Math.min(lengthM, Math.max(0, firstX + index * period));
          pushUnique(list, offsetM + x, wavelengthM / 1000);
        }
      }
    }
    // Carry the state to the segment's far end: [[cos, -j Zc sin], [-j sin / Zc, cos]]
    const phase = wavenumberRe * lengthM;
    const growth = wavenumberIm * lengthM;
    const coshGrowth = Math.cosh(growth);
    const sinhGrowth = Math.sinh(growth);
    const cosRe = Math.cos(phase) * coshGrowth;
    const cosIm = -Math.sin(phase) * sinhGrowth;
    const sinRe = Math.sin(phase) * coshGrowth;
    const sinIm = Math.cos(phase) * sinhGrowth;
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
    for (const branch of network.mainBranches[position]) {
      const slot = evaluator.run(branch.programStart, branch.programEnd, frequencyHz, 0, false);
      const bpRe = evaluator.state(slot, 0), bpIm = evaluator.state(slot, 1);
      const buRe = evaluator.state(slot, 2), buIm = evaluator.state(slot, 3);
      // (p, U) <- (p pb, U pb - Ub p): the branch draws Ub/pb of the pressure as volume velocity
      const joinedPRe = pRe * bpRe - pIm * bpIm;
      const joinedPIm = pRe * bpIm + pIm * bpRe;
      const joinedURe = uRe * bpRe - uIm * bpIm - (buRe * pRe - buIm * pIm);
      const joinedUIm = uRe * bpIm + uIm * bpRe - (buRe * pIm + buIm * pRe);
      const scale = 1 / (Math.hypot(joinedPRe, joinedPIm) + impedance * Math.hypot(joinedURe, joinedUIm) || 1);
      pRe = joinedPRe * scale;
      pIm = joinedPIm * scale;
      uRe = joinedURe * scale;
      uIm = joinedUIm * scale;
    }
    offsetM += lengthM;
  });
  return { antinodesM, nodesM: nodesM.sort((first, second) => first - second) };
}
