// Open unflanged pipe end radiating into free space.
import { UNFLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { magnitudeFitInto, radiatingEnd } from './open-end';

/**
 * |R| of an unflanged pipe at complex ka, into out[0..1]. Fit to Levine & Schwinger's (1948) exact result;
 * it deviates from the exact values by up to about 0.005 in |R| for ka <= 2.
 */
export function unflangedMagnitudeInto(kaRe: number, kaIm: number, out: Float64Array): void {
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (9): |R| = (1 + 0.2ka - 0.084(ka)^2)/(1 + 0.2ka + 0.416(ka)^2)
  magnitudeFitInto(0.2, 0.084, 0.416, kaRe, kaIm, out);
}

/** End correction per radius l/a of an unflanged pipe at complex ka, into out[2..3]; tends to 0.6133 as ka -> 0. */
export function unflangedEndCorrectionInto(kaRe: number, kaIm: number, out: Float64Array): void {
  const squaredRe = kaRe * kaRe - kaIm * kaIm;
  const squaredIm = 2 * kaRe * kaIm;
  // (1 + 0.044 x^2) / (1 + 0.19 x^2)
  const numeratorRe = 1 + 0.044 * squaredRe, numeratorIm = 0.044 * squaredIm;
  const denominatorRe = 1 + 0.19 * squaredRe, denominatorIm = 0.19 * squaredIm;
  const norm = denominatorRe * denominatorRe + denominatorIm * denominatorIm;
  const ratioRe = (numeratorRe * denominatorRe + numeratorIm * denominatorIm) / norm;
  const ratioIm = (numeratorIm * denominatorRe - numeratorRe * denominatorIm) / norm;
  // sin(2x) = sin(2 Re x) cosh(2 Im x) + j cos(2 Re x) sinh(2 Im x)
  const sineRe = Math.sin(2 * kaRe) * Math.cosh(2 * kaIm);
  const sineIm = Math.cos(2 * kaRe) * Math.sinh(2 * kaIm);
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (10): l/a = 0.6133[(1 + 0.044(ka)^2)/(1 + 0.19(ka)^2) - 0.02 sin^2(2ka)]
  out[2] = UNFLANGED_END_CORRECTION_PER_RADIUS * (ratioRe - 0.02 * (sineRe * sineRe - sineIm * sineIm));
  out[3] = UNFLANGED_END_CORRECTION_PER_RADIUS * (ratioIm - 0.02 * 2 * sineRe * sineIm);
}

const model = radiatingEnd(unflangedMagnitudeInto, unflangedEndCorrectionInto);

/** Pressure reflection coefficient of an unflanged open end at complex ka, into out[offset], out[offset + 1]. */
export const unflangedReflectionInto = model.reflectionInto;
/** |R| of an unflanged pipe at (possibly complex) ka. */
export const unflangedMagnitude = model.magnitude;
/** End correction per radius l/a of an unflanged pipe; tends to 0.6133 as ka -> 0 (Levine & Schwinger 1948). */
export const unflangedEndCorrectionPerRadius = model.endCorrectionPerRadius;
/** Pressure reflection coefficient of an unflanged open end at (possibly complex) ka. */
export const unflangedReflection = model.reflection;
