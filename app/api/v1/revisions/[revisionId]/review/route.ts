import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { announceReviewFinished } from '@/lib/notifications/review-mails';
import { getRevisionById } from '@/lib/revisions/data';
import { finishReview } from '@/lib/reviews/data';
import { finishReviewSchema } from '@/lib/reviews/schemas';

type Params = { revisionId: string };

// Finish the review: approved when every row is settled and none flagged, else returned.
export const POST = route<Params>({ access: 'review.write' }, async ({ team, actor, params, readJson }) => {
  await readJson(finishReviewSchema);
  const who = auditActorOf(actor!);
  const { revision, tally, submittedById } = await finishReview(team!.teamId, who, params.revisionId);
  const view = await getRevisionById(team!.teamId, revision.id);
  await announceReviewFinished(submittedById, who, view.planName, revision);
  return json({ revision, tally });
});
