// The analysis of a plan version, for pages, routes and the schedule.
import { getPlan, type PlanView } from '@/lib/plans/data';
import { planAnalysisOf } from './store';
import type { PlanAnalysis } from './types';

export { analyseAhead, askForAnalysisAhead, planAnalysisOf, candidatesOf } from './store';
export { contentHash } from './content-hash';
export { ANALYSIS_FORMAT, candidateKey, type PlanAnalysis, type TreatmentCheck, type TreatmentStanding } from './types';

/** The saved plan of the team and the analysis of exactly that version; askedBy: the person whose rate limit a computation counts against. */
export async function getPlanWithAnalysis(teamId: string, planId: string, askedBy: string | null = null): Promise<{ plan: PlanView; analysis: PlanAnalysis }> {
  const plan = await getPlan(teamId, planId);
  return { plan, analysis: await planAnalysisOf(plan, askedBy, teamId) };
}
