// Candidate treatments for a flag, each evaluated by re-running the engine.
import type { RiskFlag, RiskInput } from '../risk/risk-types';
import { longestSegment } from './apply-treatment';
import { evaluateTreatment } from './evaluate-treatment';
import type { Treatment, TreatmentResult } from './treatment-types';

/** A 50 mm lining of absorption 0.7 (product default, a typical duct liner; the value is illustrative). */
const DEFAULT_LINING = { thicknessM: 0.05, absorption: 0.7 };

export function candidateTreatments(input: RiskInput, flag: RiskFlag): TreatmentResult[] {
  const longest = longestSegment(input.run);
  const candidates: Treatment[] =
    flag.kind === 'level-above-criterion'
      ? [
          { kind: 'line-segment', segmentIndex: longest, ...DEFAULT_LINING },
          { kind: 'change-termination', end: 'end', termination: { kind: 'open', flange: 'flanged' } },
        ]
      : [
          { kind: 'retune-length', segmentIndex: longest },
          { kind: 'side-branch-resonator' },
          { kind: 'line-segment', segmentIndex: longest, ...DEFAULT_LINING },
          { kind: 'change-termination', end: 'end', termination: { kind: 'open', flange: 'flanged' } },
        ];
  return candidates.filter((treatment) => !changesNothing(input, treatment)).map((treatment) => evaluateTreatment(input, flag, treatment));
}

/** A termination change to the termination the end already has is no treatment. */
function changesNothing(input: RiskInput, treatment: Treatment): boolean {
  if (treatment.kind !== 'change-termination') return false;
  const current = treatment.end === 'end' ? input.run.end : input.run.start;
  return JSON.stringify(current) === JSON.stringify(treatment.termination);
}
