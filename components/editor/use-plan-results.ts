'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { PlanResultsAnswer } from '@/lib/plans/results-answer';

// The saved plan's results, refetched after every save (the save invalidates this query). They carry
// no pressure envelopes: the mode overlay asks for the one it draws (use-mode-envelope.ts).
export function usePlanResults(planId: string, version: number) {
  return useQuery({
    queryKey: ['plan-results', planId, version],
    queryFn: async ({ signal }) => {
      const result = await apiFetch<PlanResultsAnswer>(`/api/v1/plans/${planId}/results`, { signal });
      if (!result.ok) throw new Error(result.error.message);
      return result.data;
    },
    placeholderData: (previous) => previous,
  });
}
