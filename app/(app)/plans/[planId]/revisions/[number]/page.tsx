import type { Metadata } from 'next';
import Link from 'next/link';
import { ChangesTable } from '@/components/revisions/changes-table';
import { ReviewBar } from '@/components/revisions/review-bar';
import { ReviewTallyText } from '@/components/revisions/review-tally-text';
import { TreatmentTable } from '@/components/revisions/treatment-table';
import { RoomPaths } from '@/components/revisions/room-paths';
import { RevisionStateBadge } from '@/components/revisions/revision-state-badge';
import { RevisionWorkspace } from '@/components/revisions/revision-workspace';
import { revisionOfPage } from '@/app/(app)/records-of-page';
import { can } from '@/lib/permissions';
import { changesSincePrevious } from '@/lib/revisions/changes-since';
import { revisionsPath, schedulePath } from '@/lib/revisions/links';
import { isReviewOutcome, OUTCOME_MEANINGS } from '@/lib/revisions/states';
import { listDecisions, raisedQueries, reviewTally } from '@/lib/reviews/data';
import { listMembers } from '@/lib/team/members';
import { planBackgroundOf } from '@/components/editor/canvas/plan-background';

export const metadata: Metadata = { title: 'Revision' };

export default async function RevisionPage({ params, searchParams }: { params: Promise<{ planId: string; number: string }>; searchParams: Promise<{ comment?: string }> }) {
  const { planId, number } = await params;
  const { comment } = await searchParams;
  const { actor, team, revision } = await revisionOfPage(planId, number);
  const teamId = team.teamId;
  const units = actor.user.unitSystem;
  const [changes, decisions, tally, queries, members] = await Promise.all([
    changesSincePrevious(revision, units), listDecisions(teamId, revision.id), reviewTally(teamId, revision.id), raisedQueries(teamId, revision.id), listMembers(teamId),
  ]);
  const role = team.role;
  const canReview = can(role, 'review.write') && revision.state === 'waiting';
  const background = planBackgroundOf(revision.background);
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
        <Link href={`/projects/${revision.project.id}`} className="hover:text-graphite">{revision.project.name}</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={`/plans/${planId}`} className="hover:text-graphite">{revision.planName}</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={revisionsPath(planId)} className="hover:text-graphite">Revisions</Link> <span aria-hidden="true">/</span> {revision.number}
      </nav>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0 space-y-1">
          <h1 className="text-xl font-semibold">{revision.planName}: revision {revision.number}</h1>
          <p className="flex flex-wrap items-center gap-2 text-sm text-graphite-500">
            <RevisionStateBadge state={revision.state} />
            Submitted by {revision.submittedByName} on {revision.createdAt.slice(0, 10)}
            {revision.reviewedByName && ` · reviewed by ${revision.reviewedByName} on ${revision.reviewedAt?.slice(0, 10)}`}
          </p>
          {revision.note && <p className="text-sm">Note from {revision.submittedByName}: {revision.note}</p>}
          <p className="text-xs text-graphite-500">Frozen as submitted: later edits of the plan never change this page.</p>
        </div>
        <Link href={schedulePath(planId, revision.number)} className="btn-quiet">Treatment schedule</Link>
      </div>
      {isReviewOutcome(revision.state) && (
        <section className="panel space-y-1 border-l-4 border-graphite-200 p-4" aria-label="Outcome of the review" data-testid="review-outcome">
          <p className="text-sm"><span className="font-semibold">Outcome: </span>{OUTCOME_MEANINGS[revision.state]}</p>
          {revision.reviewNote && <p className="whitespace-pre-wrap text-sm">Note from {revision.reviewedByName}: {revision.reviewNote}</p>}
          <ReviewTallyText tally={tally} />
        </section>
      )}
      {canReview && <ReviewBar revisionId={revision.id} number={revision.number} submittedByName={revision.submittedByName} tally={tally} queries={queries} />}
      {!canReview && !isReviewOutcome(revision.state) && <ReviewTallyText tally={tally} />}
      <ChangesTable changes={changes.runs} planChanges={changes.plan} number={revision.number} />
      <TreatmentTable treatments={revision.extras.treatments ?? []} />
      <RoomPaths rooms={revision.extras.rooms ?? []} unitSystem={actor.user.unitSystem} />
      <RevisionWorkspace
        planId={planId} revisionId={revision.id} document={revision.document} metresPerPixel={revision.metresPerPixel} background={background}
        labels={revision.extras.labels ?? null} unitSystem={units}
        runs={revision.analysis} risks={revision.extras.risks ?? []} canReview={canReview} canComment={can(role, 'comment.write')}
        decisions={Object.fromEntries(decisions.map((decision) => [decision.target, { decision: decision.decision, note: decision.note, reviewerName: decision.reviewerName }]))}
        members={members.filter((member) => member.userId !== actor.user.id).map((member) => member.name)}
        focusCommentId={comment && /^[0-9a-f-]{36}$/i.test(comment) ? comment : null}
      />
    </div>
  );
}
