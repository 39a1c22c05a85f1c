import type { Metadata } from 'next';
import Link from 'next/link';
import { ChangesTable } from '@/components/revisions/changes-table';
import { FinishReview } from '@/components/revisions/finish-review';
import { TreatmentTable } from '@/components/revisions/treatment-table';
import { RoomPaths } from '@/components/revisions/room-paths';
import { RevisionStateBadge } from '@/components/revisions/revision-state-badge';
import { RevisionWorkspace } from '@/components/revisions/revision-workspace';
import { revisionOfPage } from '@/app/(app)/records-of-page';
import { can } from '@/lib/permissions';
import { compareRevisions } from '@/lib/revisions/changes';
import { previousRevision } from '@/lib/revisions/data';
import { revisionsPath, schedulePath } from '@/lib/revisions/links';
import { listDecisions, reviewTally } from '@/lib/reviews/data';
import { listMembers } from '@/lib/team/members';

export const metadata: Metadata = { title: 'Revision' };

export default async function RevisionPage({ params, searchParams }: { params: Promise<{ planId: string; number: string }>; searchParams: Promise<{ comment?: string }> }) {
  const { planId, number } = await params;
  const { comment } = await searchParams;
  const { actor, team, revision } = await revisionOfPage(planId, number);
  const teamId = team.teamId;
  const [previous, decisions, tally, members] = await Promise.all([
    previousRevision(teamId, planId, revision.number), listDecisions(teamId, revision.id), reviewTally(teamId, revision.id), listMembers(teamId),
  ]);
  const changes = compareRevisions(
    previous && { number: previous.number, analysis: previous.analysis, segmentCount: previous.document.segments.length },
    { analysis: revision.analysis, segmentCount: revision.document.segments.length },
  );
  const role = team.role;
  const canReview = can(role, 'review.write') && revision.state === 'waiting';
  const background = revision.background?.widthPx && revision.background.heightPx
    ? { url: `/api/v1/uploads/${revision.background.id}`, widthPx: revision.background.widthPx, heightPx: revision.background.heightPx } : null;
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
        <Link href={`/projects/${revision.project.id}`} className="hover:text-graphite">{revision.project.name}</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={`/plans/${planId}`} className="hover:text-graphite">{revision.planName}</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={revisionsPath(planId)} className="hover:text-graphite">Revisions</Link> <span aria-hidden="true">/</span> {revision.number}
      </nav>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="space-y-1">
          <h1 className="text-xl font-semibold">{revision.planName}: revision {revision.number}</h1>
          <p className="flex flex-wrap items-center gap-2 text-sm text-graphite-500">
            <RevisionStateBadge state={revision.state} />
            Submitted by {revision.submittedByName} on {revision.createdAt.slice(0, 10)}
            {revision.reviewedByName && ` · reviewed by ${revision.reviewedByName} on ${revision.reviewedAt?.slice(0, 10)}`}
          </p>
          {revision.note && <p className="text-sm">Note: {revision.note}</p>}
          <p className="text-xs text-graphite-500">Frozen as submitted: later edits of the plan never change this page.</p>
        </div>
        <Link href={schedulePath(planId, revision.number)} className="btn-quiet">Treatment schedule</Link>
      </div>
      {canReview && <FinishReview revisionId={revision.id} tally={tally} />}
      {!canReview && (
        <p className="text-sm text-graphite-500" data-testid="review-tally">{tally.accepted} accepted · {tally.flagged} flagged · {tally.open} not reviewed, of {tally.rows} rows.</p>
      )}
      <ChangesTable changes={changes} number={revision.number} />
      <TreatmentTable treatments={revision.extras.treatments ?? []} />
      <RoomPaths rooms={revision.extras.rooms ?? []} unitSystem={actor.user.unitSystem} />
      <RevisionWorkspace
        planId={planId} revisionId={revision.id} document={revision.document} metresPerPixel={revision.metresPerPixel} background={background}
        runs={revision.analysis} risks={revision.extras.risks ?? []} canReview={canReview} canComment={can(role, 'comment.write')}
        decisions={Object.fromEntries(decisions.map((decision) => [decision.target, { decision: decision.decision, note: decision.note, reviewerName: decision.reviewerName }]))}
        members={members.map((member) => member.name).filter((name) => name !== actor.user.name)}
        focusCommentId={comment && /^[0-9a-f-]{36}$/i.test(comment) ? comment : null}
      />
    </div>
  );
}
