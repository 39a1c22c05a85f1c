// The zero predicted from two samples of the deflated logarithmic derivative r = g'/g. Newton's step
// f - 1/r treats g as (f - a) alone; the other zeros add a background to r that bends the step (its
// error is about that background times the distance squared). Modelling the background as a constant,
// g = (f - a) exp(b f), so r = 1/(f - a) + b, two samples r0 at f0 and r1 at f1 fix both unknowns:
//   1/(f0 - a) - 1/(f1 - a) = r0 - r1  =>  (f0 - a)(f1 - a) = (f1 - f0) / (r0 - r1),
// a quadratic in a whose roots are (f0 + f1)/2 +- sqrt(((f1 - f0)/2)^2 + (f1 - f0)/(r0 - r1))
// (derived here from g; the same idea as a rational model of the logarithmic derivative).
import type { RatioSample } from './ratio-sample';

/** The model's root, into out[0..1]: the one nearer Newton's prediction from the second sample. False if the samples cannot tell. */
export function twoPointZero(first: RatioSample, second: RatioSample, out: Float64Array): boolean {
  const dfRe = second.re - first.re;
  const dfIm = second.im - first.im;
  const drRe = first.ratioRe - second.ratioRe;
  const drIm = first.ratioIm - second.ratioIm;
  const drNorm = drRe * drRe + drIm * drIm;
  const secondNorm = second.ratioRe * second.ratioRe + second.ratioIm * second.ratioIm;
  if (drNorm === 0 || secondNorm === 0) return false;
  // q = (f1 - f0) / (r0 - r1)
  const qRe = (dfRe * drRe + dfIm * drIm) / drNorm;
  const qIm = (dfIm * drRe - dfRe * drIm) / drNorm;
  // w = ((f1 - f0) / 2)^2 + q, and its principal square root s
  const halfRe = dfRe / 2;
  const halfIm = dfIm / 2;
  const wRe = halfRe * halfRe - halfIm * halfIm + qRe;
  const wIm = 2 * halfRe * halfIm + qIm;
  const wMagnitude = Math.hypot(wRe, wIm);
  const sRe = Math.sqrt((wMagnitude + wRe) / 2);
  const sImAbs = Math.sqrt(Math.max(0, (wMagnitude - wRe) / 2));
  const sIm = wIm < 0 ? -sImAbs : sImAbs;
  const midRe = (first.re + second.re) / 2;
  const midIm = (first.im + second.im) / 2;
  // Newton's prediction from the second sample, f1 - 1/r1, picks the root
  const newtonRe = second.re - second.ratioRe / secondNorm;
  const newtonIm = second.im + second.ratioIm / secondNorm;
  const plusDistance = Math.hypot(midRe + sRe - newtonRe, midIm + sIm - newtonIm);
  const minusDistance = Math.hypot(midRe - sRe - newtonRe, midIm - sIm - newtonIm);
  const sign = plusDistance <= minusDistance ? 1 : -1;
  out[0] = midRe + sign * sRe;
  out[1] = midIm + sign * sIm;
  return Number.isFinite(out[0]) && Number.isFinite(out[1]);
}
