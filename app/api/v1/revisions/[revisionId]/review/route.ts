import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { announceReviewFinished } from '@/lib/notifications/review-mails';
import { getRevisionById } from '@/lib/revisions/data';
import { finishReview } from '@/lib/reviews/data';
import { finishReviewSchema } from '@/lib/reviews/schemas';

type Params = { revisionId: string };

// Finish the review: stamp the chosen outcome and the overall note, then mail the submitter.
export const POST = route<Params>({ access: 'review.write', maxBodyBytes: 16 * 1024 }, async ({ team, actor, params, readJson }) => {
  const input = await readJson(finishReviewSchema);
  const who = auditActorOf(actor!);
  const finished = await finishReview(team!.teamId, who, params.revisionId, input);
  const view = await getRevisionById(team!.teamId, finished.revision.id);
  await announceReviewFinished(finished.submittedById, who, { projectName: view.project.name, planName: view.planName }, finished.revision, finished.queries);
  return json({ revision: finished.revision, tally: finished.tally });
});
