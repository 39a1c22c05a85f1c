import Link from 'next/link';
import { revisionPath } from '@/lib/revisions/links';
import type { RevisionSummary } from '@/lib/revisions/types';
import { RevisionStateBadge } from './revision-state-badge';

export function RevisionList({ planId, revisions }: { planId: string; revisions: RevisionSummary[] }) {
  return (
    <ul className="panel divide-y divide-graphite-100" aria-label="Revisions">
      {revisions.map((revision) => (
        <li key={revision.id}>
          <Link href={revisionPath(planId, revision.number)} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3 hover:bg-paper-sunk">
            <span className="font-medium">Revision {revision.number}</span>
            <RevisionStateBadge state={revision.state} />
            <span className="num text-xs text-graphite-500">
              submitted by {revision.submittedByName} on {revision.createdAt.slice(0, 10)}
              {revision.reviewedByName && ` · reviewed by ${revision.reviewedByName}`}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
