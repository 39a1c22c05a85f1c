'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { PlanLabels } from '@/lib/plan/labels';
import type { TreatmentCheck } from '@/lib/plans/analysis/types';
import type { PlanRisks } from '@/lib/plans/risks';

// Risk flags and room results of the saved plan, refetched after every save (the version changes).
export function usePlanRisks(planId: string, version: number) {
  return useQuery({
    queryKey: ['plan-risks', planId, version],
    queryFn: async ({ signal }) => {
      const result = await apiFetch<PlanRisks & { version: number; contentHash: string; labels: PlanLabels; treatmentChecks: TreatmentCheck[] }>(`/api/v1/plans/${planId}/risks`, { signal });
      if (!result.ok) throw new Error(result.error.message);
      return result.data;
    },
    placeholderData: (previous) => previous,
  });
}
