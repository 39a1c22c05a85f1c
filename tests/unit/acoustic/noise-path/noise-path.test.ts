import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DUCT_FLANKING_CAP_DB, ncRating, noisePath, type NoisePathInput } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { elementArbitrary, noisePathArbitrary } from './noise-path-arbitraries';

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
const FOOT_M = 0.3048; // International Yard and Pound Agreement (1959)
const INCH_M = 0.0254;
const flat = (levelDb: number) => BANDS_HZ.map(() => levelDb);
const quietRoom = { volumeM3: 60, distanceM: 2 };
// Schultz (1985), ASHRAE Transactions 91, in feet: Lp - Lw = 25 - 10 log r - 5 log V - 3 log f.
const schultzFeet = (volumeM3: number, distanceM: number, hz: number) =>
  25 - 10 * Math.log10(distanceM / FOOT_M) - 5 * Math.log10(volumeM3 / FOOT_M ** 3) - 3 * Math.log10(hz);

describe('noise path from fan to listener', () => {
  it('worked path [calc]: equal split, silencer, a grille loss, 4 m of measured duct, a flush 12 in outlet, Schultz room', () => {
    const fanDb = [80, 78, 76, 74, 72, 70, 68, 66];
    const silencerDb = [2, 4, 8, 14, 18, 16, 12, 10];
    const grilleDb = [0, 0, 1, 1, 2, 2, 3, 3];
    const result = noisePath({
      soundPowerDb: fanDb,
      elements: [
        { kind: 'split', branchAreaM2: 0.2, totalAreaM2: 0.4 },
        { kind: 'silencer', insertionLossDb: silencerDb },
        { kind: 'loss', label: 'grille', lossDb: grilleDb },
        { kind: 'duct', section: { shape: 'round', diameterM: 0.3 }, lengthM: 4, wall: { kind: 'measured', attenuationDbPerM: flat(0.5) } },
        { kind: 'outlet', diameterM: 12 * INCH_M, mounting: 'flush' },
      ],
      room: quietRoom,
    });
    // ERL, ASHRAE RP-1314 (2007, from memory): 10 log[1 + (0.7 c / (π f D))²], c = 343.2 m/s at 20 °C (ISO 9613-1).
    const erl = (hz: number) => 10 * Math.log10(1 + ((0.7 * 343.2) / (Math.PI * hz * 12 * INCH_M)) ** 2);
    const expectedPower = BANDS_HZ.map((hz, band) => fanDb[band] - 10 * Math.log10(2) - silencerDb[band] - grilleDb[band] - 2 - erl(hz));
    const expectedListener = BANDS_HZ.map((hz, band) => expectedPower[band] + schultzFeet(60, 2, hz));
    BANDS_HZ.forEach((hz, band) => {
      expectClose(result.steps[4].powerDb[band], expectedPower[band], 1e-9, `power ${hz} Hz`);
      expectClose(result.listenerDb[band], expectedListener[band], 1e-9, `listener ${hz} Hz`);
    });
    expect(result.steps.map((step) => step.kind)).toEqual(['split', 'silencer', 'loss', 'duct', 'outlet']);
    expect(result.steps[2].label).toBe('grille');
    // A-weighting, IEC 61672-1 Table 3; NR, ISO R 1996 coefficients from the sheet (from memory).
    const aWeights = [-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1];
    const nr = [[35.5, 0.79], [22.0, 0.87], [12.0, 0.93], [4.8, 0.974], [0, 1.0], [-3.5, 1.015], [-6.1, 1.025], [-8.0, 1.03]];
    expectClose(result.dba, 10 * Math.log10(expectedListener.reduce((sum, levelDb, band) => sum + 10 ** ((levelDb + aWeights[band]) / 10), 0)), 1e-9, 'dB(A)');
    expectClose(result.nr, Math.max(...expectedListener.map((levelDb, band) => (levelDb - nr[band][0]) / nr[band][1])), 1e-9, 'NR');
    expect(result.nc).toBe(ncRating(expectedListener));
    expect(result.bandsHz).toEqual(BANDS_HZ);
  });

  it('a duct is sheet metal unless told otherwise: 10 ft of 12 x 12 in loses 3.5, 2.0, 1.0, 0.6 ... dB (ASHRAE table, from memory)', () => {
    const section = { shape: 'rect' as const, widthM: 12 * INCH_M, heightM: 12 * INCH_M };
    const result = noisePath({ soundPowerDb: flat(70), elements: [{ kind: 'duct', section, lengthM: 10 * FOOT_M }], room: quietRoom });
    [3.5, 2.0, 1.0, 0.6, 0.6, 0.6, 0.6, 0.6].forEach((expected, band) => expectClose(result.steps[0].lossDb[band], expected, 1e-9, `band ${band}`));
  });

  it('a rigid duct loses only to the air: round a = 0.1 m at 1 kHz, 0.081 dB/m, 10 m -> 0.81 dB (Kirchhoff; sheet [calc])', () => {
    const result = noisePath({
      soundPowerDb: flat(70),
      elements: [{ kind: 'duct', section: { shape: 'round', diameterM: 0.2 }, lengthM: 10, wall: { kind: 'rigid' } }],
      room: quietRoom,
    });
    expectClose(result.steps[0].lossDb[4], 0.81, 0.01, '1 kHz');
  });

  it('a lined duct adds Sabine liner loss to its walls and stops at the flanking cap: 20 m of 0.3 x 0.3 m with 50 mm liner', () => {
    const section = { shape: 'rect' as const, widthM: 0.3, heightM: 0.3 };
    const result = noisePath({
      soundPowerDb: flat(90),
      elements: [{ kind: 'duct', section, lengthM: 20, wall: { kind: 'measured', attenuationDbPerM: flat(0) }, lining: { thicknessM: 0.05 } }],
      room: quietRoom,
    });
    // 125 Hz: α 0.25 (50 mm liner, from memory): 1.05 x 0.25^1.4 x 13.3 x 20 = 40.2 dB, capped at 40 (common practice, no source),
    // and so every band above; 63 Hz: α 0.25 x 63/125 (absorption in proportion to frequency below the tests): 15.3 dB, under the cap.
    expect(1.05 * 0.25 ** 1.4 * (1.2 / 0.09) * 20).toBeGreaterThan(40);
    expect(result.steps[0].lossDb.slice(1)).toEqual(flat(DUCT_FLANKING_CAP_DB).slice(1));
    expect(result.steps[0].lossDb[0]).toBeCloseTo(1.05 * (0.25 * (63 / 125)) ** 1.4 * (1.2 / 0.09) * 20, 9);
    expect(result.warnings.join(' ')).toMatch(/elements\[0\].*limited to 40 dB by flanking/);
  });

  it('a quiet room below NC-15 gets the extrapolated figure ncRating gives, and a warning saying it is extrapolated', () => {
    const result = noisePath({ soundPowerDb: flat(30), elements: [{ kind: 'silencer', insertionLossDb: flat(15) }], room: quietRoom });
    expect(result.nc).toBeLessThan(15);
    expect(result.nc).toBe(ncRating(result.listenerDb));
    expect(result.warnings.some((warning) => warning.includes('below NC-15') && warning.includes('extrapolated'))).toBe(true);
  });

  it('a plenum whose Wells figure is below 0 dB is credited 0 dB, with a warning', () => {
    const plenum = { kind: 'plenum' as const, outletAreaM2: 2, surfaceAreaM2: 2, absorption: 0.1, distanceM: 0.2, angleDeg: 0 };
    // Wells (1958): -10 log[S_out (Q cos θ/(4π r²) + (1 - α)/(S α))] = -10 log[2 (2/(4π 0.04) + 0.9/0.2)] = -12.3 dB [calc]
    const wellsDb = -10 * Math.log10(2 * (2 / (4 * Math.PI * 0.04) + 0.9 / 0.2));
    expectClose(wellsDb, -12.3, 0.05, '[calc]');
    const result = noisePath({ soundPowerDb: flat(70), elements: [plenum], room: quietRoom });
    expect(result.steps[0].lossDb).toEqual(flat(0));
    expect(result.warnings.join(' ')).toContain(`elements[0]: Wells' formula gives ${wellsDb.toFixed(1)} dB`);
  });

  it('property: adding any element anywhere never raises the level at the listener in any band', () => {
    fc.assert(
      fc.property(noisePathArbitrary, elementArbitrary, fc.nat(), (input: NoisePathInput, extra, position) => {
        const at = position % (input.elements.length + 1);
        const longer = { ...input, elements: [...input.elements.slice(0, at), extra, ...input.elements.slice(at)] };
        const before = noisePath(input).listenerDb;
        noisePath(longer).listenerDb.forEach((levelDb, band) => expect(levelDb).toBeLessThanOrEqual(before[band] + 1e-9));
      }),
    );
  });

  it('property: no duct, lined or not, of any length is credited more than the flanking cap in any band', () => {
    fc.assert(
      fc.property(noisePathArbitrary, (input) => {
        const result = noisePath(input);
        result.steps.forEach((step) => {
          if (step.kind === 'duct') step.lossDb.forEach((lossDb) => expect(lossDb).toBeLessThanOrEqual(DUCT_FLANKING_CAP_DB));
        });
      }),
    );
  });

  it('refuses bad input, naming the field by its path', () => {
    const base = (): NoisePathInput => ({ soundPowerDb: flat(70), elements: [], room: quietRoom });
    const rect = { shape: 'rect' as const, widthM: 0.3, heightM: 0.005 };
    expect(() => noisePath({ ...base(), soundPowerDb: [70, 70] })).toThrow('soundPowerDb must have 8 octave-band levels');
    expect(() => noisePath({ ...base(), elements: [{ kind: 'duct', section: rect, lengthM: 2 }] })).toThrow('elements[0].section.heightM must be >= 0.01');
    expect(() =>
      noisePath({ ...base(), elements: [{ kind: 'loss', label: 'x', lossDb: flat(1) }, { kind: 'silencer', insertionLossDb: [1, 2, 3, -4, 5, 6, 7, 8] }] }),
    ).toThrow('elements[1].insertionLossDb[3] must be >= 0');
    expect(() =>
      noisePath({ ...base(), elements: [{ kind: 'duct', section: { shape: 'round', diameterM: 0.2 }, lengthM: 1, wall: { kind: 'measured', attenuationDbPerM: [1] } }] }),
    ).toThrow('elements[0].wall.attenuationDbPerM must have 8 octave-band values');
    expect(() => noisePath({ ...base(), elements: [{ kind: 'split', branchAreaM2: 0.5, totalAreaM2: 0.2 }] })).toThrow(
      'elements[0].branchAreaM2 must be <= totalAreaM2',
    );
    expect(() => noisePath({ ...base(), elements: [{ kind: 'fan' } as unknown as NoisePathInput['elements'][number]] })).toThrow('elements[0].kind must be');
    expect(() => noisePath({ ...base(), room: { volumeM3: 0, distanceM: 2 } })).toThrow('room.volumeM3 must be > 0');
  });
});
