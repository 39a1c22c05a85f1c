import { describe, expect, it } from 'vitest';
import { airProperties, analyzeRun, assessRisks, ncCriterionCurveDb, outletLevels, speedOfSound, type RiskInput, type RunInput } from '@/lib/acoustic';
import { DB_PER_NEPER } from '@/lib/acoustic/constants';
import { kirchhoffAttenuationNpPerM } from '@/lib/acoustic/wall-losses';
import { meetingRoom } from '../room/room-fixtures';
import { toneInput, toneRun } from './risk-fixtures';

describe('risk flags', () => {
  it('a resonance the tone meets within the operating envelope is flagged by the dB the run adds there', () => {
    // Closed start (Rs = 1), uniform duct, an end of frequency-independent reflection Re = sqrt(1 - a) (lined end),
    // walls measured flat at 1 dB/m: the run takes in W = (1 - |G|^2) / |1 - G|^2 with |G| = x = Re exp(-2 alpha L),
    // so at a resonance W = (1 + x) / (1 - x), while its mean over a mode spacing is 1 (multiple reflections
    // between two reflectors, the phase average of 1 / |1 - x e^(j phi)|^2 = 1 / (1 - x^2): Kinsler & Frey, ch. 10).
    const lengthM = 3;
    const diameterM = 0.2;
    const run: RunInput = {
      segments: [{ lengthM, section: { shape: 'round', diameterM } }],
      walls: { kind: 'measured', attenuationDbPerM: [1, 1, 1, 1, 1, 1, 1, 1] },
      start: { kind: 'closed' }, end: { kind: 'lined', absorption: 0.3 }, maxHz: 400,
    };
    const resonance = analyzeRun(run).resonances[2];
    const toneHz = resonance.frequencyHz;
    const flags = assessRisks({ run, fan: { blades: 12, rpm: (toneHz * 60) / 12, harmonics: 1 } });
    expect(flags).toHaveLength(1);
    const [flag] = flags;
    const air = airProperties(20);
    const alphaNpPerM = 1 / DB_PER_NEPER + kirchhoffAttenuationNpPerM(toneHz, Math.PI * diameterM, (Math.PI * diameterM ** 2) / 4, air);
    const x = Math.sqrt(1 - 0.3) * Math.exp(-2 * alphaNpPerM * lengthM);
    const expectedDb = 10 * Math.log10((1 + x) / (1 - x));
    expect(flag.kind).toBe('resonance-near-tone');
    expect(flag.subject).toBe('tone:h1');
    expect(flag.quantity.gainDb).toBeGreaterThan(expectedDb - 0.5);
    expect(flag.quantity.gainDb).toBeLessThan(expectedDb + 0.5);
    expect(flag.severity).toBe(expectedDb >= 10 ? 'high' : expectedDb >= 6 ? 'medium' : 'low');
    // the envelope: ±2 % belt slip and the supply air ±5 °C; every natural frequency scales with c
    const [lowHz, highHz] = flag.quantity.envelopeHz!;
    expect(lowHz).toBeCloseTo(toneHz * 0.98 * (speedOfSound(20) / speedOfSound(25)), 9);
    expect(highHz).toBeCloseTo(toneHz * 1.02 * (speedOfSound(20) / speedOfSound(15)), 9);
    expect(flag.reason).toContain(`meets the blade-pass tone (${toneHz.toFixed(1)} Hz at`);
    expect(flag.reason).toContain('air 15–25 °C');
    expect(assessRisks({ run, fan: { blades: 12, rpm: (toneHz * 60) / 12, harmonics: 1 } })[0].id).toBe(flag.id);
  });

  it('a run damped so that its standing waves add less than 3 dB raises no flag on the same tone', () => {
    // the same duct with a nearly absorbing end: x = sqrt(0.05) exp(-2 alpha L) = 0.17, (1 + x)/(1 - x) = 1.4 dB
    const run: RunInput = {
      segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }],
      walls: { kind: 'measured', attenuationDbPerM: [1, 1, 1, 1, 1, 1, 1, 1] },
      start: { kind: 'closed' }, end: { kind: 'lined', absorption: 0.95 }, maxHz: 400,
    };
    const resonance = analyzeRun(run).resonances.find((candidate) => !candidate.broadband);
    const toneHz = resonance?.frequencyHz ?? 150;
    expect(assessRisks({ run, fan: { blades: 12, rpm: (toneHz * 60) / 12, harmonics: 1 } })).toEqual([]);
  });

  it('a tone that sweeps above the plane-wave cut-off is stated as not assessed, never dropped', () => {
    // round 0.2 m: cut-off 1.8412 c / (pi d) = 1005 Hz at 20 °C (Kinsler & Frey, ch. 9); 12 blades at 5000 rpm: 1000 Hz, +2 % slip
    const flags = assessRisks({ run: toneRun, fan: { blades: 12, rpm: 5000, harmonics: 1 } });
    expect(flags.map((flag) => flag.kind)).toEqual(['tone-above-cutoff']);
    expect(flags[0].reason).toContain('not assessed');
  });

  it('sheet-metal walls make the low resonances of a long rectangular run broad; broad ones are never flagged', () => {
    const run: RunInput = {
      segments: [{ lengthM: 12, section: { shape: 'rect', widthM: 0.6, heightM: 0.4 } }],
      start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxHz: 200,
    };
    const analysis = analyzeRun(run);
    const first = analysis.resonances[0];
    expect(first.broadband).toBe(true);
    expect(analysis.broadbandRangesHz.length).toBeGreaterThan(0);
    const flags = assessRisks({ run, fan: { blades: 6, rpm: (first.frequencyHz * 60) / 6, harmonics: 1 } });
    expect(flags.filter((flag) => flag.resonanceOrder === first.order)).toEqual([]);
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
