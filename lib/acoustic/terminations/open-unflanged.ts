// Open unflanged pipe end radiating into free space.
import { UNFLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { cAdd, cDiv, cMul, cScale, cSin, cSub, complex, type Complex } from '../complex';
import { openEndReflection } from './open-end';

/**
 * |R| of an unflanged pipe. Fit to Levine & Schwinger's (1948) exact result.
 * The fit deviates from the exact values by up to about 0.005 in |R| for ka <= 2.
 */
export function unflangedMagnitude(helmholtzNumber: Complex): Complex {
  const squared = cMul(helmholtzNumber, helmholtzNumber);
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (9): |R| = (1 + 0.2ka - 0.084(ka)^2)/(1 + 0.2ka + 0.416(ka)^2)
  const numerator = cSub(cAdd(complex(1), cScale(helmholtzNumber, 0.2)), cScale(squared, 0.084));
  const denominator = cAdd(cAdd(complex(1), cScale(helmholtzNumber, 0.2)), cScale(squared, 0.416));
  return cDiv(numerator, denominator);
}

/** End correction per radius l/a of an unflanged pipe; tends to 0.6133 as ka -> 0 (Levine & Schwinger 1948). */
export function unflangedEndCorrectionPerRadius(helmholtzNumber: Complex): Complex {
  const squared = cMul(helmholtzNumber, helmholtzNumber);
  const sine = cSin(cScale(helmholtzNumber, 2));
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (10): l/a = 0.6133[(1 + 0.044(ka)^2)/(1 + 0.19(ka)^2) - 0.02 sin^2(2ka)]
  const ratio = cDiv(cAdd(complex(1), cScale(squared, 0.044)), cAdd(complex(1), cScale(squared, 0.19)));
  return cScale(cSub(ratio, cScale(cMul(sine, sine), 0.02)), UNFLANGED_END_CORRECTION_PER_RADIUS);
}

/** Pressure reflection coefficient of an unflanged open end at (possibly complex) ka. */
export function unflangedReflection(helmholtzNumber: Complex): Complex {
  return openEndReflection(helmholtzNumber, unflangedMagnitude(helmholtzNumber), unflangedEndCorrectionPerRadius(helmholtzNumber));
}
