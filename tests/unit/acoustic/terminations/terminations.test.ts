import { describe, it } from 'vitest';
import { lowFrequencyEndCorrectionM, terminationImpedance, terminationReflection } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const at = { re: 100, im: 0 };

describe('terminations', () => {
  it('a rigid end reflects with R = +1 (Kinsler & Frey, ch. 10)', () => {
    const reflection = terminationReflection({ kind: 'closed' }, at, 0.1, 343.2);
    expectClose(reflection.re, 1, 0, 'Re R');
    expectClose(reflection.im, 0, 0, 'Im R');
  });

  it('a lined end has |R| = sqrt(1 - absorption), phase 0 (engine contract; Kinsler & Frey ch. 6, alpha = 1 - |R|^2)', () => {
    for (const absorption of [0, 0.19, 0.5, 0.96, 1]) {
      const reflection = terminationReflection({ kind: 'lined', absorption }, at, 0.1, 343.2);
      expectClose(1 - reflection.re ** 2, absorption, 1e-12, `alpha ${absorption}`);
      expectClose(reflection.im, 0, 0, 'phase 0');
    }
  });

  it('an anechoic end reflects nothing', () => {
    const reflection = terminationReflection({ kind: 'anechoic' }, at, 0.1, 343.2);
    expectClose(Math.hypot(reflection.re, reflection.im), 0, 0, '|R|');
  });

  it('impedance end: zeta = 2 gives R = 1/3 and alpha = 8/9, and Z = Zc (1 + R)/(1 - R) inverts it (Kinsler & Frey ch. 10)', () => {
    const zeta = 2;
    const reflection = (zeta - 1) / (zeta + 1);
    expectClose(reflection, 1 / 3, 1e-15, 'R');
    expectClose(1 - reflection ** 2, 8 / 9, 1e-15, 'alpha');
    const impedance = terminationImpedance({ re: reflection, im: 0 }, 415);
    expectClose(impedance.re, 2 * 415, 1e-9, 'Z');
  });

  it('the open-end phase follows R = -|R| exp(-2 j k l) (tmmt convention, sheet)', () => {
    const radiusM = 0.1;
    const ka = (2 * Math.PI * 100 * radiusM) / 343.2;
    const reflection = terminationReflection({ kind: 'open', flange: 'unflanged' }, at, radiusM, 343.2);
    const magnitude = (1 + 0.2 * ka - 0.084 * ka * ka) / (1 + 0.2 * ka + 0.416 * ka * ka);
    const endCorrection = radiusM * 0.6133 * ((1 + 0.044 * ka * ka) / (1 + 0.19 * ka * ka) - 0.02 * Math.sin(2 * ka) ** 2);
    const k = ka / radiusM;
    expectClose(reflection.re, -magnitude * Math.cos(2 * k * endCorrection), 1e-12, 'Re R');
    expectClose(reflection.im, magnitude * Math.sin(2 * k * endCorrection), 1e-12, 'Im R');
  });

  it('low-frequency end corrections: 0.6133 a unflanged, 0.8216 a flanged, 0 otherwise', () => {
    expectClose(lowFrequencyEndCorrectionM({ kind: 'open', flange: 'unflanged' }, 0.1), 0.06133, 1e-15, 'unflanged');
    expectClose(lowFrequencyEndCorrectionM({ kind: 'open', flange: 'flanged' }, 0.1), 0.08216, 1e-15, 'flanged');
    expectClose(lowFrequencyEndCorrectionM({ kind: 'closed' }, 0.1), 0, 0, 'closed');
    expectClose(lowFrequencyEndCorrectionM({ kind: 'lined', absorption: 0.5 }, 0.1), 0, 0, 'lined');
  });
});
