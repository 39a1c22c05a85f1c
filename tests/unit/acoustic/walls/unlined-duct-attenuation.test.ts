import { describe, expect, it } from 'vitest';
import { airProperties, kirchhoffAttenuationNpPerM, unlinedDuctAttenuationDbPerM, wallAttenuationDbPerM } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000];
const FOOT_M = 0.3048; // International Yard and Pound Agreement (1959)
const INCH_M = 0.0254;
const rectIn = (widthIn: number, heightIn: number) => ({ shape: 'rect' as const, widthM: widthIn * INCH_M, heightM: heightIn * INCH_M });
const roundIn = (diameterIn: number) => ({ shape: 'round' as const, diameterM: diameterIn * INCH_M });

describe('unlined sheet-metal ducts: the ASHRAE Handbook tables (HVAC Applications, noise chapter; values from memory)', () => {
  // Rectangular table, dB/ft at 63, 125, 250 and "> 250" Hz, by size in inches (from memory, not checked against a stored copy).
  const rectangular: Array<{ size: [number, number]; dbPerFt: [number, number, number, number] }> = [
    { size: [6, 6], dbPerFt: [0.3, 0.2, 0.1, 0.1] },
    { size: [12, 12], dbPerFt: [0.35, 0.2, 0.1, 0.06] },
    { size: [12, 24], dbPerFt: [0.4, 0.2, 0.1, 0.05] },
    { size: [24, 24], dbPerFt: [0.25, 0.2, 0.1, 0.03] },
    { size: [48, 48], dbPerFt: [0.15, 0.1, 0.07, 0.02] },
    { size: [72, 72], dbPerFt: [0.1, 0.1, 0.05, 0.02] },
  ];
  it.each(rectangular)('rectangular $size in: the tabulated dB/ft, the "> 250 Hz" column in every band from 500 Hz up', ({ size, dbPerFt }) => {
    const values = unlinedDuctAttenuationDbPerM(rectIn(size[0], size[1]), BANDS_HZ);
    BANDS_HZ.forEach((hz, band) => expectClose(values[band] * FOOT_M, dbPerFt[Math.min(band, 3)], 1e-12, `${hz} Hz`));
  });

  // Round table, dB/ft at 63 Hz to 4 kHz, by diameter range (from memory); checked at each range's upper end.
  const round: Array<{ diameterIn: number; dbPerFt: number[] }> = [
    { diameterIn: 7, dbPerFt: [0.03, 0.03, 0.05, 0.05, 0.1, 0.1, 0.1] },
    { diameterIn: 15, dbPerFt: [0.03, 0.03, 0.03, 0.05, 0.07, 0.07, 0.07] },
    { diameterIn: 30, dbPerFt: [0.02, 0.02, 0.02, 0.03, 0.05, 0.05, 0.05] },
    { diameterIn: 60, dbPerFt: [0.01, 0.01, 0.01, 0.02, 0.02, 0.02, 0.02] },
  ];
  it.each(round)('round D = $diameterIn in: the tabulated dB/ft; 8 kHz, beyond the table, takes the 4 kHz value', ({ diameterIn, dbPerFt }) => {
    const values = unlinedDuctAttenuationDbPerM(roundIn(diameterIn), BANDS_HZ);
    BANDS_HZ.forEach((hz, band) => expectClose(values[band] * FOOT_M, dbPerFt[Math.min(band, 6)], 1e-12, `${hz} Hz`));
  });

  it('sheet: rectangular ducts lose roughly 0.3 to 1.3 dB/m at 63 Hz, falling with frequency (check-values sheet, ranges from memory)', () => {
    for (const sideM of [0.15, 0.2, 0.3, 0.45, 0.6, 0.9, 1.2, 1.8]) {
      for (const aspect of [1, 1.5, 2, 3]) {
        const values = unlinedDuctAttenuationDbPerM({ shape: 'rect', widthM: sideM * aspect, heightM: sideM }, BANDS_HZ);
        expect(values[0], `${sideM} x ${sideM * aspect} m at 63 Hz`).toBeGreaterThanOrEqual(0.3 - 0.03);
        expect(values[0], `${sideM} x ${sideM * aspect} m at 63 Hz`).toBeLessThanOrEqual(1.3 + 0.05);
        for (let band = 1; band < BANDS_HZ.length; band++) expect(values[band]).toBeLessThanOrEqual(values[band - 1] + 1e-12);
      }
    }
  });

  it('sheet: round ducts lose several times less than square ducts of the same P/A at 63 Hz (check-values sheet)', () => {
    for (const sizeM of [0.15, 0.2, 0.3, 0.5, 0.8, 1.2, 1.5]) {
      const square = unlinedDuctAttenuationDbPerM({ shape: 'rect', widthM: sizeM, heightM: sizeM }, [63])[0];
      const roundDuct = unlinedDuctAttenuationDbPerM({ shape: 'round', diameterM: sizeM }, [63])[0];
      expect(square / roundDuct, `${sizeM} m`).toBeGreaterThan(3);
    }
  });

  it('between tabulated sizes the rectangular values follow the regressions of Reynolds & Bledsoe (1991), within 0.05 dB/ft (both from memory)', () => {
    // Reynolds & Bledsoe, Algorithms for HVAC Acoustics (ASHRAE 1991), from memory, P/A in 1/ft, f in Hz, dB/ft:
    // f <= 250: P/A >= 3: 17.0 (P/A)^-0.25 f^-0.85; P/A < 3: 1.64 (P/A)^0.73 f^-0.58; f > 250: 0.02 (P/A)^0.8.
    // Their low-frequency pair jumps at P/A = 3, so the checks stay clear of it.
    const regression = (perimeterPerAreaPerFt: number, hz: number) => {
      if (hz > 250) return 0.02 * perimeterPerAreaPerFt ** 0.8;
      if (perimeterPerAreaPerFt >= 3) return 17.0 * perimeterPerAreaPerFt ** -0.25 * hz ** -0.85;
      return 1.64 * perimeterPerAreaPerFt ** 0.73 * hz ** -0.58;
    };
    for (const perimeterPerAreaPerFt of [0.85, 1.5, 2.4, 3.5, 5, 6.5]) {
      // A square of side s has P/A = 4 / s.
      const sideM = (4 / perimeterPerAreaPerFt) * FOOT_M;
      const values = unlinedDuctAttenuationDbPerM({ shape: 'rect', widthM: sideM, heightM: sideM }, [63, 125, 250, 500, 1000]);
      [63, 125, 250, 500, 1000].forEach((hz, band) =>
        expectClose(values[band] * FOOT_M, regression(perimeterPerAreaPerFt, hz), 0.05, `P/A ${perimeterPerAreaPerFt} /ft, ${hz} Hz`),
      );
    }
  });

  it('beyond the table the nearest edge holds: smaller than 6 x 6 in as 6 x 6, larger than 72 x 72 as 72 x 72, below 63 Hz as 63 Hz', () => {
    expect(unlinedDuctAttenuationDbPerM(rectIn(3, 3), BANDS_HZ)).toEqual(unlinedDuctAttenuationDbPerM(rectIn(6, 6), BANDS_HZ));
    expect(unlinedDuctAttenuationDbPerM(rectIn(100, 100), BANDS_HZ)).toEqual(unlinedDuctAttenuationDbPerM(rectIn(72, 72), BANDS_HZ));
    expect(unlinedDuctAttenuationDbPerM(roundIn(4), [31.5])).toEqual(unlinedDuctAttenuationDbPerM(roundIn(7), [63]));
  });

  it('refuses a bad section or band, naming the field', () => {
    expect(() => unlinedDuctAttenuationDbPerM({ shape: 'round', diameterM: 0.005 }, BANDS_HZ)).toThrow('section.diameterM must be >= 0.01');
    expect(() => unlinedDuctAttenuationDbPerM(rectIn(12, 12), [63, -1])).toThrow('bandsHz[1] must be > 0');
  });
});

describe('walls by kind', () => {
  const section = { shape: 'rect' as const, widthM: 0.4, heightM: 0.25 };
  it('rigid: Kirchhoff air losses only, converted at 20/ln 10 dB per neper (Kirchhoff 1868; ISO 80000-3)', () => {
    const air = airProperties(20);
    const values = wallAttenuationDbPerM({ kind: 'rigid' }, section, BANDS_HZ);
    BANDS_HZ.forEach((hz, band) =>
      expectClose(values[band], kirchhoffAttenuationNpPerM(hz, 1.3, 0.1, air) * (20 / Math.LN10), 1e-12, `${hz} Hz`),
    );
  });
  it('measured: the figures given at the octave bands, and between two bands a value between them', () => {
    const attenuationDbPerM = [0.9, 0.6, 0.4, 0.2, 0.15, 0.1, 0.1, 0.1];
    expect(wallAttenuationDbPerM({ kind: 'measured', attenuationDbPerM }, section, BANDS_HZ)).toEqual(attenuationDbPerM);
    // Half way between 63 and 125 Hz on a log axis: the mean of the two values.
    expectClose(wallAttenuationDbPerM({ kind: 'measured', attenuationDbPerM }, section, [Math.sqrt(63 * 125)])[0], 0.75, 1e-12, 'midpoint');
  });
});
