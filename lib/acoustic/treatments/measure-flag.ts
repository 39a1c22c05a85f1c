// The flagged quantity of a flag on a (possibly treated) model, and whether the flag still stands.
import { analyzeRun } from '../analyze-run';
import { assessRisks, gainSeverity, measureTarget, responseOf } from '../risk/assess-risks';
import type { FlaggedQuantity, RiskFlag, RiskInput } from '../risk/risk-types';
import { outletLevels } from '../room/outlet-level';
import type { RunAnalysis, RunInput } from '../types';

export interface Measurement {
  quantity: FlaggedQuantity;
  clears: boolean;
}

/** Re-runs the engine on run (the treated model) and measures the flag's quantity; baseline is the untreated input. */
export function measureFlag(baseline: RiskInput, flag: RiskFlag, run: RunInput, analysis: RunAnalysis = analyzeRun(run)): Measurement {
  const input: RiskInput = { ...baseline, run };
  if (flag.kind === 'level-above-criterion') {
    if (!baseline.room || !baseline.outletSoundPowerDb) return { quantity: flag.quantity, clears: false };
    const baselineRun = baseline.baselineRun ?? baseline.run;
    const band = outletLevels(run, baseline.room, baseline.outletSoundPowerDb, baselineRun).find((level) => level.hz === flag.targetHz);
    const quantity = { levelDb: band?.levelDb, criterionDb: band?.criterionDb };
    // the level flag depends on the re-computed level with the treated path and outlet
    const clears = !assessRisks({ ...input, baselineRun }, analysis).some((other) => other.kind === flag.kind && other.subject === flag.subject);
    return { quantity, clears };
  }
  if (flag.kind === 'tone-above-cutoff' || !flag.quantity.envelopeHz) return { quantity: flag.quantity, clears: false };
  // the same interval on the treated run: what the run adds there now, and whether a resonance still meets it
  const measured = measureTarget(responseOf(run), analysis, flag.quantity.envelopeHz);
  const clears = measured.resonance === null || gainSeverity(measured.quantity.gainDb ?? -Infinity) === null;
  return { quantity: measured.quantity, clears };
}
