'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { PlanLabels } from '@/lib/plan/labels';
import type { RunResult } from '@/lib/plans/results';

// The saved plan's results, refetched after every save (the save invalidates this query).
export function usePlanResults(planId: string, version: number) {
  return useQuery({
    queryKey: ['plan-results', planId, version],
    queryFn: async ({ signal }) => {
      const result = await apiFetch<{ version: number; contentHash: string; labels: PlanLabels; runs: RunResult[] }>(`/api/v1/plans/${planId}/results`, { signal });
      if (!result.ok) throw new Error(result.error.message);
      return result.data;
    },
    placeholderData: (previous) => previous,
  });
}
