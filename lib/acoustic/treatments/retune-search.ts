// Retuning: the smallest change of one segment's length that takes the flagged resonance (and any
// other) out of the coincidence window of the flag's target. A 1-D search, each step re-running
// analyzeRun on the changed run over a band around the target: the change is doubled until the flag
// clears, in each direction, then bisected back to the smallest clearing change.
import { analyzeRun } from '../analyze-run';
import type { RiskFlag, RiskInput } from '../risk/risk-types';
import type { RunInput } from '../types';
import { applyTreatment } from './apply-treatment';
import { measureFlag } from './measure-flag';

/** The search analyses only this fraction of the target frequency either side of it. */
const SEARCH_BAND_FRACTION = 0.3;
const MAX_DOUBLINGS = 10;
const BISECTIONS = 8;
/** A segment may shrink to this fraction of its length at most. */
const MIN_LENGTH_FRACTION = 0.1;

export interface RetuneResult {
  deltaLengthM: number | null;
  analyses: number;
}

export function searchRetune(input: RiskInput, flag: RiskFlag, segmentIndex: number): RetuneResult {
  let analyses = 0;
  const band = (run: RunInput): RunInput => ({ ...run, minHz: flag.targetHz * (1 - SEARCH_BAND_FRACTION), maxHz: flag.targetHz * (1 + SEARCH_BAND_FRACTION), maxEchoes: 0 });
  const clears = (deltaLengthM: number): boolean => {
    analyses++;
    const run = applyTreatment(input.run, { kind: 'retune-length', segmentIndex, deltaLengthM });
    return measureFlag(input, flag, run, analyzeRun(band(run))).clears;
  };
  const segmentLengthM = input.run.segments[segmentIndex].lengthM;
  const pathLengthM = input.run.segments.reduce((sum, segment) => sum + segment.lengthM, 0);
  // First guess: f ~ 1/L, so moving f by the window needs about L * window / f.
  const windowHz = flag.quantity.windowHz ?? 0;
  const distanceHz = flag.quantity.distanceHz ?? 0;
  const firstStepM = Math.max((pathLengthM * Math.max(windowHz - distanceHz, windowHz / 4)) / flag.targetHz, segmentLengthM / 1000);
  let best: number | null = null;
  for (const direction of [1, -1]) {
    let cleared: number | null = null;
    let notCleared = 0;
    for (let step = firstStepM, doubling = 0; doubling < MAX_DOUBLINGS; doubling++, step *= 2) {
      const delta = direction * step;
      if (segmentLengthM + delta < MIN_LENGTH_FRACTION * segmentLengthM) break;
      if (best !== null && Math.abs(delta) >= Math.abs(best)) break;
      if (clears(delta)) {
        cleared = delta;
        break;
      }
      notCleared = delta;
    }
    if (cleared === null) continue;
    let smallest: number = cleared;
    for (let bisection = 0; bisection < BISECTIONS; bisection++) {
      const middle: number = (smallest + notCleared) / 2;
      if (clears(middle)) smallest = middle;
      else notCleared = middle;
    }
    if (best === null || Math.abs(smallest) < Math.abs(best)) best = smallest;
  }
  return { deltaLengthM: best, analyses };
}
