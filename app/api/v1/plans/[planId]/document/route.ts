import { json, route } from '@/lib/http/route';
import { savePlanDocument } from '@/lib/plans/data';
import { savePlanSchema } from '@/lib/plans/schemas';

type Params = { planId: string };

// Saves the drawn document with the version it was loaded at; a stale version gets 409.
export const PUT = route<Params>({ access: 'plan.edit', maxBodyBytes: 4 * 1024 * 1024 }, async ({ team, actor, params, readJson }) => {
  const input = await readJson(savePlanSchema);
  return json(await savePlanDocument(team!.teamId, actor!.user.id, params.planId, input));
});
