// The pressure envelope |p(x)| / max |p| of a resonance along the main path, sampled from the
// closed-form standing wave in each segment, p(x) = p0 cos kx - j Zc U0 sin kx (Kinsler & Frey,
// Fundamentals of Acoustics, ch. 10), at every segment boundary and at least SAMPLES_PER_HALF_WAVELENGTH
// points per half wavelength, the interior samples thinned so the total stays near MAX_ENVELOPE_SAMPLES.
// Within a segment the samples are equally spaced and cos kx, sin kx advance by the angle-addition
// formulas (one complex cos/sin per segment). One sampler serves all the resonances of a run.
import { complexCosSin } from '../network/complex-trig';
import type { PressureEnvelopePoint } from '../types';
import { doubled } from './grow';

/** Samples per half wavelength, enough to draw a smooth curve. */
export const SAMPLES_PER_HALF_WAVELENGTH = 12;
/** Target number of samples per resonance; segment boundaries are always sampled, so runs of more segments exceed it. */
export const MAX_ENVELOPE_SAMPLES = 400;
/** Guards ceil() against a length that is a whole number of spacings up to rounding. */
const STEP_COUNT_SLACK = 1e-9;

export class EnvelopeSampler {
  private positionsM = new Float64Array(MAX_ENVELOPE_SAMPLES);
  private magnitudes = new Float64Array(MAX_ENVELOPE_SAMPLES);
  private count = 0;
  private spacingM = 1;
  /** Factor from the path state (rescaled at tees) to one amplitude along the whole path. */
  private amplitude = 1;
  private readonly trig = new Float64Array(4);

  /** Starts a new resonance. */
  reset(wavelengthM: number, pathLengthM: number, segmentCount: number): void {
    const interiorBudget = Math.max(1, MAX_ENVELOPE_SAMPLES - segmentCount - 1);
    this.spacingM = Math.max(wavelengthM / (2 * SAMPLES_PER_HALF_WAVELENGTH), pathLengthM / interiorBudget);
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
