// Flags a treatment raises elsewhere: on the treated model, any flag whose kind and subject were not
// flagged before, or were flagged at a lower severity (a retune that clears one tone can move another
// resonance onto a harmonic).
import { assessRisks } from '../risk/assess-risks';
import type { RiskFlag, RiskInput, Severity } from '../risk/risk-types';
import type { RunAnalysis, RunInput } from '../types';

const RANK: Record<Severity, number> = { low: 0, medium: 1, high: 2 };

/** The untreated model's flags, assessed once per input however many candidates are weighed against it. */
const flagsBefore = new WeakMap<RiskInput, readonly RiskFlag[]>();

function assessedOnce(baseline: RiskInput): readonly RiskFlag[] {
  let flags = flagsBefore.get(baseline);
  if (!flags) {
    flags = assessRisks(baseline);
    flagsBefore.set(baseline, flags);
  }
  return flags;
}

/** treatedAnalysis: the engine's analysis of treatedRun, when the caller already has it. */
export function raisedFlags(baseline: RiskInput, treatedRun: RunInput, treatedAnalysis?: RunAnalysis): RiskFlag[] {
  const before = assessedOnce(baseline);
  const worstBefore = new Map<string, number>();
  for (const flag of before) {
    const key = `${flag.kind}|${flag.subject}`;
    worstBefore.set(key, Math.max(worstBefore.get(key) ?? -1, RANK[flag.severity]));
  }
  const raised = new Map<string, RiskFlag>();
  for (const flag of assessRisks({ ...baseline, run: treatedRun }, treatedAnalysis)) {
    const key = `${flag.kind}|${flag.subject}`;
    if (RANK[flag.severity] <= (worstBefore.get(key) ?? -1)) continue;
    const kept = raised.get(key);
    if (!kept || RANK[flag.severity] > RANK[kept.severity]) raised.set(key, flag);
  }
  return [...raised.values()];
}
