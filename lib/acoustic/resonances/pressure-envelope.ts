// The pressure envelope |p(x)| / max |p| of a resonance along the main path, sampled from the
// closed-form standing wave in each segment, p(x) = p0 cos kx - j Zc U0 sin kx (Kinsler & Frey,
// Fundamentals of Acoustics, ch. 10), at every segment boundary and SAMPLES_PER_HALF_WAVELENGTH points
// per half wavelength: a resonance of order n has about n half wavelengths along the path, so its
// envelope has about n * SAMPLES_PER_HALF_WAVELENGTH samples plus one per segment, whatever the run's
// length in metres. Within a segment the samples are equally spaced and cos kx, sin kx advance by the
// angle-addition formulas (one complex cos/sin per segment). One sampler serves all the resonances of a run.
import { complexCosSin } from '../network/complex-trig';
import type { PressureEnvelopePoint } from '../types';
import { doubled } from './grow';

/**
 * Samples per half wavelength. Drawn as straight lines between samples, a lobe |cos kx| departs from
 * its chord by at most 1 - cos(pi / 16), under 2 % of the envelope's height (common practice, no source:
 * enough for a plot; the nodes and antinodes themselves are listed exactly beside the envelope).
 */
export const SAMPLES_PER_HALF_WAVELENGTH = 8;
/** Room for this many samples before the buffers grow. */
const INITIAL_CAPACITY = 256;
/** Guards ceil() against a length that is a whole number of spacings up to rounding. */
const STEP_COUNT_SLACK = 1e-9;

export class EnvelopeSampler {
  private positionsM = new Float64Array(INITIAL_CAPACITY);
  private magnitudes = new Float64Array(INITIAL_CAPACITY);
  private count = 0;
  private spacingM = 1;
  /** Factor from the path state (rescaled at tees) to one amplitude along the whole path. */
  private amplitude = 1;
  private readonly trig = new Float64Array(4);

  /** Starts a new resonance of this wavelength. */
  reset(wavelengthM: number): void {
    this.spacingM = wavelengthM / (2 * SAMPLES_PER_HALF_WAVELENGTH);
    this.count = 0;
    this.amplitude = 1;
  }

  private push(positionM: number, magnitude: number): void {
    if (this.count === this.positionsM.length) {
      this.positionsM = doubled(this.positionsM);
      this.magnitudes = doubled(this.magnitudes);
    }
    this.positionsM[this.count] = positionM;
    this.magnitudes[this.count] = magnitude;
    this.count++;
  }

  /** Samples one segment from its start (x = 0, included) to just before its end; b = -j Zc U0 there. */
  sampleSegment(offsetM: number, lengthM: number, wavenumberRe: number, wavenumberIm: number, pRe: number, pIm: number, bRe: number, bIm: number): void {
    const steps = Math.max(1, Math.ceil(lengthM / this.spacingM - STEP_COUNT_SLACK));
    const stepM = lengthM / steps;
    complexCosSin(wavenumberRe * stepM, wavenumberIm * stepM, this.trig);
    const stepCosRe = this.trig[0], stepCosIm = this.trig[1], stepSinRe = this.trig[2], stepSinIm = this.trig[3];
    let cosRe = 1, cosIm = 0, sinRe = 0, sinIm = 0;
    for (let index = 0; index < steps; index++) {
      const valueRe = pRe * cosRe - pIm * cosIm + bRe * sinRe - bIm * sinIm;
      const valueIm = pRe * cosIm + pIm * cosRe + bRe * sinIm + bIm * sinRe;
      this.push(offsetM + index * stepM, Math.sqrt(valueRe * valueRe + valueIm * valueIm) * this.amplitude);
      // cos(a + d) = cos a cos d - sin a sin d; sin(a + d) = sin a cos d + cos a sin d
      const nextCosRe = cosRe * stepCosRe - cosIm * stepCosIm - (sinRe * stepSinRe - sinIm * stepSinIm);
      const nextCosIm = cosRe * stepCosIm + cosIm * stepCosRe - (sinRe * stepSinIm + sinIm * stepSinRe);
      const nextSinRe = sinRe * stepCosRe - sinIm * stepCosIm + cosRe * stepSinRe - cosIm * stepSinIm;
      sinIm = sinRe * stepCosIm + sinIm * stepCosRe + cosRe * stepSinIm + cosIm * stepSinRe;
      cosRe = nextCosRe;
      cosIm = nextCosIm;
      sinRe = nextSinRe;
    }
  }

  /** The path state was multiplied by a factor of this magnitude (at a tee); later samples divide it out. */
  rescale(stateFactor: number): void {
    if (stateFactor > 0 && Number.isFinite(stateFactor)) this.amplitude /= stateFactor;
  }

  /** The sample at the far end of the path. */
  sampleEnd(positionM: number, pRe: number, pIm: number): void {
    this.push(positionM, Math.sqrt(pRe * pRe + pIm * pIm) * this.amplitude);
  }

  finish(): PressureEnvelopePoint[] {
    const count = this.count;
    const positionsM = this.positionsM;
    const magnitudes = this.magnitudes;
    let largest = 0;
    for (let index = 0; index < count; index++) if (magnitudes[index] > largest) largest = magnitudes[index];
    const divisor = largest > 0 && Number.isFinite(largest) ? largest : 1;
    const points: PressureEnvelopePoint[] = [];
    for (let index = 0; index < count; index++) points.push({ positionM: positionsM[index], relative: magnitudes[index] / divisor });
    return points;
  }
}
