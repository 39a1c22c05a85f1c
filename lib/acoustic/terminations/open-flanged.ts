// Open pipe end in an infinite flange (an outlet flush with a large wall).
import { FLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { magnitudeFitInto, radiatingEnd } from './open-end';

/** |R| of a flanged pipe at complex ka, into out[0..1]: a fit to the exact baffled-pipe radiation. */
export function flangedMagnitudeInto(kaRe: number, kaIm: number, out: Float64Array): void {
  // Norris & Sheng (1989), J. Sound Vib. 135, 85, eq. (23): |R| = (1 + 0.323ka - 0.077(ka)^2)/(1 + 0.323ka + 0.923(ka)^2)
  magnitudeFitInto(0.323, 0.077, 0.923, kaRe, kaIm, out);
}

/** End correction per radius l/a of a flanged pipe at complex ka, into out[2..3]; tends to 0.8216 as ka -> 0. */
export function flangedEndCorrectionInto(kaRe: number, kaIm: number, out: Float64Array): void {
  const scaledRe = 0.77 * kaRe, scaledIm = 0.77 * kaIm;
  // q = y^2 / (1 + y), y = 0.77 ka
  const squaredRe = scaledRe * scaledRe - scaledIm * scaledIm, squaredIm = 2 * scaledRe * scaledIm;
  const belowRe = 1 + scaledRe, belowIm = scaledIm;
  const belowNorm = belowRe * belowRe + belowIm * belowIm;
  const quotientRe = (squaredRe * belowRe + squaredIm * belowIm) / belowNorm;
  const quotientIm = (squaredIm * belowRe - squaredRe * belowIm) / belowNorm;
  // Norris & Sheng (1989), J. Sound Vib. 135, 85, eq. (24): l/a = 0.8216 / (1 + (0.77ka)^2 / (1 + 0.77ka))
  const denominatorRe = 1 + quotientRe, denominatorIm = quotientIm;
  const norm = denominatorRe * denominatorRe + denominatorIm * denominatorIm;
  out[2] = (FLANGED_END_CORRECTION_PER_RADIUS * denominatorRe) / norm;
  out[3] = (-FLANGED_END_CORRECTION_PER_RADIUS * denominatorIm) / norm;
}

const model = radiatingEnd(flangedMagnitudeInto, flangedEndCorrectionInto);

/** Pressure reflection coefficient of a flanged open end at complex ka, into out[offset], out[offset + 1]. */
export const flangedReflectionInto = model.reflectionInto;
/** |R| of a flanged pipe at (possibly complex) ka. */
export const flangedMagnitude = model.magnitude;
/** End correction per radius l/a of a flanged pipe; tends to 0.8216 as ka -> 0. */
export const flangedEndCorrectionPerRadius = model.endCorrectionPerRadius;
/** Pressure reflection coefficient of a flanged open end at (possibly complex) ka. */
export const flangedReflection = model.reflection;
