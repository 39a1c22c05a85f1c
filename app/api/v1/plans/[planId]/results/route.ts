import { json, route } from '@/lib/http/route';
import { getPlanWithAnalysis } from '@/lib/plans/analysis';

type Params = { planId: string };

export const dynamic = 'force-dynamic';

// Results of every run on the saved plan, from the stored analysis of that version.
export const GET = route<Params>({ access: 'plan.read' }, async ({ team, actor, params }) => {
  const { plan, analysis } = await getPlanWithAnalysis(team!.teamId, params.planId, actor!.user.id);
  return json({ version: plan.version, contentHash: analysis.contentHash, labels: analysis.labels, runs: analysis.runs });
});
