import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { announceReviewRequested } from '@/lib/notifications/review-mails';
import { getPlan } from '@/lib/plans/data';
import { listRevisions, submitRevision } from '@/lib/revisions/data';
import { submitRevisionSchema } from '@/lib/revisions/schemas';

type Params = { planId: string };

export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => {
  await getPlan(team!.teamId, params.planId);
  return json({ revisions: await listRevisions(team!.teamId, params.planId) });
});

// Submit for review: freezes the saved plan as the next revision and asks the reviewers.
export const POST = route<Params>({ access: 'plan.edit' }, async ({ team, actor, params, readJson }) => {
  const input = await readJson(submitRevisionSchema);
  const who = auditActorOf(actor!);
  const revision = await submitRevision(team!.teamId, who, params.planId, input.note);
  const plan = await getPlan(team!.teamId, params.planId);
  await announceReviewRequested(team!.teamId, who, { projectName: plan.project.name, planName: plan.name }, revision);
  return json({ revision }, 201);
});
