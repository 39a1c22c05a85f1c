// Benchmark of the resonance search on the harder runs of bench/harder-runs.ts: for each, the median
// time of a full analyzeRun, the evaluations of D(f) per resonance found, and the ratio of the time to
// ten plain-loop evaluations of the whole chain per resonance (the budget: aim <= 1).
import { loadavg } from 'node:os';
import { analyzeRun, speedOfSound, type RunInput } from '../lib/acoustic';
import { NetworkEvaluator } from '../lib/acoustic/network/evaluator';
import { flatChain, plainSweep, timeMs } from './acoustic.bench';
import { harderRun, type HarderRunOptions } from './harder-runs';

const PLAIN_FREQUENCIES = 64;
const BUDGET_EVALUATIONS_PER_RESONANCE = 10;

interface Case {
  label: string;
  options: HarderRunOptions;
}

const changingOpen = { sections: 'changing', branchEnd: 'open', maxHz: 400 } as const;
const CASES: Case[] = [
  { label: 'uniform sections, closed branches', options: { segmentCount: 200, sections: 'uniform', branchEnd: 'closed', maxHz: 400 } },
  { label: 'uniform sections, open branch ends', options: { segmentCount: 200, sections: 'uniform', branchEnd: 'open', maxHz: 400 } },
  { label: 'changing sections, closed branches', options: { segmentCount: 200, sections: 'changing', branchEnd: 'closed', maxHz: 400 } },
  ...[50, 100].map((segmentCount) => ({ label: `${segmentCount} segments (changing, open)`, options: { segmentCount, ...changingOpen } })),
  { label: 'changing sections, open branch ends (200)', options: { segmentCount: 200, ...changingOpen } },
  { label: '  same, rigid walls', options: { segmentCount: 200, ...changingOpen, walls: { kind: 'rigid' } } },
  ...[400, 800].map((segmentCount) => ({ label: `${segmentCount} segments (changing, open)`, options: { segmentCount, ...changingOpen } })),
  { label: '800 segments, rigid walls', options: { segmentCount: 800, ...changingOpen, walls: { kind: 'rigid' } } },
  ...[200, 400, 800, 1600].map((maxHz) => ({ label: `maxHz ${maxHz} Hz (100 mm ducts)`, options: { segmentCount: 200, ...changingOpen, maxHz, small: true } })),
];

/** Median time of one plain-loop evaluation of the run's whole chain (every segment, branches appended), ms. */
function plainEvaluationMs(run: RunInput): number {
  const chain = flatChain(run);
  const frequencies = Float64Array.from({ length: PLAIN_FREQUENCIES }, (_, index) => (run.minHz ?? 20) + index);
  const out = new Float64Array(2 * PLAIN_FREQUENCIES);
  const speedMps = speedOfSound(20);
  for (let warm = 0; warm < 3; warm++) plainSweep(chain, frequencies, out, speedMps);
  return timeMs(() => plainSweep(chain, frequencies, out, speedMps), 15) / PLAIN_FREQUENCIES;
}

/** Evaluations of D(f) in one analysis, counted on a wrapped evaluator after the timing (the wrapper is removed again). */
function evaluationsOf(run: RunInput): number {
  const original = NetworkEvaluator.prototype.characteristic;
  let count = 0;
  NetworkEvaluator.prototype.characteristic = function counted(this: NetworkEvaluator, re: number, im: number, withDerivative?: boolean) {
    count++;
    original.call(this, re, im, withDerivative);
  };
  try {
    analyzeRun(run);
  } finally {
    NetworkEvaluator.prototype.characteristic = original;
  }
  return count;
}

export function runSearchBench(): void {
  console.log(`resonance search (load average ${loadavg().map((load) => load.toFixed(2)).join(' ')}; 2 cores shared)`);
  console.log(`  ${'run (20 Hz to maxHz 400 unless stated, sheet-metal walls)'.padEnd(46)} ${'resonances'.padStart(10)} ${'median ms'.padStart(10)} ${'evals/res'.padStart(10)} ${'ratio'.padStart(7)} ${'x prev, per res'.padStart(16)}`);
  // The changing-section, open-end runs of 50 to 800 segments, by segment count: each doubling's growth is read against the run of half as many segments.
  const doublingMs = new Map<number, { ms: number; resonances: number }>();
  for (const { label, options } of CASES) {
    const run = harderRun(options);
    const warm = analyzeRun(run);
    const resonances = warm.resonances.length;
    const repeats = options.segmentCount >= 400 ? 5 : 11;
    const ms = timeMs(() => analyzeRun(run), repeats);
    const budgetMs = plainEvaluationMs(run) * BUDGET_EVALUATIONS_PER_RESONANCE * resonances;
    const perResonance = evaluationsOf(run) / resonances;
    const doubling = label.includes('segments (changing') || label.startsWith('changing sections, open');
    let growth = '';
    const half = doublingMs.get(options.segmentCount / 2);
    // and per resonance found: (segments x resonances) work gives 2x there
    if (doubling && half !== undefined) growth = `${(ms / half.ms).toFixed(1)}x ${((ms / resonances) / (half.ms / half.resonances)).toFixed(1)}x`;
    if (doubling) doublingMs.set(options.segmentCount, { ms, resonances });
    console.log(`  ${label.padEnd(46)} ${String(resonances).padStart(10)} ${ms.toFixed(1).padStart(10)} ${perResonance.toFixed(2).padStart(10)} ${(ms / budgetMs).toFixed(2).padStart(7)} ${growth.padStart(16)}`);
  }
  console.log('  ratio: median time / (one plain-loop evaluation of the whole chain x 10 x resonances); aim <= 1, evals/res <= 6, x prev (each doubling of segments) <= 4.5, and per resonance found (segments x resonances: 2)');
}

