import { json, route } from '@/lib/http/route';
import { getPlan } from '@/lib/plans/data';
import { evaluateTreatmentsSchema } from '@/lib/plans/schemas';
import { treatmentOptions } from '@/lib/plans/treatment-options';

type Params = { planId: string };

// Candidate treatments of one flag on the saved plan, each re-run through the engine. Evaluating
// changes nothing (analysis.run); choosing one is a document edit saved with plan.edit.
export const POST = route<Params>({ access: 'analysis.run', maxBodyBytes: 4 * 1024 }, async ({ team, params, readJson }) => {
  const input = await readJson(evaluateTreatmentsSchema);
  const plan = await getPlan(team!.teamId, params.planId);
  const target = input.roomId ? { roomId: input.roomId } : { runId: input.runId ?? '' };
  return json({ version: plan.version, ...treatmentOptions(plan.document, plan.metresPerPixel, target, input.flagId) });
});
