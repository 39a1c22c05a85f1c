import { describe, expect, it } from 'vitest';
import { schultzRoomCorrectionDb } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const FOOT_M = 0.3048; // International Yard and Pound Agreement (1959)

describe('room correction for one outlet (Schultz 1985, ASHRAE Transactions 91): Lp - Lw = 25 - 10 log r - 5 log V - 3 log f, r ft, V ft³', () => {
  it('worked example in feet: a 20 x 10 x 10 ft room (2000 ft³), listener 10 ft away, 500 Hz -> -9.60 dB [calc]', () => {
    const inFeet = 25 - 10 * Math.log10(10) - 5 * Math.log10(2000) - 3 * Math.log10(500);
    expectClose(inFeet, -9.60, 0.005, 'recomputed in feet');
    const volumeM3 = 2000 * FOOT_M ** 3;
    const distanceM = 10 * FOOT_M;
    expectClose(schultzRoomCorrectionDb(volumeM3, distanceM, 500), inFeet, 1e-12, 'from SI inputs');
  });

  it('in SI about 12.1 - 10 log r - 5 log V - 3 log f (sheet [calc]: 25 + 10 log 0.3048 + 15 log 0.3048)', () => {
    expectClose(schultzRoomCorrectionDb(1, 1, 1), 25 + 25 * Math.log10(FOOT_M), 1e-12, 'constant');
    expectClose(schultzRoomCorrectionDb(1, 1, 1), 12.1, 0.01, 'sheet');
    expectClose(schultzRoomCorrectionDb(80, 2.5, 250), 12.1 - 10 * Math.log10(2.5) - 5 * Math.log10(80) - 3 * Math.log10(250), 0.01, 'SI form');
  });

  it('each doubling: distance -3.01 dB, volume -1.51 dB, frequency -0.90 dB', () => {
    const base = schultzRoomCorrectionDb(100, 2, 500);
    expectClose(schultzRoomCorrectionDb(100, 4, 500) - base, -10 * Math.log10(2), 1e-12, 'distance');
    expectClose(schultzRoomCorrectionDb(200, 2, 500) - base, -5 * Math.log10(2), 1e-12, 'volume');
    expectClose(schultzRoomCorrectionDb(100, 2, 1000) - base, -3 * Math.log10(2), 1e-12, 'frequency');
  });

  it('worked by hand, every band: a 20 × 15 × 9 ft office (2700 ft³), a diffuser of Lw 45 43 40 38 35 32 28 24 dB, listener 6 ft away', () => {
    // 10 log 6 = 7.8, 5 log 2700 = 17.2, so 25 - 7.8 - 17.2 = 0.0 and Lp = Lw - 3 log f;
    // 3 log f = 5.4, 6.3, 7.2, 8.1, 9.0, 9.9, 10.8, 11.7 for 63 Hz … 8 kHz (logs to one decimal, as on paper)
    const lwDb = [45, 43, 40, 38, 35, 32, 28, 24];
    const byHand = [39.6, 36.7, 32.8, 29.9, 26.0, 22.1, 17.2, 12.3];
    [63, 125, 250, 500, 1000, 2000, 4000, 8000].forEach((hz, band) => {
      expectClose(lwDb[band] + schultzRoomCorrectionDb(2700 * FOOT_M ** 3, 6 * FOOT_M, hz), byHand[band], 0.1, `${hz} Hz`);
    });
  });

  it('the SI form of the ASHRAE Handbook, Lp - Lw = 12 - 10 log r - 5 log V - 3 log f (from memory), within 0.11 dB; 3 dB less per doubling of distance, as measured in furnished rooms (ASHRAE RP-339)', () => {
    for (const [volumeM3, distanceM, hz] of [[50, 1.5, 125], [300, 4, 1000], [2000, 10, 4000]]) {
      expectClose(schultzRoomCorrectionDb(volumeM3, distanceM, hz), 12 - 10 * Math.log10(distanceM) - 5 * Math.log10(volumeM3) - 3 * Math.log10(hz), 0.11, `${volumeM3} m³ (the Handbook rounds 12.10 to 12)`);
    }
    expectClose(schultzRoomCorrectionDb(100, 2, 500) - schultzRoomCorrectionDb(100, 4, 500), 3.01, 0.005, 'per doubling');
  });

  it('refuses a zero volume or distance, naming the field', () => {
    expect(() => schultzRoomCorrectionDb(0, 2, 500)).toThrow('volumeM3 must be > 0');
    expect(() => schultzRoomCorrectionDb(50, -1, 500)).toThrow('distanceM must be > 0');
  });
});
