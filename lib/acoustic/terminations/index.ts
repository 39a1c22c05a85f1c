// The termination family: reflection coefficient, terminating impedance and low-frequency end correction.
import { FLANGED_END_CORRECTION_PER_RADIUS, UNFLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { cAdd, cDiv, cScale, cSub, complex, type Complex } from '../complex';
import type { Termination } from '../types';
import { anechoicReflection } from './anechoic';
import { closedReflection } from './closed';
import { linedReflection } from './lined';
import { flangedReflection } from './open-flanged';
import { unflangedReflection } from './open-unflanged';

/**
 * Pressure reflection coefficient of a termination for a plane wave arriving at it, at complex
 * frequency frequencyHz (real for ordinary use), for a duct of equivalent radius radiusM.
 */
export function terminationReflection(
  termination: Termination,
  frequencyHz: Complex,
  radiusM: number,
  speedOfSoundMps: number,
): Complex {
  switch (termination.kind) {
    case 'closed':
      return closedReflection();
    case 'anechoic':
      return anechoicReflection();
    case 'lined':
      return linedReflection(termination.absorption);
    case 'open': {
      const helmholtzNumber = cScale(frequencyHz, (2 * Math.PI * radiusM) / speedOfSoundMps);
      return termination.flange === 'flanged' ? flangedReflection(helmholtzNumber) : unflangedReflection(helmholtzNumber);
    }
  }
}

/** Low-frequency end correction, m; 0 for ends that do not radiate. */
export function lowFrequencyEndCorrectionM(termination: Termination, radiusM: number): number {
  if (termination.kind !== 'open') return 0;
  return (termination.flange === 'flanged' ? FLANGED_END_CORRECTION_PER_RADIUS : UNFLANGED_END_CORRECTION_PER_RADIUS) * radiusM;
}

/** Terminating acoustic impedance from the reflection coefficient (infinite for R = 1). */
export function terminationImpedance(reflection: Complex, characteristicImpedance: number): Complex {
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 10: Z = Zc (1 + R)/(1 - R)
  return cScale(cDiv(cAdd(complex(1), reflection), cSub(complex(1), reflection)), characteristicImpedance);
}

export { unflangedMagnitude, unflangedEndCorrectionPerRadius } from './open-unflanged';
export { flangedMagnitude, flangedEndCorrectionPerRadius } from './open-flanged';
