import { describe, it } from 'vitest';
import { endReflectionLoss, speedOfSound, unflangedMagnitude } from '@/lib/acoustic';
import { expectClose } from './tolerance';

const bandsHz = [63, 125, 250, 500, 1000];

describe('end reflection loss', () => {
  // ERL = 10 log10[1 + (a1 c / (pi f D))^a2], a1 = 0.7 flush, 1.0 free, a2 = 2 (ASHRAE RP-1314, 2007; from memory).
  const formula = (a1: number, hz: number, diameterM: number) => 10 * Math.log10(1 + ((a1 * speedOfSound(20)) / (Math.PI * hz * diameterM)) ** 2);

  it('flush outlet, D = 0.3048 m: 12.3, 7.0, 3.0, 1.0, 0.3 dB (sheet [calc])', () => {
    const values = endReflectionLoss(0.3048, 'flush', bandsHz);
    bandsHz.forEach((hz, index) => expectClose(values[index], formula(0.7, hz, 0.3048), 1e-12, `formula ${hz} Hz`));
    [12.3, 7.0, 3.0, 1.0, 0.3].forEach((expected, index) => expectClose(values[index], expected, 0.05, `sheet ${bandsHz[index]} Hz`));
  });

  it('free outlet, D = 0.3048 m: 15.2, 9.6, 4.9, 1.8, 0.5 dB (sheet [calc])', () => {
    const values = endReflectionLoss(0.3048, 'free', bandsHz);
    bandsHz.forEach((hz, index) => expectClose(values[index], formula(1.0, hz, 0.3048), 1e-12, `formula ${hz} Hz`));
    [15.2, 9.6, 4.9, 1.8, 0.5].forEach((expected, index) => expectClose(values[index], expected, 0.05, `sheet ${bandsHz[index]} Hz`));
  });

  it('free-space form agrees with -10 log(1 - |R|^2) of Levine & Schwinger within 0.15 dB for ka <= 1 (sheet; via the Dalmont fit)', () => {
    const diameterM = 0.3;
    for (const ka of [0.1, 0.2, 0.4, 0.7, 1.0]) {
      const hz = (ka * speedOfSound(20)) / (Math.PI * diameterM);
      const magnitude = unflangedMagnitude({ re: ka, im: 0 }).re;
      // Fit tolerance adds about 0.05 dB at ka = 1.
      expectClose(endReflectionLoss(diameterM, 'free', [hz])[0], -10 * Math.log10(1 - magnitude ** 2), 0.2, `ka ${ka}`);
    }
  });
});
