import { json, route } from '@/lib/http/route';
import { getPlan } from '@/lib/plans/data';
import { analysePlan } from '@/lib/plans/results';

type Params = { planId: string };

export const dynamic = 'force-dynamic';

// Results of every run on the saved plan, computed now from its document.
export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => {
  const plan = await getPlan(team!.teamId, params.planId);
  return json({ version: plan.version, runs: analysePlan(plan.document, plan.metresPerPixel) });
});
