// Rounding of analysis answers: to a step, and to significant figures. Checked against the definitions
// (a multiple of the step, within half of it; the digits ECMAScript's Number.prototype.toPrecision
// gives, ECMA-262 §21.1.3.5) and against the short decimal form JSON prints.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FREQUENCY_STEP_HZ, POSITION_STEP_M, toSignificant, toStep } from '@/lib/analysis/answer-precision';

const decimalsPrinted = (value: number) => (JSON.stringify(value).split('.')[1] ?? '').length;

describe('toStep', () => {
  it('gives a multiple of the step within half a step, printed with no more decimals than the step has', () => {
    fc.assert(fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (value) => {
      for (const [step, decimals] of [[FREQUENCY_STEP_HZ, 3], [POSITION_STEP_M, 4]] as const) {
        const rounded = toStep(value, step);
        expect(Math.abs(rounded - value)).toBeLessThanOrEqual(step / 2 + 1e-9 * Math.max(1, Math.abs(value)));
        expect(decimalsPrinted(rounded)).toBeLessThanOrEqual(decimals);
      }
    }), { numRuns: 2000, seed: 20 });
  });

  it('keeps examples as written: 100.81249 Hz -> 100.812, 12.34567 m -> 12.3457, 0.00004 m -> 0', () => {
    expect(JSON.stringify(toStep(100.81249, FREQUENCY_STEP_HZ))).toBe('100.812');
    expect(JSON.stringify(toStep(12.34567, POSITION_STEP_M))).toBe('12.3457');
    expect(toStep(0.00004, POSITION_STEP_M)).toBe(0);
  });
});

describe('toSignificant', () => {
  it('agrees with Number.prototype.toPrecision(4) away from ties (ECMA-262 §21.1.3.5)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-12, max: 1e12, noNaN: true }), fc.boolean(), (magnitude, negative) => {
      const value = negative ? -magnitude : magnitude;
      const digits = Math.abs(value).toPrecision(12).replace('.', '').replace(/^0+/, '');
      fc.pre(!/^\d{4}(50|49)/.test(digits));  // a tie at the fifth figure may round either way
      expect(toSignificant(value)).toBe(Number(value.toPrecision(4)));
    }), { numRuns: 3000, seed: 20 });
  });

  it('leaves 0, NaN and the infinities alone', () => {
    expect(toSignificant(0)).toBe(0);
    expect(toSignificant(Number.NaN)).toBeNaN();
    expect(toSignificant(Number.POSITIVE_INFINITY)).toBe(Number.POSITIVE_INFINITY);
  });
});
