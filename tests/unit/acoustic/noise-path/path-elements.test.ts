import { describe, expect, it } from 'vitest';
import { branchPowerSplitDb, elbowAttenuationDb, plenumAttenuationDb } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
const INCH_M = 0.0254; // International Yard and Pound Agreement (1959)

describe('branch power split (ASHRAE Handbook, HVAC Applications, noise and vibration chapter)', () => {
  it('two equal branches: 10 log 2 = 3.01 dB; 0.1 m² of 0.4 m²: 10 log 4 = 6.02 dB (sheet [calc])', () => {
    expectClose(branchPowerSplitDb(0.2, 0.4), 10 * Math.log10(2), 1e-12, 'equal');
    expectClose(branchPowerSplitDb(0.2, 0.4), 3.01, 0.005, 'sheet equal');
    expectClose(branchPowerSplitDb(0.1, 0.4), 10 * Math.log10(4), 1e-12, 'quarter');
    expectClose(branchPowerSplitDb(0.1, 0.4), 6.02, 0.005, 'sheet quarter');
  });
  it('the whole flow down one branch loses nothing; a branch larger than the total is refused by name', () => {
    expect(branchPowerSplitDb(0.3, 0.3)).toBe(0);
    expect(() => branchPowerSplitDb(0.5, 0.4)).toThrow(RangeError);
    expect(() => branchPowerSplitDb(0.5, 0.4)).toThrow('branchAreaM2 must be <= totalAreaM2');
    expect(() => branchPowerSplitDb(0.1, 0)).toThrow('totalAreaM2 must be > 0');
  });
});

describe('plenum (Wells 1958, Noise Control 4)', () => {
  // TL = -10 log10[S_out (Q cos θ / (4π r²) + (1 - α)/(S α))]
  const wells = (outletAreaM2: number, surfaceAreaM2: number, alpha: number, distanceM: number, angleDeg: number, q: number) =>
    -10 * Math.log10(outletAreaM2 * ((q * Math.cos((angleDeg * Math.PI) / 180)) / (4 * Math.PI * distanceM ** 2) + (1 - alpha) / (surfaceAreaM2 * alpha)));

  it('S_out 0.5 m², S 12 m², α 0.5, r 1.5 m, θ 30°, Q 2 (the default for an inlet in a wall): 11.41 dB [calc]', () => {
    const plenum = { outletAreaM2: 0.5, surfaceAreaM2: 12, absorption: 0.5, distanceM: 1.5, angleDeg: 30 };
    expectClose(plenumAttenuationDb(plenum), wells(0.5, 12, 0.5, 1.5, 30, 2), 1e-12, 'formula');
    expectClose(plenumAttenuationDb(plenum), 11.41, 0.005, '[calc]');
    expect(plenumAttenuationDb({ ...plenum, directivity: 2 })).toBe(plenumAttenuationDb(plenum));
    expectClose(plenumAttenuationDb({ ...plenum, directivity: 1 }), wells(0.5, 12, 0.5, 1.5, 30, 1), 1e-12, 'Q = 1');
  });
  it('outlet at 90° to the inlet: the reverberant part alone, -10 log(S_out (1 - α)/(S α))', () => {
    const plenum = { outletAreaM2: 0.3, surfaceAreaM2: 20, absorption: 0.7, distanceM: 2, angleDeg: 90 };
    expectClose(plenumAttenuationDb(plenum), -10 * Math.log10((0.3 * 0.3) / (20 * 0.7)), 1e-9, 'reverberant only');
  });
  it('refuses an absorption of 0 (no reverberant decay) or above 1, and an angle outside 0..90°', () => {
    const plenum = { outletAreaM2: 0.3, surfaceAreaM2: 20, absorption: 0, distanceM: 2, angleDeg: 45 };
    expect(() => plenumAttenuationDb(plenum)).toThrow('absorption must be > 0');
    expect(() => plenumAttenuationDb({ ...plenum, absorption: 1.2 })).toThrow('absorption must be between 0 and 1');
    expect(() => plenumAttenuationDb({ ...plenum, absorption: 0.5, angleDeg: 120 })).toThrow('angleDeg must be between 0 and 90');
  });
});

describe('elbows (ASHRAE Handbook, HVAC Applications, noise chapter: insertion loss by f·w; table values from memory)', () => {
  // w = 12 in: f·w = 0.756, 1.5, 3, 6, 12, 24, 48, 96 kHz·in across 63 Hz to 8 kHz.
  const rect = { shape: 'rect' as const, widthM: 12 * INCH_M, heightM: 8 * INCH_M };
  it('square without vanes, 12 in wide: unlined 0 0 1 5 8 4 3 3 dB, lined 0 0 1 6 11 10 10 10 dB', () => {
    expect(elbowAttenuationDb({ section: rect }, BANDS_HZ)).toEqual([0, 0, 1, 5, 8, 4, 3, 3]);
    expect(elbowAttenuationDb({ section: rect, lined: true }, BANDS_HZ)).toEqual([0, 0, 1, 6, 11, 10, 10, 10]);
  });
  it('square with turning vanes, 12 in wide: unlined 0 0 1 4 6 4 4 4 dB, lined 0 0 1 4 7 7 7 7 dB', () => {
    expect(elbowAttenuationDb({ section: rect, vanes: true }, BANDS_HZ)).toEqual([0, 0, 1, 4, 6, 4, 4, 4]);
    expect(elbowAttenuationDb({ section: rect, vanes: true, lined: true }, BANDS_HZ)).toEqual([0, 0, 1, 4, 7, 7, 7, 7]);
  });
  it('radiused, 12 in: 0 0 1 2 3 3 3 3 dB; a round elbow is radiused unless radius is false', () => {
    const roundSection = { shape: 'round' as const, diameterM: 12 * INCH_M };
    expect(elbowAttenuationDb({ section: rect, radius: true }, BANDS_HZ)).toEqual([0, 0, 1, 2, 3, 3, 3, 3]);
    expect(elbowAttenuationDb({ section: roundSection }, BANDS_HZ)).toEqual([0, 0, 1, 2, 3, 3, 3, 3]);
    expect(elbowAttenuationDb({ section: roundSection, radius: false }, BANDS_HZ)).toEqual([0, 0, 1, 5, 8, 4, 3, 3]);
  });
  it('the step falls where f·w crosses 1.9 kHz·in: a 0.6 m (23.6 in) elbow at 63 Hz (1.49) and at 125 Hz (2.95)', () => {
    expect(elbowAttenuationDb({ section: { shape: 'rect', widthM: 0.6, heightM: 0.3 } }, [63, 125])).toEqual([0, 1]);
  });
  it('refuses turning vanes in a radiused elbow, naming the field', () => {
    expect(() => elbowAttenuationDb({ section: rect, radius: true, vanes: true }, BANDS_HZ)).toThrow('vanes applies to square elbows only');
  });
});
