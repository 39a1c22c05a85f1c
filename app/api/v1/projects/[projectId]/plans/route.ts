import { json, route } from '@/lib/http/route';
import { createPlan, listPlans } from '@/lib/plans/data';
import { newPlanSchema } from '@/lib/plans/schemas';

type Params = { projectId: string };

export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params, request }) => {
  const includeArchived = new URL(request.url).searchParams.get('archived') === 'include';
  return json({ plans: await listPlans(team!.teamId, params.projectId, { includeArchived }) });
});

export const POST = route<Params>({ access: 'plan.edit', maxBodyBytes: 4096 }, async ({ team, actor, params, readJson }) => {
  const { name } = await readJson(newPlanSchema);
  return json({ plan: await createPlan(team!.teamId, actor!.user.id, params.projectId, name) }, 201);
});
