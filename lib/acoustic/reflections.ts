// The local pressure reflection coefficient of each discontinuity along the main path, for a plane
// wave arriving from the start side, with what lies beyond taken as anechoic (engine contract).
import { OCTAVE_BANDS_HZ } from './constants';
import { cAbs, cArg, type Complex } from './complex';
import type { CompiledNetwork } from './network/compile';
import type { NetworkEvaluator } from './network/evaluator';
import { terminationReflection } from './terminations';
import type { Reflection, ReflectionBand } from './types';

function band(hz: number, reflection: Complex): ReflectionBand {
  return { hz, magnitude: cAbs(reflection), phaseRad: cArg(reflection) };
}

/** Reflection from a load admittance Y (m³/(s·Pa)) seen from a duct of impedance Zc. */
function fromAdmittance(characteristicImpedance: number, admittanceRe: number, admittanceIm: number): Complex {
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 10: R = (Z - Zc)/(Z + Zc) = (1 - Zc Y)/(1 + Zc Y)
  const numeratorRe = 1 - characteristicImpedance * admittanceRe;
  const numeratorIm = -characteristicImpedance * admittanceIm;
  const denominatorRe = 1 + characteristicImpedance * admittanceRe;
  const denominatorIm = characteristicImpedance * admittanceIm;
  const norm = denominatorRe * denominatorRe + denominatorIm * denominatorIm;
  return {
    re: (numeratorRe * denominatorRe + numeratorIm * denominatorIm) / norm,
    im: (numeratorIm * denominatorRe - numeratorRe * denominatorIm) / norm,
  };
}

function terminationBands(network: CompiledNetwork, index: number, bandsHz: number[]): ReflectionBand[] {
  const compiled = network.terminations[index];
  return bandsHz.map((hz) =>
    band(hz, terminationReflection(compiled.termination, { re: hz, im: 0 }, compiled.radiusM, network.speedOfSoundMps)),
  );
}

export function discontinuityReflections(evaluator: NetworkEvaluator, cutoffHz: number): Reflection[] {
  const network = evaluator.network;
  const bandsHz = OCTAVE_BANDS_HZ.filter((hz) => hz < cutoffHz);
  const reflections: Reflection[] = [{ atM: 0, kind: 'start', bands: terminationBands(network, network.startTermination, bandsHz) }];
  let positionM = 0;
  network.mainSegments.forEach((segment, position) => {
    positionM += network.segmentLengthM[segment];
    const isLast = position === network.mainSegments.length - 1;
    const impedance = network.segmentImpedance[segment];
    const branches = network.mainBranches[position];
    // Admittance of an anechoic continuation, S2 / (rho c) = 1 / Zc2 (none beyond the end).
    const continuation = isLast ? 0 : 1 / network.segmentImpedance[network.mainSegments[position + 1]];
    if (branches.length === 0) {
      if (isLast || Math.abs(continuation * impedance - 1) < 1e-12) return;
      const reflection = fromAdmittance(impedance, continuation, 0);
      reflections.push({ atM: positionM, kind: 'area-change', bands: bandsHz.map((hz) => band(hz, reflection)) });
      return;
    }
    // Anechoic branches: each presents the admittance of its first segment.
    const anechoicBranches = branches.reduce((sum, branch) => sum + 1 / network.segmentImpedance[branch.segments[0]], 0);
    const anechoic = fromAdmittance(impedance, continuation + anechoicBranches, 0);
    const bandsWithBranch = bandsHz.map((hz) => {
      let admittanceRe = continuation;
      let admittanceIm = 0;
      for (const branch of branches) {
        const slot = evaluator.run(branch.programStart, branch.programEnd, hz, 0, false);
        const pRe = evaluator.state(slot, 0), pIm = evaluator.state(slot, 1);
        const uRe = evaluator.state(slot, 2), uIm = evaluator.state(slot, 3);
        const norm = pRe * pRe + pIm * pIm;
        admittanceRe += (uRe * pRe + uIm * pIm) / norm;
        admittanceIm += (uIm * pRe - uRe * pIm) / norm;
      }
      return band(hz, fromAdmittance(impedance, admittanceRe, admittanceIm));
    });
    reflections.push({ atM: positionM, kind: 'tee', bands: bandsHz.map((hz) => band(hz, anechoic)), bandsWithBranch });
  });
  reflections.push({ atM: positionM, kind: 'end', bands: terminationBands(network, network.endTermination, bandsHz) });
  return reflections;
}
