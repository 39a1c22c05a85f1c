// Candidate treatments for a flag, each evaluated by re-running the engine. A change of an end is
// offered only where it lowers the flagged quantity (flanging an outlet lowers its end reflection
// loss, so it raises the level in the room; it can still move a resonance off a tone).
import type { FlaggedQuantity, RiskFlag, RiskInput } from '../risk/risk-types';
import { longestSegment } from './apply-treatment';
import { evaluateTreatment } from './evaluate-treatment';
import type { Treatment, TreatmentResult } from './treatment-types';

/** 50 mm fibrous liner, absorbing by band for its thickness (product default; a common liner thickness). */
const DEFAULT_LINING = { thicknessM: 0.05 };
/** A fan end that absorbs: a lined plenum or the fan's own casing, absorption 0.7 (product default, illustrative). */
const ABSORBING_FAN_END = { kind: 'lined' as const, absorption: 0.7 };
/** A change must lower the flagged gain by at least this much to count, dB (product rule). */
const LEAST_GAIN_CHANGE_DB = 0.5;
const LEAST_LEVEL_CHANGE_DB = 0.05;

export function lowersQuantity(before: FlaggedQuantity, after: FlaggedQuantity, clears: boolean): boolean {
  if (before.levelDb !== undefined) return after.levelDb !== undefined && after.levelDb < before.levelDb - LEAST_LEVEL_CHANGE_DB;
  if (clears) return true;
  return before.gainDb !== undefined && after.gainDb !== undefined && after.gainDb < before.gainDb - LEAST_GAIN_CHANGE_DB;
}

export function candidateTreatments(input: RiskInput, flag: RiskFlag): TreatmentResult[] {
  if (flag.kind === 'tone-above-cutoff') return [];
  const longest = longestSegment(input.run);
  const flangeOutlet: Treatment = { kind: 'change-termination', end: 'end', termination: { kind: 'open', flange: 'flanged' } };
  const candidates: Treatment[] =
    flag.kind === 'level-above-criterion'
      ? [{ kind: 'line-segment', segmentIndex: longest, ...DEFAULT_LINING }, flangeOutlet]
      : [
          { kind: 'retune-length', segmentIndex: longest },
          { kind: 'side-branch-resonator' },
          { kind: 'line-segment', segmentIndex: longest, ...DEFAULT_LINING },
          { kind: 'change-termination', end: 'start', termination: ABSORBING_FAN_END },
          flangeOutlet,
        ];
  return candidates
    .filter((treatment) => !changesNothing(input, treatment))
    .map((treatment) => evaluateTreatment(input, flag, treatment))
    .filter((result) => result.treatment.kind !== 'change-termination' || lowersQuantity(result.before, result.after, result.clears));
}

/** A termination change to the termination the end already has is no treatment. */
function changesNothing(input: RiskInput, treatment: Treatment): boolean {
  if (treatment.kind !== 'change-termination') return false;
  const current = treatment.end === 'end' ? input.run.end : input.run.start;
  return JSON.stringify(current) === JSON.stringify(treatment.termination);
}
