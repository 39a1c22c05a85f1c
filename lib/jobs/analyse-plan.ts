// The analyse-plan job: the analysis of the plan's version as it is now, and the candidate
// treatments of its flags, stored so every view reads them instead of computing them.
import { analyseAhead } from '@/lib/plans/analysis/store';
import { getPlan } from '@/lib/plans/data';
import type { JobData } from './names';

export async function analysePlanJob({ planId, teamId }: JobData['analyse-plan']): Promise<{ flags: number; evaluated: number } | { skipped: string }> {
  const plan = await getPlan(teamId, planId).catch(() => null);
  // A plan deleted (or moved out of the team) since the job was queued: nothing to do, not a failure.
  if (!plan) return { skipped: 'plan not found' };
  return analyseAhead(plan);
}
