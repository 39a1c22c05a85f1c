import { describe, expect, it } from 'vitest';
import { formatTemperature, parseTemperature } from '@/lib/plan/units';
import { expectClose } from '../../acoustic/tolerance';

// t/°C = (t/°F − 32) / 1.8 (NIST SP 811, appendix B): 68 °F = 20 °C, 32 °F = 0 °C, -40 °F = -40 °C.
describe('temperatures', () => {
  it('reads °C and °F, with or without the degree sign, and a decimal comma', () => {
    const read = (text: string, defaultUnit: 'C' | 'F' = 'C') => {
      const result = parseTemperature(text, { defaultUnit });
      return result.ok ? result.valueC : result.message;
    };
    expect(read('20')).toBe(20);
    expect(read('20 °C')).toBe(20);
    expect(read('-5,5 c')).toBe(-5.5);
    expect(read('68 °F')).toBe(20);
    expect(read('32F')).toBe(0);
    expect(read('-40', 'F')).toBe(-40);
    expectClose(read('70 F') as number, 21.111111111111, 1e-9, '70 °F');
  });

  it('refuses text and out-of-range air temperatures', () => {
    expect(parseTemperature('warm', { defaultUnit: 'C' })).toEqual({ ok: false, message: '"warm" is not a temperature; type for example 20 °C or 68 °F.' });
    expect(parseTemperature('150 F', { defaultUnit: 'C' })).toEqual({ ok: false, message: 'The air temperature must be between -40 °C and 60 °C.' });
  });

  it('shows one decimal in the chosen system', () => {
    expect(formatTemperature(20, 'si')).toBe('20.0 °C');
    expect(formatTemperature(20, 'imperial')).toBe('68.0 °F');
    expect(parseTemperature('68 F', { defaultUnit: 'C' })).toMatchObject({ understood: '68 °F (20.0 °C)' });
  });
});
