import { describe, expect, it } from 'vitest';
import { defaultLengthUnit, formatLength, gridStepM, keptLength, parseLength, plausibilityWarning } from '@/lib/plan/units';

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
    expect(formatLength(0.25, 'imperial', 'section')).toBe('9.843 in'); // 250 / 25.4 = 9.8425…
  });

  it('what it shows reads back to the same rounded value', () => {
    for (const valueM of [0.4572, 3.7, 12.05]) {
      const shown = formatLength(valueM, 'imperial', 'run');
      const read = parseLength(shown, { defaultUnit: 'ft' });
      expect(read.ok && Math.abs(read.valueM - valueM) <= IN_M / 8).toBe(true);
    }
  });
});

describe('digit grouping and the default unit', () => {
  it('reads digits grouped in threes with a plain, thin, narrow or no-break space', () => {
    expect(valueOf('10 000 mm')).toBe(10);
    expect(valueOf('10\u2009000 mm')).toBe(10);
    expect(valueOf('10\u202f000 mm')).toBe(10);
    expect(valueOf('10\u00a0000 mm')).toBe(10);
    expect(valueOf('1 250 000', 'mm')).toBe(1250);
    expect(valueOf('12 500,5 mm')).toBe(12.5005);
    // Mixed numbers and feet-and-inches are not digit groups.
    expect(valueOf('6 1/2 in')).toBe(0.1651);
    expect(valueOf('1 ft 6 in')).toBe(0.4572);
  });

  it('a bare number is read in the field\'s unit for the person\'s system', () => {
    expect(defaultLengthUnit('si', 'section')).toBe('mm');
    expect(defaultLengthUnit('si', 'run')).toBe('m');
    expect(defaultLengthUnit('imperial', 'section')).toBe('in');
    expect(defaultLengthUnit('imperial', 'run')).toBe('ft');
    expect(valueOf('12', defaultLengthUnit('si', 'run'))).toBe(12);
    expect(valueOf('12', defaultLengthUnit('imperial', 'run'))).toBe(3.6576); // 12 × 0.3048 m
  });

  it('reads a typographic minus as a minus (and refuses the negative length)', () => {
    expect(valueOf('\u22123 m')).toBe('A length cannot be negative.');
  });
});

describe('the imperial round trip', () => {
  it('retyping the shown inches gives back the exact millimetre', () => {
    // 600 mm = 23.622047… in (600 / 25.4); shown to 0.001 in, read back and kept.
    const shown = formatLength(0.6, 'imperial', 'section');
    expect(shown).toBe('23.622 in');
    const read = parseLength(shown, { defaultUnit: 'in' });
    expect(read.ok && formatLength(read.valueM, 'si', 'section')).toBe('600 mm');
    expect(read.ok && keptLength(read.valueM, 0.6, 'imperial', 'section')).toBe(0.6);
  });

  it('a different value typed is taken as read', () => {
    const read = parseLength('24 in', { defaultUnit: 'in' });
    expect(read.ok && keptLength(read.valueM, 0.6, 'imperial', 'section')).toBe(0.6096); // 24 × 25.4 mm
  });

  it('a value in other units that shows the same as the current one is still taken as typed', () => {
    // 9 ft 10 in = 118 × 0.0254 m = 2.9972 m (international inch), shown as "3.00 m" like the 3 m it replaces
    const read = parseLength('9 ft 10 in', { defaultUnit: 'm' });
    expect(read.ok && formatLength(read.valueM, 'si', 'run')).toBe(formatLength(3, 'si', 'run'));
    expect(read.ok && keptLength(read.valueM, 3, 'si', 'run')).toBeCloseTo(2.9972, 12);
  });

  it('every whole millimetre from 50 to 2500 shown in inches reads back to the same millimetre', () => {
    for (let millimetres = 50; millimetres <= 2500; millimetres += 1) {
      const read = parseLength(formatLength(millimetres / 1000, 'imperial', 'section'), { defaultUnit: 'in' });
      expect(read.ok && Math.round(read.valueM * 1e4) / 10).toBe(millimetres);
    }
  });
});

describe('plausibility warnings (common practice, no source: duct 50 mm to 2.5 m, liner 6 to 100 mm)', () => {
  it('warns about a 5 m duct and a 2 mm duct but not a 250 mm one', () => {
    expect(plausibilityWarning(5, 'duct-size', 'si')).toMatch(/^5000 mm is larger than ducts are usually made/);
    expect(plausibilityWarning(0.002, 'duct-size', 'si')).toMatch(/^2 mm is smaller than ducts are usually made/);
    expect(plausibilityWarning(0.25, 'duct-size', 'si')).toBeNull();
    expect(plausibilityWarning(0.025, 'lining', 'si')).toBeNull();
    expect(plausibilityWarning(0.3, 'lining', 'imperial')).toMatch(/^11.811 in is larger than duct linings/);
  });
});

describe('grid steps', () => {
  it('are round in each system: 0.5 m, and 1 ft = 0.3048 m exactly', () => {
    expect(gridStepM('si')).toBe(0.5);
    expect(gridStepM('imperial')).toBe(FT_M);
    expect(formatLength(gridStepM('imperial'), 'imperial', 'run')).toBe('1 ft 0 in');
  });
});
