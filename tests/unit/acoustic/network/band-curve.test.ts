// The band curve that carries per-band wall and lining attenuation into the transfer-matrix chain.
import { describe, expect, it } from 'vitest';
import { BandCurveWeights, bandCurveAt, bandCurveSlopes } from '@/lib/acoustic/network/band-curve';

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
const values = [0.13, 0.075, 0.038, 0.012, 0.012, 0.012, 0.012, 0.012];
const slopes = bandCurveSlopes(values);

function complexValue(re: number, im: number): [number, number] {
  const weights = new BandCurveWeights();
  weights.prepare(re, im);
  const w = weights.value;
  const band = weights.band;
  const parts = [values[band], slopes[band], values[band + 1], slopes[band + 1]];
  return [parts.reduce((sum, part, index) => sum + part * w[2 * index], 0), parts.reduce((sum, part, index) => sum + part * w[2 * index + 1], 0)];
}

describe('band curve (monotone cubic Hermite in ln f, Fritsch & Butland 1984)', () => {
  it('passes through every band value and holds the end values beyond the bands', () => {
    BANDS_HZ.forEach((hz, band) => expect(bandCurveAt(values, slopes, hz)).toBeCloseTo(values[band], 12));
    expect(bandCurveAt(values, slopes, 20)).toBe(values[0]);
    expect(bandCurveAt(values, slopes, 12000)).toBe(values[7]);
  });

  it('keeps the shape of the data: no overshoot between falling band values', () => {
    for (let hz = 63; hz <= 500; hz *= 1.01) {
      const value = bandCurveAt(values, slopes, hz);
      expect(value).toBeLessThanOrEqual(0.13 + 1e-12);
      expect(value).toBeGreaterThanOrEqual(0.012 - 1e-12);
    }
  });

  it('is analytic off the real axis (Cauchy–Riemann: d/df along re and im agree) and its d/df weights are the derivative', () => {
    const h = 1e-4;
    for (const [re, im] of [[90, 3], [180, 12], [700, 40]]) {
      const [aRe, aIm] = complexValue(re + h, im);
      const [bRe, bIm] = complexValue(re - h, im);
      const [cRe, cIm] = complexValue(re, im + h);
      const [dRe, dIm] = complexValue(re, im - h);
      // df along the real axis: (A - B) / 2h; along the imaginary: (C - D) / (2 j h)
      const alongRe = [(aRe - bRe) / (2 * h), (aIm - bIm) / (2 * h)];
      const alongIm = [(cIm - dIm) / (2 * h), -(cRe - dRe) / (2 * h)];
      expect(alongRe[0]).toBeCloseTo(alongIm[0], 7);
      expect(alongRe[1]).toBeCloseTo(alongIm[1], 7);
      const weights = new BandCurveWeights();
      weights.prepare(re, im);
      const band = weights.band;
      const parts = [values[band], slopes[band], values[band + 1], slopes[band + 1]];
      const slopeRe = parts.reduce((sum, part, index) => sum + part * weights.slope[2 * index], 0);
      const slopeIm = parts.reduce((sum, part, index) => sum + part * weights.slope[2 * index + 1], 0);
      expect(slopeRe).toBeCloseTo(alongRe[0], 7);
      expect(slopeIm).toBeCloseTo(alongRe[1], 7);
    }
  });
});
