// The pressure envelopes of a plan version's resonances, computed when asked for (the stored analysis
// keeps none): each run asked for is analysed again from the same document, with the labels assigned
// as the version's analysis assigns them (analysis/compute.ts). The engine is deterministic, so these
// are the envelopes of exactly the stored resonances; only the orders asked for are computed. Pure.
import { analyzeRun } from '@/lib/acoustic';
import type { PressureEnvelopePoint } from '@/lib/acoustic';
import { wantsEnvelope, type EnvelopeRequest } from '@/lib/analysis/envelope-request';
import { EnvelopeBudget } from '@/lib/analysis/select-envelopes';
import type { PlanDocument } from '@/lib/plan/document';
import { assignLabels } from '@/lib/plan/labels';
import { toRunInputWithMap } from '@/lib/plan/to-run-input';

/** runId → resonance order → envelope; runs that cannot be analysed are left out (their results say why). */
export type PlanRunEnvelopes = Record<string, Record<number, PressureEnvelopePoint[]>>;

export function planRunEnvelopes(input: PlanDocument, metresPerPixel: number, runId: string | null, request: EnvelopeRequest): PlanRunEnvelopes {
  const document = assignLabels(input);
  const budget = new EnvelopeBudget();
  const envelopes: PlanRunEnvelopes = {};
  for (const run of document.runs) {
    if (runId !== null && run.id !== runId) continue;
    let analysis;
    try {
      analysis = analyzeRun(toRunInputWithMap(document, run.id, metresPerPixel).input);
    } catch (error) {
      if (error instanceof Error && !(error instanceof TypeError)) continue;
      throw error;
    }
    const byOrder: Record<number, PressureEnvelopePoint[]> = {};
    for (const resonance of analysis.resonances) {
      if (wantsEnvelope(request, resonance.order)) byOrder[resonance.order] = budget.take(resonance.pressureEnvelope ?? []);
    }
    envelopes[run.id] = byOrder;
  }
  return envelopes;
}
