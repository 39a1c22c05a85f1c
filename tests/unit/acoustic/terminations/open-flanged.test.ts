import { describe, it } from 'vitest';
import { flangedEndCorrectionPerRadius, flangedMagnitude } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const real = (value: number) => ({ re: value, im: 0 });

describe('open flanged end', () => {
  // Norris & Sheng (1989), J. Sound Vib. 135, 85: |R| = (1 + 0.323ka - 0.077(ka)^2)/(1 + 0.323ka + 0.923(ka)^2),
  // l/a = 0.8216 / (1 + (0.77ka)^2 / (1 + 0.77ka)); the sheet's [calc] values recomputed from them.
  const magnitude = (ka: number) => (1 + 0.323 * ka - 0.077 * ka * ka) / (1 + 0.323 * ka + 0.923 * ka * ka);
  const endCorrection = (ka: number) => 0.8216 / (1 + (0.77 * ka) ** 2 / (1 + 0.77 * ka));
  it.each([
    [0.1, 0.9904, 0.8171],
    [0.5, 0.8204, 0.7422],
    [1.0, 0.5548, 0.6154],
  ])('ka = %s follows Norris & Sheng (1989)', (ka, sheetMagnitude, sheetEndCorrection) => {
    expectClose(flangedMagnitude(real(ka)).re, magnitude(ka), 1e-12, `|R| formula at ${ka}`);
    expectClose(flangedEndCorrectionPerRadius(real(ka)).re, endCorrection(ka), 1e-12, `l/a formula at ${ka}`);
    expectClose(flangedMagnitude(real(ka)).re, sheetMagnitude, 5e-5, `|R| sheet at ${ka}`);
    expectClose(flangedEndCorrectionPerRadius(real(ka)).re, sheetEndCorrection, 5e-5, `l/a sheet at ${ka}`);
  });

  it('low-frequency end correction 0.8216 a, a little below the baffled piston 8/(3 pi) = 0.8488 (from memory)', () => {
    const lowFrequency = flangedEndCorrectionPerRadius(real(1e-7)).re;
    expectClose(lowFrequency, 0.8216, 1e-6, 'l/a as ka -> 0');
    expectClose(lowFrequency, 8 / (3 * Math.PI), 0.03, 'baffled piston');
  });
});
