// The air's own attenuation against ISO 9613-1 and the octave-band table of ISO 9613-2, and its place
// in the reverberation time (4 m V in Sabine's and Eyring's formulas).
import { describe, expect, it } from 'vitest';
import {
  airAttenuationBandDbPerM, airAttenuationDbPerM, energyAttenuationPerM, exactOctaveMidbandHz, eyringReverberationTimeS, roomBands, sabineReverberationTimeS,
} from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { uniformSurfaces } from './room-fixtures';

const OCTAVES = [63, 125, 250, 500, 1000, 2000, 4000, 8000];

describe('attenuation of air (ISO 9613-1 (1993), eqs. (3)–(5))', () => {
  it('20 °C, 50 % RH, 101.325 kPa: 0.0047, 0.0099, 0.0297 and 0.105 dB/m at 1, 2, 4 and 8 kHz (reference check values, calculated from the standard\'s equations)', () => {
    const conditions = { temperatureC: 20, relativeHumidityPercent: 50 };
    const expected = [[1000, 0.0047, 0.00005], [2000, 0.0099, 0.00005], [4000, 0.0297, 0.00005], [8000, 0.105, 0.0005]];
    for (const [hz, dbPerM, rounding] of expected) expectClose(airAttenuationDbPerM(hz, conditions), dbPerM, rounding, `${hz} Hz`);
  });

  // ISO 9613-2 (1996), Table 2: attenuation coefficient for octave bands of noise, dB/km, at the exact
  // mid-band frequencies (values from memory; printed to 0.1 dB/km, and to 1 dB/km from 100 up: checked to
  // 0.06 dB/km, a little over half the last digit, since a recalled table may round the other way at a 5)
  const TABLE_2: [number, number, number[]][] = [
    [10, 70, [0.1, 0.4, 1.0, 1.9, 3.7, 9.7, 32.8, 117]],
    [20, 70, [0.1, 0.3, 1.1, 2.8, 5.0, 9.0, 22.9, 76.6]],
    [30, 70, [0.1, 0.3, 1.0, 3.1, 7.4, 12.7, 23.1, 59.3]],
    [15, 20, [0.3, 0.6, 1.2, 2.7, 8.2, 28.2, 88.8, 202]],
    [15, 50, [0.1, 0.5, 1.2, 2.2, 4.2, 10.8, 36.2, 129]],
    [15, 80, [0.1, 0.3, 1.1, 2.4, 4.1, 8.3, 23.7, 82.8]],
  ];
  for (const [temperatureC, relativeHumidityPercent, row] of TABLE_2) {
    it(`octave bands at ${temperatureC} °C, ${relativeHumidityPercent} % RH match ISO 9613-2 Table 2 to its printed rounding (from memory)`, () => {
      row.forEach((dbPerKm, band) => {
        const rounding = dbPerKm >= 100 ? 0.5 : 0.06;
        expectClose(airAttenuationBandDbPerM(OCTAVES[band], { temperatureC, relativeHumidityPercent }) * 1000, dbPerKm, rounding, `${OCTAVES[band]} Hz`);
      });
    });
  }

  it('octave bands are taken at the exact mid-band frequencies 1000·10^(3k/10) (IEC 61260-1): 63 → 63.10, 8000 → 7943 Hz', () => {
    expectClose(exactOctaveMidbandHz(63), 1000 * 10 ** (-12 / 10), 1e-9, '63 Hz');
    expectClose(exactOctaveMidbandHz(1000), 1000, 1e-12, '1 kHz');
    expectClose(exactOctaveMidbandHz(8000), 1000 * 10 ** (9 / 10), 1e-9, '8 kHz');
  });

  it('refuses humidity outside 0..100 % and a temperature outside the engine\'s air limits, naming the field', () => {
    expect(() => airAttenuationDbPerM(1000, { temperatureC: 20, relativeHumidityPercent: 120 })).toThrow('relativeHumidityPercent');
    expect(() => airAttenuationDbPerM(1000, { temperatureC: 90, relativeHumidityPercent: 50 })).toThrow('temperatureC');
    expect(() => airAttenuationDbPerM(0, { temperatureC: 20, relativeHumidityPercent: 50 })).toThrow('frequencyHz must be > 0');
  });
});

describe('the air in the reverberation time (Sabine; Eyring (1930), JASA 1, 217; 4 m V as in Kuttruff, Room Acoustics, ch. 5)', () => {
  it('m = α / (10 lg e): 0.105 dB/m is 0.0242 per metre', () => {
    expectClose(energyAttenuationPerM(0.105), 0.105 / (10 * Math.log10(Math.E)), 1e-15, '[calc]');
    expectClose(energyAttenuationPerM(0.105), 0.02418, 5e-5, 'rounded');
  });

  it('Sabine T = 0.161 V / (A + 4 m V) and Eyring T = 0.161 V / (-S ln(1 - a) + 4 m V) [calc]', () => {
    expectClose(sabineReverberationTimeS(60, 18.8, 0.01), (0.161 * 60) / (18.8 + 4 * 0.01 * 60), 1e-12, 'Sabine with air');
    expectClose(eyringReverberationTimeS(60, 94, 0.2), (0.161 * 60) / (-94 * Math.log(0.8)), 1e-12, 'Eyring');
    expectClose(eyringReverberationTimeS(60, 94, 0.2, 0.01), (0.161 * 60) / (-94 * Math.log(0.8) + 2.4), 1e-12, 'Eyring with air');
    // Eyring is shorter than Sabine by the factor a / (-ln(1 - a)), 0.896 at a = 0.2
    expectClose(eyringReverberationTimeS(60, 94, 0.2) / sabineReverberationTimeS(60, 18.8), 0.2 / -Math.log(0.8), 1e-12, 'ratio');
  });

  it('a bare hall (14 × 10 × 6 m, a = 0.05): at 8 kHz the air (0.105 dB/m at 20 °C, 50 %) cuts T60 from 4.8 s to under 1.3 s; at 125 Hz it changes T60 by under 2 %', () => {
    const box = { lengthM: 14, widthM: 10, heightM: 6 };
    const volumeM3 = 840;
    const surfaceM2 = 2 * (140 + 84 + 60);
    const bands = roomBands(box, uniformSurfaces(0.05), OCTAVES);
    const withoutAir = (0.161 * volumeM3) / (0.05 * surfaceM2);
    expectClose(withoutAir, 4.762, 0.001, 'Sabine without air [calc]');
    // 8 kHz band at its exact mid-band frequency (7943 Hz): 103.9 dB/km (ISO 9613-1 equations, as the check above confirms at 8 kHz)
    const air8k = 4 * energyAttenuationPerM(0.1039) * volumeM3;
    expectClose(bands[7].airAbsorptionAreaM2, air8k, 0.05, '4 m V at 8 kHz');
    expectClose(bands[7].reverberationTimeS, (0.161 * volumeM3) / (0.05 * surfaceM2 + air8k), 0.005, 'T60 at 8 kHz');
    expect(bands[7].reverberationTimeS).toBeLessThan(1.3);
    expect(Math.abs(bands[1].reverberationTimeS / withoutAir - 1)).toBeLessThan(0.02);
  });
});
