// The minus sign shown in numbers is U+2212 MINUS SIGN (Unicode standard, chapter 6: "the minus sign
// is preferred to the hyphen-minus for mathematical use").
import { describe, expect, it } from 'vitest';
import { changeFixed, signedFixed } from '@/lib/signed-number';

describe('numbers with a minus sign', () => {
  it('shows "−" for negatives, nothing for rounding to zero', () => {
    expect(signedFixed(-3.25, 1)).toBe('\u22123.3'); // toFixed rounds 3.25 as the double 3.25 → "3.3"
    expect(signedFixed(2, 1)).toBe('2.0');
    expect(signedFixed(-0.04, 1)).toBe('0.0');
    expect(signedFixed(-0.4, 0)).toBe('0');
    expect(signedFixed(Number.NaN, 1)).toBe('—');
  });

  it('marks changes with + or −', () => {
    expect(changeFixed(1.5, 1)).toBe('+1.5');
    expect(changeFixed(-2, 1)).toBe('\u22122.0');
    expect(changeFixed(0.01, 1)).toBe('0.0');
  });
});
