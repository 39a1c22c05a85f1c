import { describe, expect, it } from 'vitest';
import { NC_CURVES, ncRating } from '@/lib/acoustic';

describe('NC rating (ANSI S12.2 curves, tangency)', () => {
  it('textbook worked example 61 56 54 50 44 43 39 34 -> NC-46 interpolated, 500 Hz controls (sheet)', () => {
    expect(ncRating([61, 56, 54, 50, 44, 43, 39, 34])).toBe(46);
  });

  it.each(NC_CURVES.map((curve) => [curve.rating, curve.levelsDb] as const))('a spectrum equal to NC-%s rates %s', (rating, levelsDb) => {
    expect(ncRating([...levelsDb])).toBe(rating);
  });

  it('one band 1 dB over NC-40 in its band, halfway to NC-45 at 8 kHz (37 -> 42), rates 41 (linear interpolation)', () => {
    const spectrum = [...NC_CURVES[5].levelsDb];
    spectrum[7] += 1;
    expect(ncRating(spectrum)).toBe(41);
  });

  it('rejects a spectrum of the wrong length and non-finite levels with the field named', () => {
    expect(() => ncRating([40, 40])).toThrow(RangeError);
    expect(() => ncRating([40, 40, 40, NaN, 40, 40, 40, 40])).toThrow('octaveDb[3] must be a finite number');
  });
});
