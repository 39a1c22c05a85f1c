import { planResultsRequest } from '@/lib/analysis/envelope-request';
import { json, route } from '@/lib/http/route';
import { getPlanWithAnalysis } from '@/lib/plans/analysis';
import { planResultsAnswer } from '@/lib/plans/results-answer';

type Params = { planId: string };

export const dynamic = 'force-dynamic';

// GET /api/v1/plans/{planId}/results[?include=envelopes | ?envelopes=<orders>][&runId=<run id>]
//
// Results of every run on the saved plan, from the stored analysis of that version: { version,
// contentHash, labels, runs }, each run with its analysis as POST /api/v1/analyze gives it, its main
// path's pieces and its fan tones. Pressure envelopes only on request (planResultsQuerySchema,
// lib/analysis/envelope-request.ts): include=envelopes (every resonance) or envelopes=3,4,10 (those
// orders), for every run or, with runId, for that run only (an unknown runId is a 400). The stored
// analysis keeps no envelopes, so asking for them analyses the run again in the compute pool and
// counts against the person's analysis rate limit. Numbers are rounded as in POST /api/v1/analyze;
// path startM / endM to 0.1 mm and fan tones to 0.001 Hz.
export const GET = route<Params>({ access: 'plan.read' }, async ({ request, team, actor, params }) => {
  const asked = planResultsRequest(request.url);
  const { plan, analysis } = await getPlanWithAnalysis(team!.teamId, params.planId, actor!.user.id);
  return json(await planResultsAnswer(plan, analysis, asked, actor!.user.id));
});
