import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { getPlan, updatePlanMeta } from '@/lib/plans/data';
import { planMetaSchema } from '@/lib/plans/schemas';

type Params = { planId: string };

export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => json({ plan: await getPlan(team!.teamId, params.planId) }));

export const PATCH = route<Params>({ access: 'plan.edit', maxBodyBytes: 4096 }, async ({ team, actor, params, readJson }) => {
  const changes = await readJson(planMetaSchema);
  return json({ plan: await updatePlanMeta(team!.teamId, auditActorOf(actor!), params.planId, changes) });
});
