// Reflection of a radiating open end from |R| and end correction: shared by the flanged and unflanged models.
import { cExp, cMul, type Complex } from '../complex';

/**
 * R = -|R| exp(-2 j k l) at the pipe's end plane (time convention exp(+j omega t)); magnitude and
 * end correction per radius are given as complex-analytic functions of ka so the model also
 * holds at complex frequency.
 */
export function openEndReflection(helmholtzNumber: Complex, magnitude: Complex, endCorrectionPerRadius: Complex): Complex {
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (2): R = -|R| exp(-2 j k l)
  const phase = cMul(helmholtzNumber, endCorrectionPerRadius);
  const rotation = cExp({ re: 2 * phase.im, im: -2 * phase.re });
  const reflection = cMul(magnitude, rotation);
  return { re: -reflection.re, im: -reflection.im };
}
