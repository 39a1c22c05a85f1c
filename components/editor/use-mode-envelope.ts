'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { PressureEnvelopePoint } from '@/lib/acoustic';
import type { PlanResultsAnswer } from '@/lib/plans/results-answer';

// The pressure envelope of the one resonance the mode overlay shows, asked for from the plan results
// (runId and envelopes=<order>): the results themselves come without envelopes. Kept per plan version,
// run and order, since a version's envelope never changes. Null until it arrives, and when the plan
// has been saved again since `version` (the next results bring that version's resonances).
export function useModeEnvelope(planId: string, version: number | null, runId: string | null, order: number | null) {
  return useQuery({
    queryKey: ['plan-envelope', planId, version, runId, order],
    enabled: version !== null && runId !== null && order !== null,
    staleTime: Infinity,
    queryFn: async ({ signal }): Promise<PressureEnvelopePoint[] | null> => {
      const query = new URLSearchParams({ runId: runId!, envelopes: String(order) });
      const result = await apiFetch<PlanResultsAnswer>(`/api/v1/plans/${planId}/results?${query}`, { signal });
      if (!result.ok) throw new Error(result.error.message);
      if (result.data.version !== version) return null;
      const run = result.data.runs.find((candidate) => candidate.runId === runId);
      return run?.analysis?.resonances.find((resonance) => resonance.order === order)?.pressureEnvelope ?? null;
    },
  });
}
