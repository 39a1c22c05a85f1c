// No missed or doubled modes, over random supply runs: the number of natural frequencies the search
// reports inside a region of the complex frequency plane must equal the number of zeros of the
// characteristic function D(f) there, counted independently of the search by the argument principle
// (the winding number of D along the region's boundary: Ahlfors, Complex Analysis, 3rd ed., 4.5.2;
// D has no poles, network/evaluator.ts), and every reported frequency must be a natural frequency of
// the mathjs oracle (1 - Rs Gamma_in = 0 there, written from the published formulas).
import fc from 'fast-check';
import { complex, type Complex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { compileNetwork } from '@/lib/acoustic/network/compile';
import { NetworkEvaluator } from '@/lib/acoustic/network/evaluator';
import { zerosInside } from './argument-principle';
import hiddenModeRuns from './hidden-mode-runs.json';
import { oracleMismatch } from './mathjs-network';
import { supplyRunArbitrary } from './random-run';

/**
 * Highest |Im kL| of the contour along the whole network: the state's terms grow as exp(|Im kL|) away from
 * the real axis while D stays of the order of one near its zeros, so above this D cancels into rounding
 * noise (e^12 ~ 1.6e5: D keeps ten good digits).
 */
const MAX_GROWTH_EXPONENT = 12;

describe('no missed or doubled modes on random supply runs (argument principle and the mathjs oracle)', () => {
  it('500 runs with changing sections and open branch ends: every mode damped less than half the mode spacing is found once, and each is the oracle\'s', () => {
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
        // The region: minHz < fr < maxHz, -spacing/4 < fi < min(q fr, spacing / 2, cap): Q above about 1.4 and damping
        // below half the mean mode spacing (modal overlap 2 fi / spacing under 1: modes that stand clear of each other,
        // which the search promises to find; natural-frequencies.ts), and no higher than where D is still computable
        // (|Im k| L_total <= MAX_GROWTH_EXPONENT); its edges moved off any reported zero.
        const margin = 0.03 * spacingHz;
        let lowHz = analysis.minHz + margin;
        let highHz = analysis.maxHz - margin;
        let slope = 0.35;
        let capHz = Math.min(spacingHz / 2, (MAX_GROWTH_EXPONENT * network.speedOfSoundMps) / (2 * Math.PI * network.totalLengthM));
        const topAt = (re: number) => Math.min(slope * re, capHz);
        for (let attempt = 0; attempt < 20; attempt++) {
          const nearLow = zeros.some((zero) => Math.abs(zero.re - lowHz) < margin);
          const nearHigh = zeros.some((zero) => Math.abs(zero.re - highHz) < margin);
          const nearTop = zeros.some((zero) => Math.abs(zero.im - topAt(zero.re)) < margin);
          if (!nearLow && !nearHigh && !nearTop) break;
          if (nearLow) lowHz += 2 * margin;
          if (nearHigh) highHz -= 2 * margin;
          if (nearTop) {
            slope *= 0.97;
            capHz *= 0.97;
          }
        }
        const floorHz = -spacingHz / 4;
        const inside = zeros.filter((zero) => zero.re > lowHz && zero.re < highHz && zero.im > floorHz && zero.im < topAt(zero.re));
        // Counter-clockwise: along the floor, up the right edge, back along the top (with its corner where the cap begins), down the left edge.
        const kneeHz = capHz / slope;
        const corners = [{ re: lowHz, im: floorHz }, { re: highHz, im: floorHz }, { re: highHz, im: topAt(highHz) }];
        if (kneeHz > lowHz && kneeHz < highHz) corners.push({ re: kneeHz, im: capHz });
        corners.push({ re: lowHz, im: topAt(lowHz) });
        const counted = zerosInside(evaluator, corners, spacingHz / 16);
        expect(Math.abs(counted - Math.round(counted)), 'the winding number is a whole number').toBeLessThan(1e-6);
        evaluations += evaluator.evaluations;
        expect(inside.length, `modes reported in ${lowHz.toFixed(2)}–${highHz.toFixed(2)} Hz against the zeros counted there`).toBe(Math.round(counted) || 0); // || 0: a winding number of -0 is none
        // Each one reported is a natural frequency of the oracle (a reflecting start: its natural frequencies are 1 - Rs Gamma = 0).
        if (run.start.kind === 'anechoic' || (run.start.kind === 'lined' && run.start.absorption > 0.999)) return;
        for (const zero of inside) {
          // The oracle's own zero lies one Newton step away: M / M' with M' by a forward difference.
          const stepHz = 1e-4;
          const here = oracleMismatch(run, complex(zero.re, zero.im)) as Complex;
          const beside = oracleMismatch(run, complex(zero.re + stepHz, zero.im)) as Complex;
          const offsetHz = (Math.hypot(here.re, here.im) * stepHz) / Math.hypot(beside.re - here.re, beside.im - here.im);
          expect(offsetHz, `distance from ${zero.re.toFixed(4)} + ${zero.im.toFixed(4)}j Hz to the oracle's natural frequency`).toBeLessThan(1e-6 * Math.max(1, zero.re));
          modesChecked += 1;
        }
      }),
      { numRuns: Number(process.env.ZC_RUNS ?? 500), seed: 20261203, endOnFailure: true },
    );
    expect(modesChecked).toBeGreaterThan(1000);
    console.log(`zero count: ${modesChecked} modes checked against the oracle; ${evaluations} evaluations of D along the contours`);
  }, 600_000); // thousands of oracle evaluations in mathjs: slow on a busy machine, never timed

  // Random runs of other seeds where a search once missed a mode inside the promise (fixtures, as drawn by
  // supplyRunArbitrary): the zero count over the strip around that mode must match what is reported.
  const cases: { name: string; lowHz: number; highHz: number; run: RunInput }[] = [
    { name: 'a sharp mode beneath broad modes of low Q (both ends absorbing)', lowHz: 56, highHz: 94, run: bothEndsAbsorbing() },
    ...(hiddenModeRuns as { name: string; lowHz: number; highHz: number; run: RunInput }[]),
  ];
  it.each(cases)('$name: found, as the zero count says', ({ lowHz, highHz, run }) => {
    const analysis = analyzeRun(run);
    const network = compileNetwork(run);
    const evaluator = new NetworkEvaluator(network);
    const spacingHz = network.speedOfSoundMps / (2 * network.totalLengthM);
    const topHz = spacingHz / 2;
    const corners = [{ re: lowHz, im: -spacingHz / 4 }, { re: highHz, im: -spacingHz / 4 }, { re: highHz, im: topHz }, { re: lowHz, im: topHz }];
    const counted = Math.round(zerosInside(evaluator, corners, spacingHz / 16));
    const inside = analysis.resonances.filter((resonance) => resonance.frequencyHz > lowHz && resonance.frequencyHz < highHz && resonance.dampingHz < topHz);
    expect(counted).toBeGreaterThan(0);
    expect(inside.length).toBe(counted);
  });
});

/** One of the random runs of another seed: the broad modes found first (Q about 1.1 and 1.6) lift the probes far above a sharp branch mode near 81.6 + 3.6j Hz. */
function bothEndsAbsorbing(): RunInput {
  const rect = (widthM: number, heightM: number) => ({ shape: 'rect' as const, widthM, heightM });
  const round = (diameterM: number) => ({ shape: 'round' as const, diameterM });
  return {
    walls: { kind: 'rigid' },
    segments: [
      { lengthM: 1.794, section: rect(0.494, 0.248) },
      {
        lengthM: 2.918,
        section: rect(0.243, 0.412),
        branches: [
          { segments: [{ lengthM: 0.435, section: rect(0.099, 0.124) }], end: { kind: 'open', flange: 'unflanged' } },
          { segments: [{ lengthM: 0.126, section: round(0.106) }, { lengthM: 1.373, section: round(0.227) }], end: { kind: 'open', flange: 'flanged' } },
        ],
      },
      {
        lengthM: 0.918,
        section: round(0.463),
        branches: [
          { segments: [{ lengthM: 0.886, section: round(0.228) }, { lengthM: 0.236, section: rect(0.591, 0.067) }], end: { kind: 'anechoic' } },
          { segments: [{ lengthM: 0.395, section: rect(0.42, 0.233) }], end: { kind: 'open', flange: 'unflanged' } },
        ],
      },
    ],
    start: { kind: 'anechoic' },
    end: { kind: 'anechoic' },
    temperatureC: 0,
    minHz: 20,
    maxHz: 105,
  };
}
