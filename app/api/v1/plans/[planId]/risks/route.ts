import { json, route } from '@/lib/http/route';
import { getPlanWithAnalysis } from '@/lib/plans/analysis';

type Params = { planId: string };

export const dynamic = 'force-dynamic';

// Risk flags, room results and the standing of each chosen treatment, from the stored analysis of the saved version.
export const GET = route<Params>({ access: 'plan.read' }, async ({ team, actor, params }) => {
  const { plan, analysis } = await getPlanWithAnalysis(team!.teamId, params.planId, actor!.user.id);
  return json({ version: plan.version, contentHash: analysis.contentHash, labels: analysis.labels, ...analysis.risks, treatmentChecks: analysis.treatments });
});
