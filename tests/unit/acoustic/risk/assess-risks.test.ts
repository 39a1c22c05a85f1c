import { describe, expect, it } from 'vitest';
import { analyzeRun, assessRisks, ncCriterionCurveDb, outletLevels, type RiskInput } from '@/lib/acoustic';
import { meetingRoom } from '../room/room-fixtures';
import { toneInput, toneRun } from './risk-fixtures';

describe('risk flags', () => {
  it('a resonance within 3 % of the blade-pass tone is flagged, with the numbers in the reason and a stable id', () => {
    const flags = assessRisks(toneInput);
    expect(flags).toHaveLength(1);
    const [flag] = flags;
    const resonance = analyzeRun(toneRun).resonances[2];
    expect(flag.kind).toBe('resonance-near-tone');
    expect(flag.subject).toBe('tone:h1');
    expect(flag.resonanceOrder).toBe(3);
    expect(flag.quantity.valueHz).toBe(resonance.frequencyHz);
    expect(flag.quantity.distanceHz).toBeCloseTo(Math.abs(resonance.frequencyHz - 240), 12);
    expect(flag.quantity.windowHz).toBeCloseTo(0.03 * 240, 12); // 3 % of the tone exceeds the half bandwidth here
    expect(flag.reason).toContain(`Resonance 3 at ${resonance.frequencyHz.toFixed(1)} Hz`);
    expect(flag.reason).toContain('240.0 Hz blade-pass tone');
    // wall losses only: the tone lies outside the -3 dB band, inside the 3 % window -> medium at harmonic 1
    expect(flag.severity).toBe('medium');
    expect(assessRisks(toneInput)[0].id).toBe(flag.id);
  });

  it('the window is an option: at 0.1 % the same run raises no flag', () => {
    expect(assessRisks({ ...toneInput, options: { coincidencePercent: 0.1 } })).toHaveLength(0);
  });

  it('a resonance near an axial room mode is flagged only when the outlet or listener sits near its pressure maximum', () => {
    // closed–closed 2 m duct: f_1 = c / 2L = 85.8 Hz (Kinsler & Frey ch. 10); a room 2 m long along x has its (1,0,0) axial mode
    // at the same c / 2L (Rayleigh); outlet at x = 0 is a pressure maximum of every axial x mode (x = m L / n).
    const run = { segments: [{ lengthM: 2, section: { shape: 'round' as const, diameterM: 0.2 } }], start: { kind: 'closed' as const }, end: { kind: 'closed' as const }, maxHz: 100 };
    const room = { ...meetingRoom, box: { lengthM: 2, widthM: 4.3, heightM: 3.1, speedOfSoundMps: 343.2 }, outlet: { xM: 0, yM: 2.15, zM: 1.55 }, listener: { xM: 0.8, yM: 2.15, zM: 1.55 } };
    const flags = assessRisks({ run, room });
    expect(flags.map((flag) => flag.subject)).toEqual(['room-mode:1,0,0']);
    expect(flags[0].severity).toBe('medium'); // the outlet only: the listener, 0.8 m from x = 0, is beyond lambda/8 = (c / 85.8 Hz) / 8 = 0.5 m
    expect(flags[0].reason).toContain('the outlet sits within 12.5 % of a wavelength');
    const centred = assessRisks({ run, room: { ...room, outlet: { xM: 1, yM: 2.15, zM: 1.55 }, listener: { xM: 1, yM: 2.15, zM: 1.55 } } });
    expect(centred).toHaveLength(0); // x = L/2 is the (1,0,0) mode's pressure node
  });

  it('a predicted octave level above the NC criterion curve is flagged per band, severity by the excess', () => {
    const run = { segments: [{ lengthM: 3, section: { shape: 'round' as const, diameterM: 0.3 } }], start: { kind: 'closed' as const }, end: { kind: 'open' as const, flange: 'unflanged' as const }, maxHz: 300 };
    const outletSoundPowerDb = [70, 65, 55, 45, 40, 35, 30, 25];
    const input: RiskInput = { run, room: meetingRoom, outletSoundPowerDb };
    const levels = outletLevels(run, meetingRoom, outletSoundPowerDb);
    const criterion = ncCriterionCurveDb(30);
    const flags = assessRisks(input).filter((flag) => flag.kind === 'level-above-criterion');
    const over = levels.filter((band, index) => band.levelDb > criterion[index]);
    expect(over.length).toBeGreaterThan(0);
    expect(flags.map((flag) => flag.targetHz)).toEqual(over.map((band) => band.hz));
    for (const flag of flags) {
      const excess = (flag.quantity.levelDb ?? NaN) - (flag.quantity.criterionDb ?? NaN);
      expect(flag.severity).toBe(excess > 5 ? 'high' : excess > 2 ? 'medium' : 'low');
    }
  });

  it('bad room input throws a RangeError naming the field', () => {
    const room = { ...meetingRoom, surfaces: { ...meetingRoom.surfaces, floor: [0.1, 0.2, 1.3, 0.2, 0.2, 0.2, 0.2, 0.2] } };
    expect(() => assessRisks({ run: toneRun, room })).toThrow(new RangeError('room.surfaces.floor[2] must be between 0 and 1'));
  });
});

describe('risk input validation', () => {
  it('a fan with no blades throws a RangeError naming fan.blades', () => {
    expect(() => assessRisks({ ...toneInput, fan: { blades: 0, rpm: 1200 } })).toThrow(new RangeError('fan.blades must be > 0'));
  });
});
