import { describe, it } from 'vitest';
import { unflangedEndCorrectionPerRadius, unflangedMagnitude } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const real = (value: number) => ({ re: value, im: 0 });

describe('open unflanged end', () => {
  // Levine & Schwinger (1948), Phys. Rev. 73, 383: exact |R| and l/a evaluated numerically (reference sheet).
  // The engine uses the Dalmont & Nederveen (2001) fit; measured against these values it deviates by at
  // most 0.0045 in |R| (at ka = 1) over ka <= 2, by at most 0.002 in l/a over ka <= 1.5, and by 0.014 in
  // l/a at ka = 2 (3.4 %): those are the tolerances here.
  const exact: Array<[number, number, number]> = [
    [0.1, 0.9951, 0.611],
    [0.2, 0.9809, 0.606],
    [0.3, 0.9587, 0.6],
    [0.5, 0.8964, 0.582],
    [1.0, 0.6951, 0.527],
    [1.5, 0.5008, 0.471],
    [2.0, 0.3462, 0.417],
  ];
  it.each(exact)('ka = %s: |R| and l/a against Levine & Schwinger (1948)', (ka, magnitude, endCorrection) => {
    expectClose(unflangedMagnitude(real(ka)).re, magnitude, 0.005, `|R| at ka ${ka}`);
    expectClose(unflangedEndCorrectionPerRadius(real(ka)).re, endCorrection, ka <= 1.5 ? 0.0025 : 0.015, `l/a at ka ${ka}`);
  });

  it('low-frequency end correction is 0.6133 a (Levine & Schwinger 1948)', () => {
    expectClose(unflangedEndCorrectionPerRadius(real(1e-6)).re, 0.6133, 1e-9, 'l/a as ka -> 0');
  });

  it('low-ka radiation loss |R| ~ 1 - (ka)^2 / 2 (Levine & Schwinger 1948, from Z/Zc ~ (ka)^2/4)', () => {
    for (const ka of [0.02, 0.05]) {
      expectClose(unflangedMagnitude(real(ka)).re, 1 - (ka * ka) / 2, 0.2 * ka * ka, `|R| at ka ${ka}`);
    }
  });
});
