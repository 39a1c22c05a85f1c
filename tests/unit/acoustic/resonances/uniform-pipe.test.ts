import { describe, expect, it } from 'vitest';
import { analyzeRun, type Termination } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { complex, exp, multiply, subtract, divide, abs, type Complex } from 'mathjs';
import { oracleReflection } from '../oracle/mathjs-network';

// Kinsler, Frey et al., Fundamentals of Acoustics, ch. 10: closed–closed f_n = n c / 2L; open–open
// f_n = n c / 2(L + 2 delta); closed–open f_n = (2n - 1) c / 4(L + delta). L = 2 m, a = 0.1 m, c = 343.2 m/s.
const lengthM = 2;
const radiusM = 0.1;
const c = 343.2;
const closed: Termination = { kind: 'closed' };
const unflanged: Termination = { kind: 'open', flange: 'unflanged' };
const flanged: Termination = { kind: 'open', flange: 'flanged' };

function pipe(start: Termination, end: Termination, wallLosses = false) {
  return analyzeRun({ segments: [{ lengthM, section: { shape: 'round', diameterM: 2 * radiusM } }], start, end, maxHz: 600, wallLosses, walls: { kind: 'rigid' } });
}

// End corrections as functions of ka, written out from the published fits so the analytic condition can
// use the same frequency-dependent delta: Dalmont & Nederveen (2001) unflanged, Norris & Sheng (1989) flanged.
const unflangedDelta = (hz: number) => {
  const ka = (2 * Math.PI * hz * radiusM) / c;
  return radiusM * 0.6133 * ((1 + 0.044 * ka * ka) / (1 + 0.19 * ka * ka) - 0.02 * Math.sin(2 * ka) ** 2);
};
const flangedDelta = (hz: number) => {
  const ka = (2 * Math.PI * hz * radiusM) / c;
  return (radiusM * 0.8216) / (1 + (0.77 * ka) ** 2 / (1 + 0.77 * ka));
};
/**
 * The real-frequency condition with delta(f) ignores the radiation damping; the complex natural
 * frequency's real part differs from it at second order (about f / (4 Q^2) plus the pull of d delta/df
 * at complex ka); it grows with ka, so the real-frequency check is made only for ka < 0.3 (f < 164 Hz),
 * where it stays under 0.05 Hz. The exact check, at every frequency, is the complex root below.
 */
const DAMPED_SHIFT_HZ = 0.05;
const LOW_KA_HZ = (0.3 * c) / (2 * Math.PI * radiusM);

/** Fixed point of f = numerator c / (4 (L + ends * delta(f))). */
function selfConsistent(quarterWaves: number, ends: number, delta: (hz: number) => number): number {
  let hz = (quarterWaves * c) / (4 * lengthM);
  for (let iteration = 0; iteration < 60; iteration++) hz = (quarterWaves * c) / (4 * (lengthM + ends * delta(hz)));
  return hz;
}

/**
 * Complex natural frequency of the lossless uniform pipe: the round trip closes on itself,
 * Rs(f) Re(f) exp(-2 j k L) = 1 (Kinsler & Frey ch. 10, with the ends' reflection coefficients), solved
 * by the secant method with mathjs complex numbers and the published end models.
 */
function complexRoot(start: Termination, end: Termination, guessHz: number): Complex {
  const condition = (hz: Complex) => {
    const roundTrip = multiply(
      multiply(oracleReflection(start, hz, radiusM, c), oracleReflection(end, hz, radiusM, c)),
      exp(multiply(hz, complex(0, (-4 * Math.PI * lengthM) / c)) as Complex),
    ) as Complex;
    return subtract(complex(1, 0), roundTrip) as Complex;
  };
  let previous = complex(guessHz * 0.99, 0);
  let current = complex(guessHz, 0);
  for (let iteration = 0; iteration < 50; iteration++) {
    const value = condition(current);
    const step = divide(multiply(value, subtract(current, previous)), subtract(value, condition(previous))) as Complex;
    previous = current;
    current = subtract(current, step) as Complex;
    if ((abs(step) as unknown as number) < 1e-11) break;
  }
  return current;
}

function expectComplexRoots(start: Termination, end: Termination, modes: number) {
  const resonances = pipe(start, end).resonances.slice(0, modes);
  expect(resonances).toHaveLength(modes);
  for (const [index, resonance] of resonances.entries()) {
    const root = complexRoot(start, end, resonance.frequencyHz);
    expectClose(resonance.frequencyHz, root.re, 1e-6, `mode ${index + 1} frequency`);
    expectClose(resonance.dampingHz, root.im, 1e-6, `mode ${index + 1} damping`);
    expectClose(resonance.q ?? NaN, root.re / (2 * root.im), 1e-6 * (resonance.q ?? 1), `mode ${index + 1} Q`);
  }
}

describe('uniform pipe resonances (Kinsler & Frey, ch. 10)', () => {
  it('closed–closed: n c / 2L, 85.80 Hz first (sheet), to 1e-6 Hz, undamped without wall losses', () => {
    const resonances = pipe(closed, closed).resonances;
    expect(resonances.map((resonance) => resonance.order)).toEqual([1, 2, 3, 4, 5, 6]);
    resonances.forEach((resonance, index) => {
      expectClose(resonance.frequencyHz, ((index + 1) * c) / (2 * lengthM), 1e-6, `mode ${index + 1}`);
      expect(resonance.q).toBeNull();
      expect(resonance.bandwidthHz).toBeNull();
    });
    expectClose(resonances[0].frequencyHz, 85.8, 0.005, 'sheet');
  });

  it('closed–closed nodes at (2m - 1) L / 2n and antinodes at m L / n (standing wave cos(n pi x / L))', () => {
    const resonances = pipe(closed, closed).resonances;
    resonances.slice(0, 4).forEach((resonance, index) => {
      const n = index + 1;
      expect(resonance.nodesM).toHaveLength(n);
      expect(resonance.antinodesM).toHaveLength(n + 1);
      resonance.nodesM.forEach((x, m) => expectClose(x, ((2 * m + 1) * lengthM) / (2 * n), 1e-9, `node ${m} of mode ${n}`));
      resonance.antinodesM.forEach((x, m) => expectClose(x, (m * lengthM) / n, 1e-9, `antinode ${m} of mode ${n}`));
    });
  });

  it('open–open unflanged: n c / 2(L + 2 delta); 80.84 Hz with delta = 0.6133 a (sheet)', () => {
    const resonances = pipe(unflanged, unflanged).resonances;
    // Low-frequency delta: the fit's delta is 0.5 % shorter at ka = 0.15, so 0.03 Hz tolerance.
    expectClose(resonances[0].frequencyHz, c / (2 * (lengthM + 2 * 0.6133 * radiusM)), 0.03, 'low-frequency delta');
    expectClose(resonances[0].frequencyHz, 80.84, 0.035, 'sheet');
    resonances.slice(0, 5).forEach((resonance, index) => {
      if (resonance.frequencyHz > LOW_KA_HZ) return;
      const expected = selfConsistent(2 * (index + 1), 2, unflangedDelta);
      expectClose(resonance.frequencyHz, expected, DAMPED_SHIFT_HZ, `mode ${index + 1}, delta(f)`);
      expect(resonance.q).not.toBeNull();
    });
    expectComplexRoots(unflanged, unflanged, 5);
  });

  it('closed–open unflanged: (2n - 1) c / 4(L + delta); 41.62 and 124.87 Hz (sheet)', () => {
    const resonances = pipe(closed, unflanged).resonances;
    expectClose(resonances[0].frequencyHz, c / (4 * (lengthM + 0.6133 * radiusM)), 0.01, 'n = 1, low-frequency delta');
    expectClose(resonances[0].frequencyHz, 41.62, 0.01, 'sheet n = 1');
    expectClose(resonances[1].frequencyHz, 124.87, 0.05, 'sheet n = 2 (delta(f) 0.3 % shorter at ka = 0.23)');
    resonances.slice(0, 6).forEach((resonance, index) => {
      if (resonance.frequencyHz > LOW_KA_HZ) return;
      expectClose(resonance.frequencyHz, selfConsistent(2 * index + 1, 1, unflangedDelta), DAMPED_SHIFT_HZ, `mode ${index + 1}, delta(f)`);
    });
    expectComplexRoots(closed, unflanged, 6);
  });

  it('closed–open flanged: 41.21 Hz with delta = 0.8216 a (sheet)', () => {
    const resonances = pipe(closed, flanged).resonances;
    expectClose(resonances[0].frequencyHz, 41.21, 0.01, 'sheet n = 1');
    resonances.slice(0, 6).forEach((resonance, index) => {
      if (resonance.frequencyHz > LOW_KA_HZ) return;
      expectClose(resonance.frequencyHz, selfConsistent(2 * index + 1, 1, flangedDelta), DAMPED_SHIFT_HZ, `mode ${index + 1}, delta(f)`);
    });
    expectComplexRoots(closed, flanged, 6);
  });

  it('open–open flanged and the reversed closed–open pipe give the same analytic frequencies', () => {
    pipe(flanged, flanged).resonances.slice(0, 4).forEach((resonance, index) => {
      if (resonance.frequencyHz > LOW_KA_HZ) return;
      expectClose(resonance.frequencyHz, selfConsistent(2 * (index + 1), 2, flangedDelta), DAMPED_SHIFT_HZ, `open–open flanged ${index + 1}`);
    });
    expectComplexRoots(flanged, flanged, 4);
    pipe(unflanged, closed).resonances.slice(0, 4).forEach((resonance, index) => {
      if (resonance.frequencyHz > LOW_KA_HZ) return;
      expectClose(resonance.frequencyHz, selfConsistent(2 * index + 1, 1, unflangedDelta), DAMPED_SHIFT_HZ, `open–closed ${index + 1}`);
    });
    expectComplexRoots(unflanged, closed, 4);
  });

  it('wall losses lower each frequency by the Kirchhoff dispersion, relative alpha c / omega (Kirchhoff 1868)', () => {
    const lossless = pipe(closed, closed).resonances;
    const lossy = pipe(closed, closed, true).resonances;
    const perSqrtHz = 9.35e-3 / Math.sqrt(1000); // sheet: 9.35e-3 Np/m at 1 kHz for a = 0.1 m
    lossy.forEach((resonance, index) => {
      const hz = lossless[index].frequencyHz;
      const expectedShift = (perSqrtHz * Math.sqrt(hz) * c) / (2 * Math.PI);
      expectClose(hz - resonance.frequencyHz, expectedShift, 0.02 * expectedShift, `shift of mode ${index + 1}`);
      // The same boundary layer gives Q = k / (2 alpha) for a closed–closed pipe.
      expectClose(resonance.q ?? NaN, ((2 * Math.PI * hz) / c) / (2 * perSqrtHz * Math.sqrt(hz)), 0.02 * (resonance.q ?? 1), `Q ${index + 1}`);
    });
  });

  it('orders count from the fundamental even below minHz: a 7 m closed–open pipe lists (2n - 1) c / 4(L + delta) from n = 2', () => {
    // f_1 = 343.2 / (4 x 7.06) = 12.2 Hz lies below the default minHz of 20 Hz; the first mode listed is f_2 = 3 f_1, order 2.
    const analysis = analyzeRun({ segments: [{ lengthM: 7, section: { shape: 'round', diameterM: 2 * radiusM } }], start: closed, end: unflanged, maxHz: 100, wallLosses: false });
    expect(analysis.minHz).toBe(20);
    const [first, second] = analysis.resonances;
    expect(first.order).toBe(2);
    expectClose(first.frequencyHz, (3 * c) / (4 * (7 + unflangedDelta(first.frequencyHz))), 0.01, 'f_2');
    expect(second.order).toBe(3);
    expectClose(second.frequencyHz, (5 * c) / (4 * (7 + unflangedDelta(second.frequencyHz))), 0.02, 'f_3');
  });
});
