// The room correction of a bare room by the room equation (Long, Architectural Acoustics, 2nd ed., ch. 8):
// Lp - Lw = 10 log(Q / 4πr² + 4/R), Q = 2 for an outlet flush with one plane (Long, ch. 2), R from the
// surfaces and the air (ISO 9613-1: 0.0047 dB/m at 1 kHz, 20 °C, 50 % RH).
import { describe, expect, it } from 'vitest';
import { roomEquationCorrectionDb } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { uniformSurfaces } from './room-fixtures';

const box = { lengthM: 20, widthM: 15, heightM: 4, speedOfSoundMps: 343 };
const outlet = { xM: 10, yM: 7.5, zM: 4 };
const listener = { xM: 12, yM: 7.5, zM: 1.2 };

describe('room equation for a bare room', () => {
  it('a 20 × 15 × 4 m room, a = 0.1, ceiling outlet (Q = 2), listener 3.44 m away: −12.85 dB at 1 kHz [calc]', () => {
    const volumeM3 = 1200;
    const surfaceM2 = 880;
    const airAreaM2 = 4 * (0.0047 / (10 * Math.log10(Math.E))) * volumeM3;
    const mean = (0.1 * surfaceM2 + airAreaM2) / surfaceM2;
    const roomConstantM2 = (surfaceM2 * mean) / (1 - mean);
    const r = Math.hypot(2, 2.8);
    const expected = 10 * Math.log10(2 / (4 * Math.PI * r * r) + 4 / roomConstantM2);
    expectClose(expected, -12.85, 0.01, 'hand calculation');
    const correction = roomEquationCorrectionDb({ box, surfaces: uniformSurfaces(0.1), outlet, listener });
    expectClose(correction[4], expected, 0.03, 'engine at 1 kHz');
  });

  it('with bare surfaces the air alone still absorbs: a finite, loud reverberant field', () => {
    const correction = roomEquationCorrectionDb({ box, surfaces: uniformSurfaces(0), outlet, listener });
    correction.forEach((value) => expect(Number.isFinite(value)).toBe(true));
    expect(correction[0]).toBeGreaterThan(roomEquationCorrectionDb({ box, surfaces: uniformSurfaces(0.1), outlet, listener })[0] + 20);
  });

  it('refuses an outlet outside the room, naming the field', () => {
    expect(() => roomEquationCorrectionDb({ box, surfaces: uniformSurfaces(0.1), outlet: { xM: 30, yM: 1, zM: 1 }, listener })).toThrow('outlet.xM must be between 0 and 20');
  });
});
