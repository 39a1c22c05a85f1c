// The plan results route's answer: the stored analysis of the version, rounded on the way out, with
// the pressure envelopes asked for computed in the compute pool (run-envelopes.ts) and put on their
// resonances.
import type { EnvelopeRequest } from '@/lib/analysis/envelope-request';
import { roundedRunResult } from '@/lib/analysis/round-answer';
import { compute } from '@/lib/compute/pool';
import { AppError } from '@/lib/errors';
import { consumeRateLimit } from '@/lib/http/rate-limit';
import type { PlanLabels } from '@/lib/plan/labels';
import type { PlanAnalysis } from './analysis/types';
import type { PlanView } from './data';
import type { RunResult } from './results';
import type { PlanRunEnvelopes } from './run-envelopes';

export interface PlanResultsAnswer {
  version: number;
  contentHash: string;
  labels: PlanLabels;
  runs: RunResult[];
}

const REDUCE = 'the envelopes asked for (one run with runId, or chosen orders with envelopes=…)';

function withEnvelopes(run: RunResult, envelopes: PlanRunEnvelopes[string] | undefined): RunResult {
  if (!run.analysis || !envelopes) return run;
  const resonances = run.analysis.resonances.map((resonance) => {
    const points = envelopes[resonance.order];
    return points ? { ...resonance, pressureEnvelope: points } : resonance;
  });
  return { ...run, analysis: { ...run.analysis, resonances } };
}

export async function planResultsAnswer(
  plan: Pick<PlanView, 'version' | 'document' | 'metresPerPixel'>,
  analysis: PlanAnalysis,
  asked: { envelopes: EnvelopeRequest; runId: string | null },
  askedBy: string,
): Promise<PlanResultsAnswer> {
  if (asked.runId !== null && !analysis.runs.some((run) => run.runId === asked.runId)) {
    throw new AppError('bad_input', `runId: this plan has no run with id ${asked.runId}`, { field: 'runId' });
  }
  let runs = analysis.runs;
  if (asked.envelopes.kind !== 'none') {
    await consumeRateLimit('analysis', askedBy);
    const envelopes = await compute<PlanRunEnvelopes>(
      { kind: 'plan-envelopes', document: plan.document, metresPerPixel: plan.metresPerPixel, runId: asked.runId, envelopes: asked.envelopes },
      { reduce: REDUCE },
    );
    runs = runs.map((run) => withEnvelopes(run, envelopes[run.runId]));
  }
  return { version: plan.version, contentHash: analysis.contentHash, labels: analysis.labels, runs: runs.map(roundedRunResult) };
}
