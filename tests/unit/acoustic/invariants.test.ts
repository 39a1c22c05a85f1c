import { describe, expect, it } from 'vitest';
import { analyzeRun, type RunInput, type Segment, type Termination } from '@/lib/acoustic';
import { expectClose } from './tolerance';

const round = (diameterM: number) => ({ shape: 'round' as const, diameterM });
const closed: Termination = { kind: 'closed' };
const unflanged: Termination = { kind: 'open', flange: 'unflanged' };

const asymmetric: RunInput = {
  segments: [
    { lengthM: 1.3, section: round(0.2) },
    { lengthM: 0.7, section: { shape: 'rect', widthM: 0.3, heightM: 0.2 }, lining: { thicknessM: 0.025, absorption: 0.4 } },
    { lengthM: 2.1, section: round(0.15) },
  ],
  start: closed,
  end: { kind: 'open', flange: 'flanged' },
  maxHz: 400,
};

describe('physics invariants', () => {
  it('a lossless area change conserves power: |R|^2 + (S2/S1)|T|^2 = 1 with T = 1 + R (Kinsler & Frey ch. 10; Munjal ch. 2)', () => {
    // Incident power S1 |pi|^2 / rho c splits into reflected S1 |R pi|^2 / rho c and transmitted S2 |T pi|^2 / rho c;
    // pressure continuity at the step gives T = 1 + R.
    for (const ratio of [0.1, 0.25, 0.5, 2, 4, 9]) {
      const run = analyzeRun({
        segments: [{ lengthM: 1, section: round(0.2) }, { lengthM: 1, section: round(0.2 * Math.sqrt(ratio)) }],
        start: closed,
        end: closed,
        wallLosses: false,
      });
      const step = run.reflections.find((reflection) => reflection.kind === 'area-change');
      const reflection = (step?.bands[0].magnitude ?? NaN) * Math.cos(step?.bands[0].phaseRad ?? NaN);
      expectClose(reflection ** 2 + ratio * (1 + reflection) ** 2, 1, 1e-12, `S2/S1 = ${ratio}`);
    }
  });

  it('S2/S1 = 4: R = -0.6, tau = 4 S1 S2 / (S1 + S2)^2 = 0.64, TL = 1.938 dB (Kinsler & Frey; Munjal)', () => {
    const run = analyzeRun({ segments: [{ lengthM: 1, section: round(0.1) }, { lengthM: 1, section: round(0.2) }], start: closed, end: closed });
    const band = run.reflections[1].bands[0];
    expectClose(band.magnitude * Math.cos(band.phaseRad), -0.6, 1e-12, 'R');
    const tau = 1 - band.magnitude ** 2;
    expectClose(tau, (4 * 1 * 4) / 25, 1e-12, 'tau');
    expectClose(-10 * Math.log10(tau), 1.938, 5e-4, 'TL');
  });

  it('splitting a segment into two identical halves changes no result', () => {
    const split: RunInput = {
      ...asymmetric,
      segments: [
        asymmetric.segments[0],
        { ...asymmetric.segments[1], lengthM: 0.35 },
        { ...asymmetric.segments[1], lengthM: 0.35 },
        asymmetric.segments[2],
      ],
    };
    const whole = analyzeRun(asymmetric);
    const halves = analyzeRun(split);
    expect(halves.resonances).toHaveLength(whole.resonances.length);
    whole.resonances.forEach((resonance, index) => {
      const other = halves.resonances[index];
      expectClose(other.frequencyHz, resonance.frequencyHz, 1e-7, `f ${index + 1}`);
      expectClose(other.q ?? NaN, resonance.q ?? NaN, 1e-6 * (resonance.q ?? 1), `Q ${index + 1}`);
      expect(other.nodesM.length).toBe(resonance.nodesM.length);
      other.nodesM.forEach((x, nodeIndex) => expectClose(x, resonance.nodesM[nodeIndex], 1e-6, `node ${nodeIndex}`));
    });
    expect(halves.echoes.map((echo) => echo.delayS.toFixed(12))).toEqual(whole.echoes.map((echo) => echo.delayS.toFixed(12)));
    expect(halves.reflections).toEqual(whole.reflections);
  });

  it('reversing a run (segments and ends swapped) changes no natural frequency or Q, and mirrors the nodes', () => {
    const reversed: RunInput = { ...asymmetric, segments: [...asymmetric.segments].reverse(), start: asymmetric.end, end: asymmetric.start };
    const forward = analyzeRun(asymmetric);
    const backward = analyzeRun(reversed);
    expect(backward.resonances).toHaveLength(forward.resonances.length);
    forward.resonances.forEach((resonance, index) => {
      expectClose(backward.resonances[index].frequencyHz, resonance.frequencyHz, 1e-6, `f ${index + 1}`);
      expectClose(backward.resonances[index].q ?? NaN, resonance.q ?? NaN, 1e-5 * (resonance.q ?? 1), `Q ${index + 1}`);
    });
  });

  it('reversing a symmetric run changes no resonance', () => {
    const symmetric: RunInput = {
      segments: [{ lengthM: 1, section: round(0.1) }, { lengthM: 2, section: round(0.25) }, { lengthM: 1, section: round(0.1) }],
      start: unflanged,
      end: unflanged,
      maxHz: 500,
    };
    const forward = analyzeRun(symmetric).resonances;
    const backward = analyzeRun({ ...symmetric, segments: [...symmetric.segments].reverse() }).resonances;
    expect(backward).toEqual(forward);
  });

  it('a lined end lowers every Q (energy leaves at each reflection)', () => {
    const base = { segments: [{ lengthM: 3, section: round(0.2) }], start: closed, maxHz: 400 };
    const rigid = analyzeRun({ ...base, end: closed }).resonances;
    const lined = analyzeRun({ ...base, end: { kind: 'lined', absorption: 0.3 } }).resonances;
    expect(lined).toHaveLength(rigid.length);
    lined.forEach((resonance, index) => expect(resonance.q ?? Infinity).toBeLessThan(rigid[index].q ?? Infinity));
  });

  it('an anechoic end leaves no resonance in a uniform pipe, and only broad ones behind a step', () => {
    const uniform = analyzeRun({ segments: [{ lengthM: 3, section: round(0.2) }], start: closed, end: { kind: 'anechoic' }, maxHz: 600 });
    expect(uniform.resonances).toEqual([]);
    const segments: Segment[] = [{ lengthM: 2, section: round(0.2) }, { lengthM: 1, section: round(0.4) }];
    const stepped = analyzeRun({ segments, start: closed, end: { kind: 'anechoic' }, maxHz: 600 });
    expect(stepped.resonances.length).toBeGreaterThan(0);
    // Leakage through the step (R = -0.6) alone gives a -3 dB width c ln(1/0.6) / (2 pi L1) = 13.9 Hz (see stepped-duct test).
    const leakageWidthHz = (stepped.speedOfSoundMps * Math.log(1 / 0.6)) / (2 * Math.PI * 2);
    stepped.resonances.forEach((resonance) => expect(resonance.bandwidthHz ?? 0).toBeGreaterThan(leakageWidthHz));
    const rigid = analyzeRun({ segments, start: closed, end: closed, maxHz: 600, walls: { kind: 'rigid' } });
    rigid.resonances.forEach((resonance) => expect(resonance.bandwidthHz ?? Infinity).toBeLessThan(2));
  });
});
