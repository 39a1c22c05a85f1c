// The results say which resonances the search promises to list: every one damped less than half the mean
// mode spacing c / 2L (a pipe's modes lie c / 2L apart: Kinsler & Frey, Fundamentals of Acoustics,
// ch. 10; the promise itself is checked in tests/unit/acoustic/oracle/zero-count.test.ts).
import { describe, expect, it } from 'vitest';
import { analyzeRun, speedOfSound } from '@/lib/acoustic';

describe('the results state the search’s promise with the run’s own mode spacing', () => {
  it('a 5 m duct with a 2 m branch at 20 °C: c / 2L over the 7 m of duct', () => {
    const section = { shape: 'round' as const, diameterM: 0.3 };
    const analysis = analyzeRun({
      segments: [
        { lengthM: 2, section, branches: [{ segments: [{ lengthM: 2, section }], end: { kind: 'closed' } }] },
        { lengthM: 3, section },
      ],
      start: { kind: 'closed' },
      end: { kind: 'open', flange: 'unflanged' },
      temperatureC: 20,
    });
    const spacingHz = speedOfSound(20) / (2 * 7);
    const line = analysis.assumptions.find((assumption) => assumption.startsWith('Resonances:'));
    expect(line).toBeDefined();
    expect(line).toContain(`damped less than ${(spacingHz / 2).toFixed(1)} Hz (half the mean mode spacing over all 7.0 m of duct`);
  });
});
