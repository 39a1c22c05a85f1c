// The zeros found so far, kept sorted by real part, with Maehly's deflation of a logarithmic derivative:
// (D / prod (f - z_i))' / (D / prod (f - z_i)) = D'/D - sum 1/(f - z_i) over the zeros near f.
import { doubled } from './grow';
import type { NaturalFrequency } from './natural-frequencies';

const INITIAL_CAPACITY = 64;
/** Relative distance under which two zeros are the same zero. */
const SAME_ZERO_RELATIVE = 1e-6;

export class ZeroList {
  private re = new Float64Array(INITIAL_CAPACITY);
  private im = new Float64Array(INITIAL_CAPACITY);
  private count = 0;
  /** The deflated ratio after deflate(). */
  ratioRe = 0;
  ratioIm = 0;
  /** After deflate(): the positions of the first and last zero deflated (last < first when none). */
  deflatedFirst = 0;
  deflatedLast = -1;

  get length(): number {
    return this.count;
  }

  /** Inserts a zero, keeping the list sorted by real part (zeros mostly arrive in ascending order). */
  add(frequencyHz: number, dampingHz: number): void {
    if (this.count === this.re.length) {
      this.re = doubled(this.re);
      this.im = doubled(this.im);
    }
    let position = this.count;
    while (position > 0 && this.re[position - 1] > frequencyHz) {
      this.re[position] = this.re[position - 1];
      this.im[position] = this.im[position - 1];
      position--;
    }
    this.re[position] = frequencyHz;
    this.im[position] = dampingHz;
    this.count++;
  }

  /** Real part and damping of the highest zero (the list must not be empty). */
  lastRe(): number {
    return this.re[this.count - 1];
  }

  lastIm(): number {
    return this.im[this.count - 1];
  }

  /** The zeros with real part strictly between lowHz and highHz, ascending. */
  between(lowHz: number, highHz: number): NaturalFrequency[] {
    const zeros: NaturalFrequency[] = [];
    let index = this.count - 1;
    while (index >= 0 && this.re[index] >= highHz) index--;
    for (; index >= 0 && this.re[index] > lowHz; index--) zeros.unshift({ frequencyHz: this.re[index], dampingHz: this.im[index] });
    return zeros;
  }

  contains(frequencyHz: number, dampingHz: number): boolean {
    const tolerance = SAME_ZERO_RELATIVE * Math.max(1, frequencyHz);
    for (let index = 0; index < this.count; index++) {
      if (Math.abs(this.re[index] - frequencyHz) < tolerance && Math.abs(this.im[index] - dampingHz) < tolerance) return true;
    }
    return false;
  }

  /**
   * Subtracts 1/(z - z_i) for the zeros with |Re(z - z_i)| <= windowHz from the ratio, into ratioRe/ratioIm.
   * Returns false when z sits exactly on a known zero.
   */
  deflate(zRe: number, zIm: number, ratioRe: number, ratioIm: number, windowHz: number): boolean {
    let deflatedRe = ratioRe;
    let deflatedIm = ratioIm;
    // Sorted: find the last zero at or below zRe + window, walk down to zRe - window.
    let index = this.count - 1;
    while (index >= 0 && this.re[index] > zRe + windowHz) index--;
    const last = index;
    for (; index >= 0 && this.re[index] >= zRe - windowHz; index--) {
      const offsetRe = zRe - this.re[index];
      const offsetIm = zIm - this.im[index];
      const offsetNorm = offsetRe * offsetRe + offsetIm * offsetIm;
      if (offsetNorm === 0) return false;
      deflatedRe -= offsetRe / offsetNorm;
      deflatedIm += offsetIm / offsetNorm;
    }
    this.ratioRe = deflatedRe;
    this.ratioIm = deflatedIm;
    this.deflatedFirst = index + 1;
    this.deflatedLast = last;
    return true;
  }

  toArray(): NaturalFrequency[] {
    const zeros: NaturalFrequency[] = [];
    for (let index = 0; index < this.count; index++) zeros.push({ frequencyHz: this.re[index], dampingHz: this.im[index] });
    return zeros;
  }
}
