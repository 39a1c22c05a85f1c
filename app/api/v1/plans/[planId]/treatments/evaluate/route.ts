import { json, route } from '@/lib/http/route';
import { candidatesOf, getPlanWithAnalysis } from '@/lib/plans/analysis';
import { evaluateTreatmentsSchema } from '@/lib/plans/schemas';

type Params = { planId: string };

// Candidate treatments of one flag on the saved plan, each re-run through the engine (evaluated in
// the background when the version was analysed; read from there). Evaluating changes nothing
// (analysis.run); choosing one is a document edit saved with plan.edit.
export const POST = route<Params>({ access: 'analysis.run', maxBodyBytes: 4 * 1024, rateLimit: 'analysis' }, async ({ team, params, readJson }) => {
  const input = await readJson(evaluateTreatmentsSchema);
  const { plan, analysis } = await getPlanWithAnalysis(team!.teamId, params.planId);
  const target = input.roomId ? { roomId: input.roomId } : { runId: input.runId ?? '' };
  return json({ version: plan.version, ...(await candidatesOf(plan, analysis, target, input.flagId)) });
});
