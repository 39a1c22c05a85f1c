import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/feedback/empty-state';
import { WaitingMarker } from '@/components/revisions/waiting-marker';
import { requireActor } from '@/lib/auth/current';
import { can } from '@/lib/permissions';
import { listWaitingReviews, waitingFor } from '@/lib/reviews/waiting';

export const metadata: Metadata = { title: 'To review' };

// Every revision of the team waiting for review, oldest first; those asked of this reader first.
export default async function ReviewsPage() {
  const actor = await requireActor();
  if (!actor.team) return <EmptyState title="You are not in a team yet">Ask a team admin to invite you.</EmptyState>;
  const all = await listWaitingReviews(actor.team.teamId);
  const mayReview = can(actor.team.role, 'review.write');
  const yours = mayReview ? waitingFor(all, actor.user.id) : [];
  const others = all.filter((review) => !yours.includes(review));
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-xl font-semibold">To review</h1>
        <p className="text-sm text-graphite-500">Revisions waiting for review in {actor.team.teamName}, oldest first.</p>
      </div>
      {all.length === 0 ? (
        <EmptyState title="Nothing waits for review">When an acoustician submits a plan for review, it appears here and in the header.</EmptyState>
      ) : (
        <ul className="panel divide-y divide-graphite-100" aria-label="Revisions waiting for review">
          {[...yours, ...others].map((review) => (
            <li key={review.revisionId}>
              <Link href={review.link} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3 hover:bg-paper-sunk">
                <span className="min-w-0">
                  <span className="block font-medium">{review.projectName}: {review.planName}, revision {review.number}</span>
                  <span className="num block text-xs text-graphite-500">submitted by {review.submittedByName} on {review.submittedAt.slice(0, 10)}</span>
                </span>
                <WaitingMarker text={yours.includes(review) ? 'Waiting for your review' : 'Waiting for review'} />
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
