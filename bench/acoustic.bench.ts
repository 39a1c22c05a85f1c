// Benchmark of the acoustic engine: full analysis of a long branched run, the transfer-matrix sweep,
// a plain-loop baseline of the same chain, and the mathjs oracle on the same sweep.
import { complex } from 'mathjs';
import { analyzeRun, createAdmittanceSweeper, speedOfSound, type RunInput, type Segment } from '../lib/acoustic';
import { chainAdmittance, oracleAir } from '../tests/unit/acoustic/oracle/mathjs-network';

/** 200 segments, about 60 m, 10 tees each with a two-segment closed side branch. */
export function benchRun(): RunInput {
  const segments: Segment[] = [];
  for (let index = 0; index < 200; index++) {
    const segment: Segment = {
      lengthM: 0.24 + 0.12 * ((index * 7) % 5) / 4,
      section: index % 40 < 20 ? { shape: 'rect', widthM: 0.3, heightM: 0.2 } : { shape: 'round', diameterM: 0.25 },
    };
    if (index % 20 === 10) {
      segment.branches = [
        {
          segments: [
            { lengthM: 0.6 + index / 400, section: { shape: 'round', diameterM: 0.15 } },
            { lengthM: 0.4, section: { shape: 'round', diameterM: 0.1 } },
          ],
          end: { kind: 'closed' },
        },
      ];
    }
    segments.push(segment);
  }
  return { segments, start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, minHz: 20, maxHz: 400 };
}

export function median(values: number[]): number {
  const sorted = [...values].sort((first, second) => first - second);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Median wall time of repeats runs, ms; the fastest run goes to fastest (a loaded machine inflates the median). */
export function timeMs(action: () => void, repeats: number, fastest?: { ms: number }): number {
  const times: number[] = [];
  for (let index = 0; index < repeats; index++) {
    const startMs = performance.now();
    action();
    times.push(performance.now() - startMs);
  }
  if (fastest) fastest.ms = Math.min(...times);
  return median(times);
}

/** Flattened chain for the baseline: every segment of the run (branches appended), no tees. */
export function flatChain(run: RunInput) {
  const all: Segment[] = [];
  const visit = (segments: Segment[]) => {
    for (const segment of segments) {
      all.push(segment);
      for (const branch of segment.branches ?? []) visit(branch.segments);
    }
  };
  visit(run.segments);
  const rhoC = 413.26;
  const lengths = Float64Array.from(all.map((segment) => segment.lengthM));
  const impedances = Float64Array.from(
    all.map((segment) => rhoC / (segment.section.shape === 'round' ? (Math.PI * segment.section.diameterM ** 2) / 4 : segment.section.widthM * segment.section.heightM)),
  );
  const losses = Float64Array.from(all.map(() => 3e-4));
  return { lengths, impedances, losses };
}

/** The plain loop: hand-written complex arithmetic over Float64Array, no allocation, same chain physics. */
export function plainSweep(chain: ReturnType<typeof flatChain>, frequencies: Float64Array, out: Float64Array, speedMps: number): void {
  const { lengths, impedances, losses } = chain;
  for (let index = 0; index < frequencies.length; index++) {
    const hz = frequencies[index];
    const free = (2 * Math.PI * hz) / speedMps;
    const root = Math.sqrt(hz);
    let pRe = impedances[lengths.length - 1] * 2, pIm = 0, uRe = 0, uIm = 0;
    for (let segment = lengths.length - 1; segment >= 0; segment--) {
      const lengthM = lengths[segment];
      const impedance = impedances[segment];
      const phase = (free + losses[segment] * root) * lengthM;
      const growth = -losses[segment] * root * lengthM;
      const cosPhase = Math.cos(phase), sinPhase = Math.sin(phase);
      const expGrowth = Math.exp(growth);
      const coshGrowth = 0.5 * (expGrowth + 1 / expGrowth), sinhGrowth = coshGrowth - 1 / expGrowth;
      const cosRe = cosPhase * coshGrowth, cosIm = -sinPhase * sinhGrowth;
      const sinRe = sinPhase * coshGrowth, sinIm = cosPhase * sinhGrowth;
      const upperRe = -impedance * sinIm, upperIm = impedance * sinRe;
      const lowerRe = -sinIm / impedance, lowerIm = sinRe / impedance;
      const nextPRe = cosRe * pRe - cosIm * pIm + upperRe * uRe - upperIm * uIm;
      const nextPIm = cosRe * pIm + cosIm * pRe + upperRe * uIm + upperIm * uRe;
      const nextURe = lowerRe * pRe - lowerIm * pIm + cosRe * uRe - cosIm * uIm;
      const nextUIm = lowerRe * pIm + lowerIm * pRe + cosRe * uIm + cosIm * uRe;
      pRe = nextPRe; pIm = nextPIm; uRe = nextURe; uIm = nextUIm;
    }
    const norm = pRe * pRe + pIm * pIm;
    out[2 * index] = (uRe * pRe + uIm * pIm) / norm;
    out[2 * index + 1] = (uIm * pRe - uRe * pIm) / norm;
  }
}

export function runAcousticBench(): void {
  const run = benchRun();
  const lengthM = run.segments.reduce((sum, segment) => sum + segment.lengthM, 0);
  const frequencyCount = 2000;
  const frequencies = Float64Array.from({ length: frequencyCount }, (_, index) => 20 + (380 * index) / (frequencyCount - 1));
  const out = new Float64Array(2 * frequencyCount);
  const chain = flatChain(run);
  const speedMps = speedOfSound(20);
  const nsPer = (ms: number, segments: number): number => (ms * 1e6) / (segments * frequencyCount);
  // The engine's sweep and the plain loop over the same chain are timed in alternation, round by
  // round, so that a change in the machine's load falls on both alike; per input segment.
  const alternating = (sweeper: ReturnType<typeof createAdmittanceSweeper>) => {
    for (let warm = 0; warm < 5; warm++) {
      sweeper.sweep(frequencies, out);
      plainSweep(chain, frequencies, out, speedMps);
    }
    const engine: number[] = [];
    const plain: number[] = [];
    const ratio: number[] = [];
    for (let round = 0; round < 21; round++) {
      engine.push(nsPer(timeMs(() => sweeper.sweep(frequencies, out), 1), sweeper.segmentCount));
      plain.push(nsPer(timeMs(() => plainSweep(chain, frequencies, out, speedMps), 1), chain.lengths.length));
      ratio.push(engine[round] / plain[round]);
    }
    return { engineNs: median(engine), plainNs: median(plain), ratio: median(ratio) };
  };
  // Every segment carried on its own: the inner loop against the plain loop, like for like.
  const sweeper = createAdmittanceSweeper(run, { mergeUniformStretches: false });
  const first = alternating(sweeper);

  for (let warm = 0; warm < 5; warm++) analyzeRun(run);
  const analysis = analyzeRun(run);
  const analysisFastest = { ms: 0 };
  const analysisMs = timeMs(() => analyzeRun(run), 51, analysisFastest);
  // The same run with rigid walls (air losses only): the sharp, ideal case, for comparison with sheet metal (the default).
  const rigidRun: RunInput = { ...run, walls: { kind: 'rigid' } };
  for (let warm = 0; warm < 5; warm++) analyzeRun(rigidRun);
  const rigidAnalysis = analyzeRun(rigidRun);
  const rigidFastest = { ms: 0 };
  const rigidMs = timeMs(() => analyzeRun(rigidRun), 51, rigidFastest);

  // Pressure envelopes are built when first read; time a fresh analysis plus reading every one.
  const envelopesFastest = { ms: 0 };
  const withEnvelopesMs = timeMs(() => {
    for (const resonance of analyzeRun(run).resonances) void resonance.pressureEnvelope;
  }, 21, envelopesFastest);

  // The same sweeper again once analyzeRun has run (the JIT's feedback from other callers of the loop can slow it).
  const after = alternating(sweeper);
  // As analyzeRun runs it: uniform stretches merged (exact), still per input segment.
  const merged = createAdmittanceSweeper(run);
  const mergedRounds = alternating(merged);

  const air = oracleAir(20);
  const oracleFrequencies = 10;
  const oracleMs = timeMs(() => {
    for (let index = 0; index < oracleFrequencies; index++) chainAdmittance(run.segments, run.end, complex(frequencies[index * 100], 0), air, { kirchhoff: true, wallDbPerM: 0 });
  }, 3);
  const oracleNs = (oracleMs * 1e6) / (sweeper.segmentCount * oracleFrequencies);
  const sweepNs = first.engineNs;
  const mergedNs = mergedRounds.engineNs;

  const rows: Array<[string, string]> = [
    ['run', `${run.segments.length} segments, ${lengthM.toFixed(1)} m, 10 tees with two-segment branches, ${run.minHz}-${run.maxHz} Hz`],
    ['resonances found', `${analysis.resonances.length}`],
    ['analyzeRun, sheet-metal walls, median of 51', `${analysisMs.toFixed(2)} ms (fastest ${analysisFastest.ms.toFixed(2)} ms; aim < 10 ms)`],
    ['analyzeRun, rigid walls, median of 51', `${rigidMs.toFixed(2)} ms (fastest ${rigidFastest.ms.toFixed(2)} ms; ${rigidAnalysis.resonances.length} resonances)`],
    ['analyzeRun + every pressure envelope', `${withEnvelopesMs.toFixed(2)} ms (fastest ${envelopesFastest.ms.toFixed(2)} ms)`],
    ['sweep (engine, every segment)', `${first.engineNs.toFixed(1)} ns per segment·frequency (${sweeper.segmentCount} segments x ${frequencyCount} frequencies, median of 21 rounds)`],
    ['sweep (plain Float64Array loop)', `${first.plainNs.toFixed(1)} ns per segment·frequency (same rounds, alternating)`],
    ['engine / plain loop', `${first.ratio.toFixed(2)}x (median of the rounds' ratios; aim <= 1.3x)`],
    ['  same, measured after analyzeRun', `${after.engineNs.toFixed(1)} ns against ${after.plainNs.toFixed(1)} ns: ${after.ratio.toFixed(2)}x`],
    ['sweep (engine, uniform stretches merged)', `${mergedRounds.engineNs.toFixed(1)} ns per input segment·frequency (${merged.chainLength} stretches): ${mergedRounds.ratio.toFixed(2)}x the plain loop`],
    ['sweep (mathjs oracle)', `${oracleNs.toFixed(0)} ns per segment·frequency`],
    ['oracle / engine (every segment)', `${(oracleNs / sweepNs).toFixed(0)}x (aim >= 100x)`],
    ['oracle / engine (merged)', `${(oracleNs / mergedNs).toFixed(0)}x`],
  ];
  console.log('acoustic engine');
  for (const [label, value] of rows) console.log(`  ${label.padEnd(42)} ${value}`);
}
