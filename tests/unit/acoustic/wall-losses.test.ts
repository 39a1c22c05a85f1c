import { describe, it } from 'vitest';
import { airProperties, kirchhoffAttenuationNpPerM, sabineLinedDuctDbPerM } from '@/lib/acoustic';
import { expectClose } from './tolerance';

describe('wall losses and lining', () => {
  it('Kirchhoff attenuation (P/2S)(1/c) sqrt(omega nu/2)[1 + (gamma-1)/sqrt(Pr)]: a = 0.1 m, 1 kHz -> 9.35e-3 Np/m (Kinsler & Frey ch. 9; sheet)', () => {
    const air = { ...airProperties(20), dynamicViscosityPaS: 1.814e-5, densityKgM3: 1.2041, speedOfSoundMps: 343.2 };
    const radiusM = 0.1;
    const perimeterM = 2 * Math.PI * radiusM;
    const areaM2 = Math.PI * radiusM * radiusM;
    const omega = 2 * Math.PI * 1000;
    const expected = (perimeterM / (2 * areaM2)) * (1 / 343.2) * Math.sqrt((omega * (1.814e-5 / 1.2041)) / 2) * (1 + 0.4 / Math.sqrt(0.71));
    const attenuation = kirchhoffAttenuationNpPerM(1000, perimeterM, areaM2, air);
    expectClose(attenuation, expected, 1e-15, 'formula');
    expectClose(attenuation, 9.35e-3, 5e-6, 'sheet Np/m');
    expectClose(attenuation * 8.686, 0.081, 5e-4, 'sheet dB/m');
  });

  it('the engine\'s own air (Sutherland viscosity) gives the same attenuation within 0.1 %', () => {
    const radiusM = 0.1;
    const attenuation = kirchhoffAttenuationNpPerM(1000, 2 * Math.PI * radiusM, Math.PI * radiusM ** 2, airProperties(20));
    expectClose(attenuation / 9.35e-3, 1, 1e-3, 'ratio');
  });

  it('Sabine lined duct 1.05 alpha^1.4 P/S dB/m: 0.3 x 0.3 m, alpha 0.6 -> 6.85 dB/m (from memory)', () => {
    const expected = 1.05 * 0.6 ** 1.4 * (1.2 / 0.09);
    expectClose(sabineLinedDuctDbPerM(0.6, 1.2, 0.09), expected, 1e-12, 'formula');
    expectClose(sabineLinedDuctDbPerM(0.6, 1.2, 0.09), 6.85, 0.005, 'sheet');
  });
});
