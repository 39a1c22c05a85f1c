import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { complex, type Complex } from 'mathjs';
import { analyzeRun, startAdmittanceSweep, type RunInput } from '@/lib/acoustic';
import { chainAdmittance, oracleAir, oracleLosses, oracleMismatch } from './mathjs-network';
import { runArbitrary } from './random-run';
import { expectClose } from '../tolerance';

describe('fast path against the mathjs oracle (independent transfer-matrix model)', () => {
  it('start admittance agrees on random runs with branches, linings and every termination', () => {
    fc.assert(
      fc.property(runArbitrary, fc.array(fc.double({ min: 20, max: 400, noNaN: true }), { minLength: 3, maxLength: 6 }), (run, frequencies) => {
        const fast = startAdmittanceSweep(run, frequencies);
        const air = oracleAir(run.temperatureC ?? 20);
        frequencies.forEach((hz, index) => {
          const slow = chainAdmittance(run.segments, run.end, complex(hz, 0), air, oracleLosses(run)) as Complex;
          const scale = Math.hypot(slow.re, slow.im) + 1e-30;
          expect(Math.hypot(fast[2 * index] - slow.re, fast[2 * index + 1] - slow.im) / scale).toBeLessThan(1e-7);
        });
      }),
      { numRuns: 60, seed: 20240601 },
    );
  });

  it('every resonance found is a natural frequency of the oracle: 1 - Rs Gamma_in = 0 at fr + j fi', () => {
    fc.assert(
      fc.property(runArbitrary, (run) => {
        if (run.start.kind === 'anechoic' || (run.start.kind === 'lined' && run.start.absorption > 0.999)) return;
        for (const resonance of analyzeRun(run).resonances) {
          const mismatch = oracleMismatch(run, complex(resonance.frequencyHz, resonance.dampingHz)) as Complex;
          expect(Math.hypot(mismatch.re, mismatch.im)).toBeLessThan(1e-5);
        }
      }),
      { numRuns: 40, seed: 7 },
    );
  });

  it('no missed or doubled modes: lossless closed networks match the oracle\'s sign-change count of Im Y_in (fine grid, bisection)', () => {
    // Closed start and lossless, rigid-ended branches: Y_in is purely imaginary on the real axis and
    // the natural frequencies are its zeros (U = 0 at the closed start).
    const runs: RunInput[] = [
      {
        segments: [
          { lengthM: 1, section: { shape: 'round', diameterM: 0.1 }, branches: [{ segments: [{ lengthM: 1.001, section: { shape: 'round', diameterM: 0.1 } }], end: { kind: 'closed' } }] },
          { lengthM: 1, section: { shape: 'round', diameterM: 0.1 } },
        ],
        start: { kind: 'closed' },
        end: { kind: 'closed' },
      },
      {
        segments: [
          { lengthM: 0.7, section: { shape: 'rect', widthM: 0.3, heightM: 0.2 } },
          { lengthM: 1.9, section: { shape: 'round', diameterM: 0.15 }, branches: [{ segments: [{ lengthM: 0.4, section: { shape: 'round', diameterM: 0.3 } }, { lengthM: 0.8, section: { shape: 'round', diameterM: 0.1 } }], end: { kind: 'closed' } }] },
          { lengthM: 1.2, section: { shape: 'round', diameterM: 0.25 } },
        ],
        start: { kind: 'closed' },
        end: { kind: 'closed' },
      },
    ];
    // A mode may leave one end at rest (e.g. a branch and the far part of the path swinging in antiphase
    // about a pressure node at their junction), so the oracle counts the zeros seen from the start end and
    // from the end (the run reversed, no branch at the reversed path's far end needed here) and merges them.
    const air = oracleAir(20);
    const zerosSeenFrom = (run: RunInput): number[] => {
      const imaginaryAdmittance = (hz: number) => (chainAdmittance(run.segments, run.end, complex(hz, 0), air, { kirchhoff: false, wallDbPerM: 0 }) as Complex).im;
      const zeros: number[] = [];
      let previous = imaginaryAdmittance(20);
      for (let hz = 20.05; hz <= 300; hz += 0.05) {
        const value = imaginaryAdmittance(hz);
        if (Math.sign(value) !== Math.sign(previous)) {
          let low = hz - 0.05;
          let high = hz;
          for (let step = 0; step < 40; step++) {
            const middle = (low + high) / 2;
            if (Math.sign(imaginaryAdmittance(middle)) === Math.sign(imaginaryAdmittance(low))) low = middle;
            else high = middle;
          }
          const root = (low + high) / 2;
          // a zero, not a pole: |Y| small there
          if (Math.abs(imaginaryAdmittance(root)) < 1e-6 * Math.max(Math.abs(value), Math.abs(previous), 1e-12) + 1e-12) zeros.push(root);
        }
        previous = value;
      }
      return zeros;
    };
    const reverse = (run: RunInput): RunInput => {
      // Move each tee to the junction it sits on in the reversed order: the branches at segment i's far end
      // sit at reversed segment (n - 2 - i)'s far end.
      const count = run.segments.length;
      const segments = run.segments.map((segment, index) => {
        const source = run.segments[count - 1 - index];
        const branchesFrom = run.segments[count - 2 - index]?.branches;
        return { lengthM: source.lengthM, section: source.section, ...(branchesFrom ? { branches: branchesFrom } : {}) };
      });
      return { ...run, segments, start: run.end, end: run.start };
    };
    for (const base of runs) {
      const run: RunInput = { ...base, wallLosses: false, minHz: 20, maxHz: 300 };
      const zeros = [...zerosSeenFrom(run)];
      for (const zero of zerosSeenFrom(reverse(run))) if (!zeros.some((known) => Math.abs(known - zero) < 1e-6)) zeros.push(zero);
      zeros.sort((first, second) => first - second);
      const found = analyzeRun(run).resonances.map((resonance) => resonance.frequencyHz);
      expect(found).toHaveLength(zeros.length);
      found.forEach((hz, index) => expectClose(hz, zeros[index], 1e-6, `mode ${index + 1}`));
    }
  }, 60_000); // hundreds of oracle evaluations in mathjs: slow on a busy machine, never timed
});
