// Open pipe end in an infinite flange (an outlet flush with a large wall).
import { FLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { cAdd, cDiv, cMul, cScale, cSub, complex, type Complex } from '../complex';
import { openEndReflection } from './open-end';

/** |R| of a flanged pipe, a fit to the exact baffled-pipe radiation. */
export function flangedMagnitude(helmholtzNumber: Complex): Complex {
  const squared = cMul(helmholtzNumber, helmholtzNumber);
  // Norris & Sheng (1989), J. Sound Vib. 135, 85, eq. (23): |R| = (1 + 0.323ka - 0.077(ka)^2)/(1 + 0.323ka + 0.923(ka)^2)
  const numerator = cSub(cAdd(complex(1), cScale(helmholtzNumber, 0.323)), cScale(squared, 0.077));
  const denominator = cAdd(cAdd(complex(1), cScale(helmholtzNumber, 0.323)), cScale(squared, 0.923));
  return cDiv(numerator, denominator);
}

/** End correction per radius l/a of a flanged pipe; tends to 0.8216 as ka -> 0. */
export function flangedEndCorrectionPerRadius(helmholtzNumber: Complex): Complex {
  const scaled = cScale(helmholtzNumber, 0.77);
  // Norris & Sheng (1989), J. Sound Vib. 135, 85, eq. (24): l/a = 0.8216 / (1 + (0.77ka)^2 / (1 + 0.77ka))
  const correction = cDiv(cMul(scaled, scaled), cAdd(complex(1), scaled));
  return cDiv(complex(FLANGED_END_CORRECTION_PER_RADIUS), cAdd(complex(1), correction));
}

/** Pressure reflection coefficient of a flanged open end at (possibly complex) ka. */
export function flangedReflection(helmholtzNumber: Complex): Complex {
  return openEndReflection(helmholtzNumber, flangedMagnitude(helmholtzNumber), flangedEndCorrectionPerRadius(helmholtzNumber));
}
