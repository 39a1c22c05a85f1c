// One sample of the deflated logarithmic derivative r = D'/D - sum 1/(f - z_i) at a complex frequency, with
// the known zeros that were deflated from it (their positions in the sorted ZeroList). Two samples with the
// same deflated zeros are samples of one function, which the two-point step needs.
export class RatioSample {
  re = 0;
  im = 0;
  ratioRe = 0;
  ratioIm = 0;
  firstDeflated = 0;
  lastDeflated = -1;
  /** Whether the sample holds anything. */
  held = false;

  set(re: number, im: number, ratioRe: number, ratioIm: number, firstDeflated: number, lastDeflated: number): void {
    this.re = re;
    this.im = im;
    this.ratioRe = ratioRe;
    this.ratioIm = ratioIm;
    this.firstDeflated = firstDeflated;
    this.lastDeflated = lastDeflated;
    this.held = true;
  }

  copy(other: RatioSample): void {
    this.set(other.re, other.im, other.ratioRe, other.ratioIm, other.firstDeflated, other.lastDeflated);
    this.held = other.held;
  }
}
