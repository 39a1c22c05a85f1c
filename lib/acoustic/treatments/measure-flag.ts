// The flagged quantity of a flag on a (possibly treated) model, and whether the flag still stands.
import { analyzeRun } from '../analyze-run';
import { coincidenceWindowHz, nearestResonance } from '../risk/coincidence';
import { assessRisks } from '../risk/assess-risks';
import type { FlaggedQuantity, RiskFlag, RiskInput } from '../risk/risk-types';
import { outletLevels } from '../room/outlet-level';
import { DEFAULT_COINCIDENCE_PERCENT } from '../constants';
import type { RunAnalysis, RunInput } from '../types';

export interface Measurement {
  quantity: FlaggedQuantity;
  clears: boolean;
}

/** Re-runs the engine on run (the treated model) and measures the flag's quantity; baseline is the untreated input. */
export function measureFlag(baseline: RiskInput, flag: RiskFlag, run: RunInput, analysis: RunAnalysis = analyzeRun(run)): Measurement {
  const input: RiskInput = { ...baseline, run };
  const stillFlagged = (): boolean => assessRisks(input, analysis).some((other) => other.kind === flag.kind && other.subject === flag.subject);
  if (flag.kind === 'level-above-criterion') {
    if (!baseline.room || !baseline.outletSoundPowerDb) return { quantity: flag.quantity, clears: false };
    const baselineRun = baseline.baselineRun ?? baseline.run;
    const band = outletLevels(run, baseline.room, baseline.outletSoundPowerDb, baselineRun).find((level) => level.hz === flag.targetHz);
    const quantity = { levelDb: band?.levelDb, criterionDb: band?.criterionDb };
    // the level flag depends on the re-computed level with the treated path and outlet
    const clears = !assessRisks({ ...input, baselineRun }, analysis).some((other) => other.kind === flag.kind && other.subject === flag.subject);
    return { quantity, clears };
  }
  const resonance = nearestResonance(analysis.resonances, flag.targetHz);
  if (resonance === null) return { quantity: {}, clears: !stillFlagged() };
  const percent = baseline.options?.coincidencePercent;
  return {
    quantity: {
      valueHz: resonance.frequencyHz,
      distanceHz: Math.abs(resonance.frequencyHz - flag.targetHz),
      windowHz: coincidenceWindowHz(resonance, flag.targetHz, percent ?? DEFAULT_COINCIDENCE_PERCENT),
    },
    clears: !stillFlagged(),
  };
}
