import { describe, expect, it } from 'vitest';
import { A_WEIGHTING_OCTAVE_DB, aWeightedLevelDb, bladePassHarmonicsHz, bladePassHz, NC_CURVES, ncCriterionCurveDb, ncRating } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

describe('A-weighting (IEC 61672-1, Table 3)', () => {
  it('octave corrections -26.2, -16.1, -8.6, -3.2, 0, +1.2, +1.0, -1.1 dB', () => {
    expect(A_WEIGHTING_OCTAVE_DB).toEqual([-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1]);
  });
  it('60 dB flat in all eight bands -> 66.99 dB(A) (sheet [calc])', () => {
    const calc = 10 * Math.log10([-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1].reduce((sum, a) => sum + 10 ** ((60 + a) / 10), 0));
    expectClose(aWeightedLevelDb(Array(8).fill(60)), calc, 1e-12, '[calc]');
    expectClose(aWeightedLevelDb(Array(8).fill(60)), 66.99, 0.005, 'sheet');
  });
  it('rejects a spectrum of the wrong length, naming the field', () => {
    expect(() => aWeightedLevelDb([60, 60])).toThrow(/octaveDb must have 8 bands/);
  });
});

describe('NC criterion curves (ANSI S12.2, Table 1)', () => {
  it('each tabulated curve rates as itself, and the criterion curve of a tabulated value is that row', () => {
    for (const curve of NC_CURVES) {
      expect(ncRating([...curve.levelsDb])).toBe(curve.rating);
      expect(ncCriterionCurveDb(curve.rating)).toEqual([...curve.levelsDb]);
    }
  });
  it('NC-37.5 lies midway between NC-35 and NC-40 (linear interpolation, as in the rating)', () => {
    const [low, high] = [NC_CURVES[4].levelsDb, NC_CURVES[5].levelsDb];
    ncCriterionCurveDb(37.5).forEach((levelDb, band) => expectClose(levelDb, (low[band] + high[band]) / 2, 1e-12, `band ${band}`));
  });
});

describe('fan tones (common practice, no source)', () => {
  it('12 blades at 1200 rpm -> 240 Hz; harmonics 240, 480, 720 Hz', () => {
    expect(bladePassHz(12, 1200)).toBe(240);
    expect(bladePassHarmonicsHz(12, 1200, 3)).toEqual([240, 480, 720]);
  });
});
