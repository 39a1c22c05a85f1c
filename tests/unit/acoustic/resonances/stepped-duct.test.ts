import { describe, expect, it } from 'vitest';
import { analyzeRun, type Termination } from '@/lib/acoustic';
import { expectClose, rootsBySignChange } from '../tolerance';

// Two segments, S1 = 1 (0.1 x 0.1 m), L1 = 1 m, then S2 = 4 (0.2 x 0.2 m), L2 = 0.5 m, c = 343.2, no wall losses.
// Derivation (plane waves; continuity of p and of S u at the step, Kinsler & Frey ch. 10; Munjal ch. 2):
// closed at x = 0 gives p1 = A cos kx, u1 ∝ sin kx; closed at x = L1 + L2 gives p2 = B cos k(L1 + L2 - x).
// p: A cos kL1 = B cos kL2; volume velocity: S1 A sin kL1 = -S2 B sin kL2, hence
//   closed–closed: S1 sin kL1 cos kL2 + S2 cos kL1 sin kL2 = 0.
// An open (p = 0) far end replaces cos k(L - x) by sin k(L - x): tan kL1 tan kL2 = S2/S1, i.e.
//   closed–open:  S1 sin kL1 sin kL2 - S2 cos kL1 cos kL2 = 0;
// an open start replaces cos kx by sin kx:  open–open: S2 sin kL1 cos kL2 + S1 cos kL1 sin kL2 = 0.
// The engine's open ends always carry their end correction and radiation, so the open cases of the
// sheet (no end corrections) are not reproduced here; the closed–closed case and the leaky cavity below are exact.
const c = 343.2;
const lengths = [1, 0.5];
const areas = [1, 4];

function stepped(start: Termination, end: Termination) {
  return analyzeRun({
    segments: [
      { lengthM: lengths[0], section: { shape: 'rect', widthM: 0.1, heightM: 0.1 } },
      { lengthM: lengths[1], section: { shape: 'rect', widthM: 0.2, heightM: 0.2 } },
    ],
    start,
    end,
    minHz: 20,
    maxHz: 500,
    wallLosses: false,
  });
}

describe('two-segment stepped duct against its transcendental condition (solved here by bisection)', () => {
  it('closed–closed: 96.80, 246.40, 343.20, 440.00 Hz (sheet)', () => {
    const condition = (hz: number) => {
      const k = (2 * Math.PI * hz) / c;
      return areas[0] * Math.sin(k * lengths[0]) * Math.cos(k * lengths[1]) + areas[1] * Math.cos(k * lengths[0]) * Math.sin(k * lengths[1]);
    };
    const expected = rootsBySignChange(condition, 20, 500, 0.5);
    const found = stepped({ kind: 'closed' }, { kind: 'closed' }).resonances.map((resonance) => resonance.frequencyHz);
    expect(found).toHaveLength(expected.length);
    found.forEach((hz, index) => expectClose(hz, expected[index], 1e-5, `mode ${index + 1}`));
    [96.8, 246.4, 343.2, 440.0].forEach((hz, index) => expectClose(found[index], hz, 0.005, `sheet ${index + 1}`));
  });

  it('closed start, step S1 -> S2 = 4 S1, anechoic beyond: leaky cavity with fn = (2n - 1) c / 4L1 + j c ln(1/|R|) / (4 pi L1)', () => {
    // Round trip in the first segment: Rs * R_step * exp(-2 j k L1) = 1 with Rs = 1 and R_step = (S1 - S2)/(S1 + S2) = -0.6
    // (Kinsler & Frey ch. 10), so exp(-2 j k L1) = -1/0.6: k L1 = (2n - 1) pi / 2 + j ln(1/0.6) / 2.
    const run = analyzeRun({
      segments: [
        { lengthM: 1, section: { shape: 'rect', widthM: 0.1, heightM: 0.1 } },
        { lengthM: 0.5, section: { shape: 'rect', widthM: 0.2, heightM: 0.2 } },
      ],
      start: { kind: 'closed' },
      end: { kind: 'anechoic' },
      maxHz: 1000,
      wallLosses: false,
    });
    const dampingHz = (c * Math.log(1 / 0.6)) / (4 * Math.PI * 1);
    expect(run.resonances).toHaveLength(6);
    run.resonances.forEach((resonance, index) => {
      expectClose(resonance.frequencyHz, ((2 * index + 1) * c) / 4, 1e-6, `mode ${index + 1}`);
      expectClose(resonance.bandwidthHz ?? NaN, 2 * dampingHz, 1e-6, `bandwidth ${index + 1}`);
    });
  });
});
