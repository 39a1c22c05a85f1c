// No missed or doubled modes, over random supply runs: the number of natural frequencies the search
// reports inside a region of the complex frequency plane must equal the number of zeros of the
// characteristic function D(f) there, counted independently of the search by the argument principle
// (the winding number of D along the region's boundary: Ahlfors, Complex Analysis, 3rd ed., 4.5.2;
// D has no poles, network/evaluator.ts), and every reported frequency must be a natural frequency of
// the mathjs oracle (1 - Rs Gamma_in = 0 there, written from the published formulas).
import fc from 'fast-check';
import { complex, type Complex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { analyzeRun, type Branch, type RunInput, type Segment } from '@/lib/acoustic';
import { compileNetwork } from '@/lib/acoustic/network/compile';
import { NetworkEvaluator } from '@/lib/acoustic/network/evaluator';
import { oracleMismatch } from './mathjs-network';
import { sectionArbitrary, terminationArbitrary, wallArbitrary } from './random-run';

const openEnd = fc.record({ kind: fc.constant('open' as const), flange: fc.constantFrom('flanged' as const, 'unflanged' as const) });

/** A supply run: the section changes at every joint, and side branches end at open outlets (now and then closed). */
const supplySegment: fc.Arbitrary<Segment> = fc
  .tuple(
    fc.double({ min: 0.2, max: 4, noNaN: true }),
    sectionArbitrary,
    fc.option(
      fc.array(
        fc.record({
          segments: fc.array(fc.record({ lengthM: fc.double({ min: 0.1, max: 2, noNaN: true }), section: sectionArbitrary }), { minLength: 1, maxLength: 2 }),
          end: fc.oneof({ arbitrary: openEnd, weight: 4 }, { arbitrary: terminationArbitrary, weight: 1 }),
        }) as fc.Arbitrary<Branch>,
        { minLength: 1, maxLength: 2 },
      ),
      { freq: 2 },
    ),
  )
  .map(([lengthM, section, branches]) => (branches ? { lengthM, section, branches } : { lengthM, section }));

const supplyRunArbitrary: fc.Arbitrary<RunInput> = fc.record({
  walls: wallArbitrary,
  segments: fc.array(supplySegment, { minLength: 2, maxLength: 8 }),
  start: terminationArbitrary,
  end: fc.oneof({ arbitrary: openEnd, weight: 3 }, { arbitrary: terminationArbitrary, weight: 1 }),
  temperatureC: fc.double({ min: -20, max: 40, noNaN: true }),
  minHz: fc.constant(20),
  maxHz: fc.double({ min: 80, max: 300, noNaN: true }),
});

interface Zero { re: number; im: number }

/** Change of arg D from a to b along a straight line, each piece halved until both halves turn by under 0.4 rad. */
function argumentChange(evaluator: NetworkEvaluator, from: Zero, to: Zero, pieces: number): number {
  const argAt = (re: number, im: number) => {
    evaluator.characteristic(re, im, false);
    return Math.atan2(evaluator.valueIm, evaluator.valueRe);
  };
  const wrap = (angle: number) => angle - 2 * Math.PI * Math.round(angle / (2 * Math.PI));
  const along = (t: number) => ({ re: from.re + (to.re - from.re) * t, im: from.im + (to.im - from.im) * t });
  const refine = (t0: number, a0: number, t1: number, a1: number, depth: number): number => {
    const middle = along((t0 + t1) / 2);
    const am = argAt(middle.re, middle.im);
    const first = wrap(am - a0);
    const second = wrap(a1 - am);
    // Each half turns by well under pi, so neither can hide a whole turn; a zero close to the line makes its
    // halves turn fast and is refined to its own scale (a piece 2^-30 of the edge: far below any zero's distance).
    if (Math.abs(first) < 0.4 && Math.abs(second) < 0.4) return first + second;
    if (depth >= 30) throw new Error(`arg D does not settle near ${along(t0).re.toFixed(4)} + ${along(t0).im.toFixed(4)}j Hz`);
    return refine(t0, a0, (t0 + t1) / 2, am, depth + 1) + refine((t0 + t1) / 2, am, t1, a1, depth + 1);
  };
  let total = 0;
  let previous = argAt(from.re, from.im);
  for (let piece = 1; piece <= pieces; piece++) {
    const point = along(piece / pieces);
    const next = argAt(point.re, point.im);
    total += refine((piece - 1) / pieces, previous, piece / pieces, next, 0);
    previous = next;
  }
  return total;
}

/** Zeros of D inside the polygon (counter-clockwise), by the winding number of D along it. */
function zerosInside(evaluator: NetworkEvaluator, corners: Zero[], pieceHz: number): number {
  let total = 0;
  corners.forEach((corner, index) => {
    const next = corners[(index + 1) % corners.length];
    total += argumentChange(evaluator, corner, next, Math.max(4, Math.ceil(Math.hypot(next.re - corner.re, next.im - corner.im) / pieceHz)));
  });
  return total / (2 * Math.PI);
}

describe('no missed or doubled modes on random supply runs (argument principle and the mathjs oracle)', () => {
  it('500 runs with changing sections and open branch ends: the count inside the region matches, each mode is the oracle\'s', () => {
    let modesChecked = 0;
    let evaluations = 0;
    fc.assert(
      fc.property(supplyRunArbitrary, (run) => {
        const analysis = analyzeRun(run);
        const network = compileNetwork(run);
        const evaluator = new NetworkEvaluator(network);
        const spacingHz = network.speedOfSoundMps / (2 * network.totalLengthM);
        const zeros = analysis.resonances.map((resonance) => ({ re: resonance.frequencyHz, im: resonance.dampingHz }));
        // None reported twice.
        zeros.forEach((zero, index) => {
          for (const other of zeros.slice(index + 1)) expect(Math.hypot(zero.re - other.re, zero.im - other.im)).toBeGreaterThan(1e-6 * spacingHz);
        });
        // The region: minHz < fr < maxHz, -spacing/4 < fi < q fr (Q above about 1.4), its edges moved off any reported zero.
        const margin = 0.03 * spacingHz;
        let lowHz = analysis.minHz + margin;
        let highHz = analysis.maxHz - margin;
        let slope = 0.35;
        for (let attempt = 0; attempt < 20; attempt++) {
          const nearLow = zeros.some((zero) => Math.abs(zero.re - lowHz) < margin);
          const nearHigh = zeros.some((zero) => Math.abs(zero.re - highHz) < margin);
          const nearTop = zeros.some((zero) => Math.abs(zero.im - slope * zero.re) / Math.hypot(1, slope) < margin);
          if (!nearLow && !nearHigh && !nearTop) break;
          if (nearLow) lowHz += 2 * margin;
          if (nearHigh) highHz -= 2 * margin;
          if (nearTop) slope *= 0.97;
        }
        const floorHz = -spacingHz / 4;
        const inside = zeros.filter((zero) => zero.re > lowHz && zero.re < highHz && zero.im > floorHz && zero.im < slope * zero.re);
        const corners = [{ re: lowHz, im: floorHz }, { re: highHz, im: floorHz }, { re: highHz, im: slope * highHz }, { re: lowHz, im: slope * lowHz }];
        const counted = zerosInside(evaluator, corners, spacingHz / 16);
        expect(Math.abs(counted - Math.round(counted)), 'the winding number is a whole number').toBeLessThan(1e-6);
        evaluations += evaluator.evaluations;
        expect(inside.length, `modes reported in ${lowHz.toFixed(2)}–${highHz.toFixed(2)} Hz against the zeros counted there`).toBe(Math.round(counted));
        // Each one reported is a natural frequency of the oracle (a reflecting start: its natural frequencies are 1 - Rs Gamma = 0).
        if (run.start.kind === 'anechoic' || (run.start.kind === 'lined' && run.start.absorption > 0.999)) return;
        for (const zero of inside) {
          const mismatch = oracleMismatch(run, complex(zero.re, zero.im)) as Complex;
          expect(Math.hypot(mismatch.re, mismatch.im)).toBeLessThan(1e-5);
          modesChecked += 1;
        }
      }),
      { numRuns: Number(process.env.ZC_RUNS ?? 500), seed: 20261203 },
    );
    expect(modesChecked).toBeGreaterThan(1000);
    console.log(`zero count: ${modesChecked} modes checked against the oracle; ${evaluations} evaluations of D along the contours`);
  }, 600_000); // thousands of oracle evaluations in mathjs: slow on a busy machine, never timed
});
