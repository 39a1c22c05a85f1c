import { json, route } from '@/lib/http/route';
import { getPlan } from '@/lib/plans/data';
import { planRisks } from '@/lib/plans/risks';

type Params = { planId: string };

export const dynamic = 'force-dynamic';

// Risk flags and room results of the saved plan, computed now from its document.
export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => {
  const plan = await getPlan(team!.teamId, params.planId);
  return json({ version: plan.version, ...planRisks(plan.document, plan.metresPerPixel) });
});
