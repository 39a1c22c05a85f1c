import { describe, expect, it } from 'vitest';
import { formatLength, parseLength } from '@/lib/plan/units';

// Exact definitions: 1 in = 25.4 mm and 1 ft = 12 in = 0.3048 m (international yard and pound agreement, 1959;
// NIST SP 811, appendix B). Results are rounded to the picometre, so these compare exactly.
const IN_M = 0.0254;
const FT_M = 0.3048;

function valueOf(text: string, defaultUnit: 'm' | 'mm' | 'ft' | 'in' = 'm'): number | string {
  const result = parseLength(text, { defaultUnit });
  return result.ok ? result.valueM : result.message;
}

describe('parseLength', () => {
  it('reads metric lengths', () => {
    expect(valueOf('300 mm')).toBe(0.3);
    expect(valueOf('0.3 m')).toBe(0.3);
    expect(valueOf('25 cm')).toBe(0.25);
    expect(valueOf('2.5')).toBe(2.5);
    expect(valueOf('250', 'mm')).toBe(0.25);
    expect(valueOf('  12 M ')).toBe(12);
  });

  it('reads imperial lengths against the exact definitions (values worked by hand in decimal)', () => {
    expect(valueOf('12 in')).toBe(0.3048); // 12 × 25.4 mm
    expect(valueOf('12"')).toBe(0.3048);
    expect(valueOf('40 ft')).toBe(12.192); // 40 × 0.3048 m
    expect(valueOf('1 ft 6 in')).toBe(0.4572); // 0.3048 + 6 × 0.0254
    expect(valueOf(`1' 6"`)).toBe(0.4572);
    expect(valueOf('1 ft 6')).toBe(0.4572);
    expect(valueOf('6 1/2 in')).toBe(0.1651); // 6.5 × 0.0254
    expect(valueOf('12 ft 3 1/4 in')).toBe(3.74015); // 3.6576 + 0.08255
    expect(valueOf('10', 'in')).toBe(0.254);
    expect(valueOf('3 feet')).toBe(0.9144);
  });

  it('reads a decimal comma, refusing the ambiguous thousands form and mixed separators', () => {
    expect(valueOf('1,5 m')).toBe(1.5);
    expect(valueOf('1,500 mm')).toBe('"1,500 mm" could mean a thousand times more or less; write it without the comma, or with a point.');
    expect(valueOf('1,5.0 m')).toBe('"1,5.0 m": use a comma or a point for decimals, not both.');
  });

  it('says what it understood', () => {
    expect(parseLength('1 ft 6 in', { defaultUnit: 'm' })).toEqual({ ok: true, valueM: 0.4572, understood: '1 ft 6 in (457.2 mm)' });
    expect(parseLength('300 mm', { defaultUnit: 'm' })).toMatchObject({ understood: '300 mm' });
    expect(parseLength('40 ft', { defaultUnit: 'm' })).toMatchObject({ understood: '40 ft (12.192 m)' });
    expect(parseLength('2,5', { defaultUnit: 'm' })).toMatchObject({ understood: '2.5 m' });
  });

  it('refuses nonsense, other quantities, negatives and zero (unless allowed) with a clear message', () => {
    expect(valueOf('12x')).toBe('"x" is not a unit we know; use mm, m, in or ft.');
    expect(valueOf('3 kg')).toBe('"kg" is not a unit of length; use mm, m, in or ft.');
    expect(valueOf('abc')).toBe('"abc" is not a number; type a length such as 300 mm or 12 in.');
    expect(valueOf('-3 m')).toBe('A length cannot be negative.');
    expect(valueOf('0 mm')).toBe('A length must be more than zero.');
    expect(parseLength('0 mm', { defaultUnit: 'm', allowZero: true })).toMatchObject({ ok: true, valueM: 0 });
    expect(valueOf('')).toBe('Type a length, for example 300 mm, 2.5 m, 12 in or 1 ft 6 in.');
    expect(valueOf('3 6 m')).toBe('"3" needs a unit, for example 3 mm or 3 in.');
  });
});

describe('formatLength', () => {
  it('SI: runs in m to 2 decimals, sections in mm', () => {
    expect(formatLength(12.3456, 'si', 'run')).toBe('12.35 m');
    expect(formatLength(0.25, 'si', 'section')).toBe('250 mm');
    expect(formatLength(0.0125, 'si', 'section')).toBe('12.5 mm');
  });

  it('imperial: runs in ft-in to the nearest 1/4 in, sections in inches', () => {
    expect(formatLength(12 * FT_M + 3.25 * IN_M, 'imperial', 'run')).toBe('12 ft 3 1/4 in');
    expect(formatLength(6.5 * IN_M, 'imperial', 'run')).toBe('6 1/2 in');
    expect(formatLength(FT_M * 2 + 11.9 * IN_M, 'imperial', 'run')).toBe('3 ft 0 in');
    expect(formatLength(10 * IN_M, 'imperial', 'section')).toBe('10 in');
    expect(formatLength(0.25, 'imperial', 'section')).toBe('9.84 in');
  });

  it('what it shows reads back to the same rounded value', () => {
    for (const valueM of [0.4572, 3.7, 12.05]) {
      const shown = formatLength(valueM, 'imperial', 'run');
      const read = parseLength(shown, { defaultUnit: 'ft' });
      expect(read.ok && Math.abs(read.valueM - valueM) <= IN_M / 8).toBe(true);
    }
  });
});
