// The review mails: to reviewers when a revision is submitted, to its submitter when done. Both
// name the project, the plan and the revision, and carry the notes written with them.
import { revisionPath } from '@/lib/revisions/links';
import { isReviewOutcome, OUTCOME_MEANINGS, revisionStateLabel } from '@/lib/revisions/states';
import type { RevisionSummary } from '@/lib/revisions/types';
import { appUrl } from '@/lib/tokens';
import { reviewFinishedMail, reviewRequestedMail } from './messages';
import { notify } from './notify';
import { membersWhoMay, userById } from './recipients';

export interface PlanPlace { projectName: string; planName: string }

export async function announceReviewRequested(teamId: string, submitter: { id: string; name: string }, plan: PlanPlace, revision: RevisionSummary): Promise<number> {
  const reviewers = await membersWhoMay(teamId, 'review.write', submitter.id);
  const link = appUrl(revisionPath(revision.planId, revision.number));
  const sent = await Promise.all(reviewers.map((reviewer) => notify(reviewer, 'review_requested', reviewRequestedMail({
    to: reviewer.email, submitterName: submitter.name, place: { ...plan, number: revision.number }, note: revision.note, link,
  }))));
  return sent.filter(Boolean).length;
}

export async function announceReviewFinished(
  submitterId: string | null, reviewer: { id: string; name: string }, plan: PlanPlace, revision: RevisionSummary, queries: readonly { row: string; note: string }[],
): Promise<boolean> {
  const submitter = await userById(submitterId);
  if (!submitter || submitter.id === reviewer.id) return false;
  return notify(submitter, 'review_finished', reviewFinishedMail({
    to: submitter.email, reviewerName: reviewer.name, place: { ...plan, number: revision.number },
    outcome: revisionStateLabel(revision.state), meaning: isReviewOutcome(revision.state) ? OUTCOME_MEANINGS[revision.state] : '',
    note: revision.reviewNote, queries, link: appUrl(revisionPath(revision.planId, revision.number)),
  }));
}
