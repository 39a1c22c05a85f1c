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
  return candidates.map((treatment) => evaluateTreatment(input, flag, treatment));
}
