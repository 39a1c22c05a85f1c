// A per-octave-band quantity (attenuation along a duct) as a smooth curve of frequency that the
// transfer-matrix chain can evaluate at complex frequencies: a monotone cubic Hermite curve in
// u = ln f through the band values (Fritsch & Butland 1984, SIAM J. Sci. Stat. Comput. 5, 300),
// held flat below the first band and above the last. Each piece is a polynomial in ln f, so the
// curve continues analytically off the real axis (Newton's method on D(f) needs that), and is
// continuous with a continuous slope across the bands.
import { OCTAVE_BANDS_HZ } from '../constants';

export const BAND_COUNT = OCTAVE_BANDS_HZ.length;
const LOG_BANDS = OCTAVE_BANDS_HZ.map((hz) => Math.log(hz));
const PIECE_WIDTHS = LOG_BANDS.slice(1).map((logHz, index) => logHz - LOG_BANDS[index]);

/** Slopes dy/du at each band for a shape-preserving curve; 0 at the two ends so the flat hold joins smoothly. */
export function bandCurveSlopes(values: ArrayLike<number>): number[] {
  const secants = PIECE_WIDTHS.map((width, piece) => (values[piece + 1] - values[piece]) / width);
  return OCTAVE_BANDS_HZ.map((_, band) => {
    if (band === 0 || band === BAND_COUNT - 1) return 0;
    const left = secants[band - 1];
    const right = secants[band];
    if (left * right <= 0) return 0;
    const leftWidth = PIECE_WIDTHS[band - 1];
    const rightWidth = PIECE_WIDTHS[band];
    // Fritsch & Butland: weighted harmonic mean of the neighbouring secants
    return (3 * (leftWidth + rightWidth)) / ((2 * rightWidth + leftWidth) / left + (rightWidth + 2 * leftWidth) / right);
  });
}

/**
 * Weights of the curve at one complex frequency, shared by every curve: value = sum over the piece's
 * two bands of y w + m w' (and the same for d/df). Filled by prepare().
 */
export class BandCurveWeights {
  /** The piece's first band. */
  band = 0;
  /** Value weights of y[band], m[band], y[band + 1], m[band + 1], as re/im pairs. */
  readonly value = new Float64Array(8);
  /** d/df of the value weights, as re/im pairs. */
  readonly slope = new Float64Array(8);

  prepare(frequencyRe: number, frequencyIm: number): void {
    const magnitude = Math.hypot(frequencyRe, frequencyIm) || Number.MIN_VALUE;
    const logMagnitude = Math.log(magnitude);
    const value = this.value;
    const slope = this.slope;
    if (logMagnitude <= LOG_BANDS[0] || logMagnitude >= LOG_BANDS[BAND_COUNT - 1]) {
      value.fill(0);
      slope.fill(0);
      // held flat: the first band's value below the first band, the last band's above the last
      this.band = logMagnitude <= LOG_BANDS[0] ? 0 : BAND_COUNT - 2;
      value[logMagnitude <= LOG_BANDS[0] ? 0 : 4] = 1;
      return;
    }
    let band = 0;
    while (LOG_BANDS[band + 1] < logMagnitude) band++;
    this.band = band;
    const width = PIECE_WIDTHS[band];
    // t = (ln f - u_k) / h, complex: ln f = ln|f| + j arg f
    const tRe = (logMagnitude - LOG_BANDS[band]) / width;
    const tIm = Math.atan2(frequencyIm, frequencyRe) / width;
    const t2Re = tRe * tRe - tIm * tIm;
    const t2Im = 2 * tRe * tIm;
    const t3Re = t2Re * tRe - t2Im * tIm;
    const t3Im = t2Re * tIm + t2Im * tRe;
    // Cubic Hermite basis h00 = 2t³ - 3t² + 1, h10 = t³ - 2t² + t, h01 = -2t³ + 3t², h11 = t³ - t² (slopes carry the width h)
    value[0] = 2 * t3Re - 3 * t2Re + 1;
    value[1] = 2 * t3Im - 3 * t2Im;
    value[2] = width * (t3Re - 2 * t2Re + tRe);
    value[3] = width * (t3Im - 2 * t2Im + tIm);
    value[4] = -2 * t3Re + 3 * t2Re;
    value[5] = -2 * t3Im + 3 * t2Im;
    value[6] = width * (t3Re - t2Re);
    value[7] = width * (t3Im - t2Im);
    // d/du of the basis, divided by h (dt/du = 1/h), then d/df = (d/du) / f
    const norm = magnitude * magnitude;
    const inverseRe = frequencyRe / norm / width;
    const inverseIm = -frequencyIm / norm / width;
    // Each basis slope (re, im) times 1 / (f h), written out: a closure here would cost a call per frequency.
    const d00Re = 6 * t2Re - 6 * tRe, d00Im = 6 * t2Im - 6 * tIm;
    const d10Re = width * (3 * t2Re - 4 * tRe + 1), d10Im = width * (3 * t2Im - 4 * tIm);
    const d11Re = width * (3 * t2Re - 2 * tRe), d11Im = width * (3 * t2Im - 2 * tIm);
    slope[0] = d00Re * inverseRe - d00Im * inverseIm;
    slope[1] = d00Re * inverseIm + d00Im * inverseRe;
    slope[2] = d10Re * inverseRe - d10Im * inverseIm;
    slope[3] = d10Re * inverseIm + d10Im * inverseRe;
    // h01' = -h00'
    slope[4] = -slope[0];
    slope[5] = -slope[1];
    slope[6] = d11Re * inverseRe - d11Im * inverseIm;
    slope[7] = d11Re * inverseIm + d11Im * inverseRe;
  }
}

/**
 * The real part of one curve at the frequency weights were prepared for: the curve's BAND_COUNT values
 * and slopes start at offset in values and slopes (the exact value at a real frequency).
 */
export function bandCurveValue(values: ArrayLike<number>, slopes: ArrayLike<number>, offset: number, weights: BandCurveWeights): number {
  const at = offset + weights.band;
  const w = weights.value;
  return values[at] * w[0] + slopes[at] * w[2] + values[at + 1] * w[4] + slopes[at + 1] * w[6];
}

/** The curve through values (with slopes from bandCurveSlopes) at a real frequency. */
export function bandCurveAt(values: ArrayLike<number>, slopes: ArrayLike<number>, frequencyHz: number): number {
  const weights = new BandCurveWeights();
  weights.prepare(frequencyHz, 0);
  return bandCurveValue(values, slopes, 0, weights);
}
