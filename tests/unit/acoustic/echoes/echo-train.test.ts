import { describe, expect, it } from 'vitest';
import { analyzeRun, speedOfSound } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const c = speedOfSound(20);

describe('echo train (method of characteristics)', () => {
  it('closed–closed: arrivals every 2L/c, all +1 (a rigid end does not invert)', () => {
    const run = analyzeRun({ walls: { kind: 'rigid' }, segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }], start: { kind: 'closed' }, end: { kind: 'closed' }, maxEchoes: 5 });
    expect(run.echoes).toHaveLength(5);
    run.echoes.forEach((echo, index) => {
      expectClose(echo.delayS, ((index + 1) * 2 * 3) / c, 1e-12, `delay ${index + 1}`);
      expectClose(echo.amplitude, 1, 1e-12, `amplitude ${index + 1}`);
    });
    expect(run.echoes[0].path).toBe('end');
    expect(run.echoes[1].path).toBe('end → start → end');
  });

  it('closed–open: the open end inverts, and reflects 2 delta / c late (delta = 0.6133 a, Levine & Schwinger 1948)', () => {
    const radiusM = 0.1;
    const run = analyzeRun({ walls: { kind: 'rigid' }, segments: [{ lengthM: 2, section: { shape: 'round', diameterM: 2 * radiusM } }], start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxEchoes: 4 });
    run.echoes.forEach((echo, index) => {
      expectClose(echo.delayS, ((index + 1) * 2 * (2 + 0.6133 * radiusM)) / c, 1e-12, `delay ${index + 1}`);
      expectClose(echo.amplitude, (-1) ** (index + 1), 1e-12, `sign ${index + 1}`);
    });
  });

  it('a step and a lined end: delays equal path length / c; amplitudes follow (S1 - S2)/(S1 + S2) and sqrt(1 - alpha)', () => {
    const run = analyzeRun({ walls: { kind: 'rigid' },
      segments: [
        { lengthM: 1.5, section: { shape: 'rect', widthM: 0.1, heightM: 0.1 } },
        { lengthM: 1, section: { shape: 'rect', widthM: 0.2, heightM: 0.2 } },
      ],
      start: { kind: 'anechoic' },
      end: { kind: 'lined', absorption: 0.36 },
    });
    // S2 = 4 S1: R12 = -0.6, T12 = 1.6, T21 = 0.4, R21 = +0.6; lined end R = 0.8
    expect(run.echoes[0].path).toBe('area-change@1.50 m');
    expectClose(run.echoes[0].delayS, 3 / c, 1e-12, 'step delay');
    expectClose(run.echoes[0].amplitude, -0.6, 1e-12, 'step amplitude');
    expect(run.echoes[1].path).toBe('end');
    expectClose(run.echoes[1].delayS, 5 / c, 1e-12, 'end delay');
    expectClose(run.echoes[1].amplitude, 1.6 * 0.8 * 0.4, 1e-12, 'end amplitude');
    expect(run.echoes[2].path).toBe('end → area-change@1.50 m → end');
    expectClose(run.echoes[2].delayS, 7 / c, 1e-12, 'second end delay');
    expectClose(run.echoes[2].amplitude, 1.6 * 0.8 * 0.6 * 0.8 * 0.4, 1e-12, 'second end amplitude');
  });

  it('a tee: the branch end returns through the junction, named by the branch', () => {
    const run = analyzeRun({ walls: { kind: 'rigid' },
      segments: [
        { lengthM: 2, section: { shape: 'round', diameterM: 0.2 }, branches: [{ segments: [{ lengthM: 0.5, section: { shape: 'round', diameterM: 0.2 } }], end: { kind: 'closed' } }] },
        { lengthM: 3, section: { shape: 'round', diameterM: 0.2 } },
      ],
      start: { kind: 'anechoic' },
      end: { kind: 'anechoic' },
    });
    // Three equal ducts: R = 2/3 - 1 = -1/3 back, T = 2/3 into each other duct.
    expect(run.echoes[0].path).toBe('tee@2.00 m');
    expectClose(run.echoes[0].amplitude, -1 / 3, 1e-12, 'junction');
    expect(run.echoes[1].path).toBe('branch@2.00 m: end');
    expectClose(run.echoes[1].delayS, 5 / c, 1e-12, 'branch end delay');
    expectClose(run.echoes[1].amplitude, (2 / 3) * (2 / 3), 1e-12, 'branch end amplitude');
  });

  it('stops at the decay threshold', () => {
    const run = analyzeRun({ walls: { kind: 'rigid' }, segments: [{ lengthM: 1, section: { shape: 'round', diameterM: 0.2 } }], start: { kind: 'lined', absorption: 0.75 }, end: { kind: 'closed' }, echoThreshold: 0.01 });
    // Each round trip multiplies by 0.5: 1, 0.5, 0.25 ... down to 1/128 > 0.01 > 1/256
    expect(run.echoes.map((echo) => echo.amplitude)).toEqual([1, 0.5, 0.25, 0.125, 0.0625, 0.03125, 0.015625]);
  });
});
