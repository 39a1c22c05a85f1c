import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { NR_COEFFICIENTS, nrRating, sumLevelsDb } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

describe('energy sum of levels (definition of the decibel): 10 log10 Σ 10^(L/10)', () => {
  it('two equal levels add 10 log 2 = 3.01 dB; ten equal levels add 10 dB', () => {
    expectClose(sumLevelsDb([60, 60]), 60 + 10 * Math.log10(2), 1e-12, 'two');
    expectClose(sumLevelsDb(Array(10).fill(47)), 57, 1e-12, 'ten');
  });
  it('70 and 60 dB -> 70.41 dB [calc: 10 log(10^7 + 10^6)]', () => {
    expectClose(sumLevelsDb([70, 60]), 10 * Math.log10(1e7 + 1e6), 1e-12, 'formula');
    expectClose(sumLevelsDb([70, 60]), 70.41, 0.005, '[calc]');
  });
  it('stays finite far beyond the range of 10^(L/10): 400 + 400 dB -> 403.01 dB', () => {
    expectClose(sumLevelsDb([400, 400]), 400 + 10 * Math.log10(2), 1e-9, 'large');
  });
  it('property: order-independent, and never below the loudest level', () => {
    const levelsAndReordering = fc
      .array(fc.double({ min: -50, max: 150, noNaN: true }), { minLength: 1, maxLength: 20 })
      .chain((levels) => fc.tuple(fc.constant(levels), fc.shuffledSubarray(levels, { minLength: levels.length, maxLength: levels.length })));
    fc.assert(
      fc.property(levelsAndReordering, ([levels, reordered]) => {
        expectClose(sumLevelsDb(reordered), sumLevelsDb(levels), 1e-9, 'reordered');
        expect(sumLevelsDb(levels)).toBeGreaterThanOrEqual(Math.max(...levels));
      }),
    );
  });
  it('refuses an empty list and a non-finite level, naming the field', () => {
    expect(() => sumLevelsDb([])).toThrow('levelsDb must be a non-empty array');
    expect(() => sumLevelsDb([50, Number.NaN])).toThrow('levelsDb[1] must be a finite number');
  });
});

describe('NR (ISO R 1996 (1971), after Kosten & van Os; coefficients from the check-values sheet, from memory)', () => {
  // (a, b) for 63 Hz to 8 kHz, L = a + b·NR, copied from the sheet.
  const SHEET_NR = [[35.5, 0.79], [22.0, 0.87], [12.0, 0.93], [4.8, 0.974], [0, 1.0], [-3.5, 1.015], [-6.1, 1.025], [-8.0, 1.03]];
  const curve = (nr: number) => SHEET_NR.map(([a, b]) => a + nr * b);

  it('the coefficients as in the sheet, not rounded', () => {
    expect(NR_COEFFICIENTS.map(({ a, b }) => [a, b])).toEqual(SHEET_NR);
  });
  it('the NR 25 curve, as usually tabulated rounded to whole dB (55 44 35 29 25 22 20 18, from memory), lies within 0.5 dB of a + 25 b', () => {
    const tabulated = [55, 44, 35, 29, 25, 22, 20, 18];
    curve(25).forEach((levelDb, band) => expectClose(levelDb, tabulated[band], 0.5, `band ${band}`));
    expectClose(nrRating(curve(25)), 25, 1e-12, 'a curve rates as itself');
  });
  it('the rating is the highest band rating, (L - a)/b, not rounded: 1 kHz at 31.3 dB over a flat NR 20 spectrum -> NR 31.3', () => {
    const nr20 = curve(20);
    nr20[4] = 31.3;
    expectClose(nrRating(nr20), 31.3, 1e-12, '1 kHz controls');
    // 125 Hz at 60 dB: (60 - 22) / 0.87 = 43.68.
    nr20[1] = 60;
    expectClose(nrRating(nr20), (60 - 22) / 0.87, 1e-12, '125 Hz controls');
  });
  it('refuses a spectrum of the wrong length, naming the field', () => {
    expect(() => nrRating([40, 40])).toThrow('octaveDb must have 8 bands');
  });
});
