// Reflection of a radiating open end from |R| and end correction: shared by the flanged and unflanged
// models. Written in scalar complex arithmetic into a caller's array, because the network evaluator
// calls it at every Newton step of the resonance search (complex ka, no allocation).
import type { Complex } from '../complex';

/** Writes a model quantity at complex ka into out: |R| into out[0..1], or l/a into out[2..3]. */
type ModelInto = (kaRe: number, kaIm: number, out: Float64Array) => void;

/** An open-end model's reflection in both forms: scalar into an array (hot path) and Complex-valued. */
export interface RadiatingEnd {
  reflectionInto(kaRe: number, kaIm: number, out: Float64Array, offset: number): void;
  magnitude(helmholtzNumber: Complex): Complex;
  endCorrectionPerRadius(helmholtzNumber: Complex): Complex;
  reflection(helmholtzNumber: Complex): Complex;
}

/**
 * Both published |R| fits share the form (1 + a x - b x^2) / (1 + a x + c x^2) with x = ka;
 * writes the value at complex x into out[0] (re) and out[1] (im).
 */
export function magnitudeFitInto(a: number, b: number, c: number, xRe: number, xIm: number, out: Float64Array): void {
  const squaredRe = xRe * xRe - xIm * xIm;
  const squaredIm = 2 * xRe * xIm;
  const numeratorRe = 1 + a * xRe - b * squaredRe;
  const numeratorIm = a * xIm - b * squaredIm;
  const denominatorRe = 1 + a * xRe + c * squaredRe;
  const denominatorIm = a * xIm + c * squaredIm;
  const norm = denominatorRe * denominatorRe + denominatorIm * denominatorIm;
  out[0] = (numeratorRe * denominatorRe + numeratorIm * denominatorIm) / norm;
  out[1] = (numeratorIm * denominatorRe - numeratorRe * denominatorIm) / norm;
}

/**
 * R = -|R| exp(-2 j k l) at the pipe's end plane (time convention exp(+j omega t)), from the magnitude
 * and end correction per radius already evaluated at complex ka; writes R into out[offset], out[offset + 1].
 */
export function openEndReflectionInto(
  kaRe: number,
  kaIm: number,
  magnitudeRe: number,
  magnitudeIm: number,
  endCorrectionRe: number,
  endCorrectionIm: number,
  out: Float64Array,
  offset: number,
): void {
  // Dalmont & Nederveen (2001), J. Sound Vib. 244, eq. (2): R = -|R| exp(-2 j k l), with k l = ka (l/a)
  const phaseRe = kaRe * endCorrectionRe - kaIm * endCorrectionIm;
  const phaseIm = kaRe * endCorrectionIm + kaIm * endCorrectionRe;
  // exp(-2 j (phaseRe + j phaseIm)) = exp(2 phaseIm) (cos 2 phaseRe - j sin 2 phaseRe)
  const scale = Math.exp(2 * phaseIm);
  const rotationRe = scale * Math.cos(2 * phaseRe);
  const rotationIm = -scale * Math.sin(2 * phaseRe);
  out[offset] = -(magnitudeRe * rotationRe - magnitudeIm * rotationIm);
  out[offset + 1] = -(magnitudeRe * rotationIm + magnitudeIm * rotationRe);
}

/** Builds an open-end model from its |R| and l/a fits. */
export function radiatingEnd(magnitudeInto: ModelInto, endCorrectionInto: ModelInto): RadiatingEnd {
  const scratch = new Float64Array(4);
  const reflectionInto = (kaRe: number, kaIm: number, out: Float64Array, offset: number): void => {
    magnitudeInto(kaRe, kaIm, scratch);
    endCorrectionInto(kaRe, kaIm, scratch);
    openEndReflectionInto(kaRe, kaIm, scratch[0], scratch[1], scratch[2], scratch[3], out, offset);
  };
  return {
    reflectionInto,
    magnitude(helmholtzNumber) {
      magnitudeInto(helmholtzNumber.re, helmholtzNumber.im, scratch);
      return { re: scratch[0], im: scratch[1] };
    },
    endCorrectionPerRadius(helmholtzNumber) {
      endCorrectionInto(helmholtzNumber.re, helmholtzNumber.im, scratch);
      return { re: scratch[2], im: scratch[3] };
    },
    reflection(helmholtzNumber) {
      const out = new Float64Array(2);
      reflectionInto(helmholtzNumber.re, helmholtzNumber.im, out, 0);
      return { re: out[0], im: out[1] };
    },
  };
}
