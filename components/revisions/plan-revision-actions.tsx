'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { revisionPath, revisionsPath, schedulePath } from '@/lib/revisions/links';
import type { RevisionSummary } from '@/lib/revisions/types';
import { RevisionStateBadge } from './revision-state-badge';
import { SubmitRevisionDialog } from './submit-revision-dialog';

export interface PlanRevisionActionsProps {
  planId: string;
  // The newest revision, if any (lib/revisions/data.ts latestRevision), and the plan's saved
  // version: when they differ the drawing is a draft, never shown as approved.
  latest: Pick<RevisionSummary, 'number' | 'state' | 'planVersion' | 'contentHash'> | null;
  planVersion: number;
  // The saved plan's content hash, when known: equal content counts as unchanged, however it got there.
  contentHash?: string | null;
  canSubmit: boolean;
  canIssue: boolean;
  // Off on the revision list itself.
  showListLink?: boolean;
  // Called after a submission instead of opening the new revision (the editor may stay put).
  onSubmitted?: (revision: RevisionSummary) => void;
}

// The plan header's revision actions: submit for review, the revision list, issue schedule.
export function PlanRevisionActions({ planId, latest, planVersion, contentHash = null, canSubmit, canIssue, showListLink = true, onSubmitted }: PlanRevisionActionsProps) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const submitted = (revision: RevisionSummary) => {
    setOpen(false);
    if (onSubmitted) onSubmitted(revision);
    else router.push(revisionPath(planId, revision.number));
  };

  return (
    <div className="flex min-w-0 items-center gap-2">
      <span className="flex min-w-0 items-center gap-2 whitespace-nowrap text-sm" data-testid="plan-revision-state">
        {latest === null ? (
          <span className="text-graphite-500">Draft, never submitted</span>
        ) : latest.planVersion === planVersion || (contentHash !== null && latest.contentHash === contentHash) ? (
          <>Revision {latest.number} <RevisionStateBadge state={latest.state} /></>
        ) : (
          <span className="text-graphite-500">Draft: changed since revision {latest.number}</span>
        )}
      </span>
      {showListLink && <Link href={revisionsPath(planId)} className="btn-quiet whitespace-nowrap">Revisions</Link>}
      {canIssue && latest !== null && (
        <Link href={schedulePath(planId, latest.number)} className="btn-quiet whitespace-nowrap">Issue schedule</Link>
      )}
      {canSubmit && <button type="button" className="btn-primary whitespace-nowrap" onClick={() => setOpen(true)}>Submit for review</button>}
      {canSubmit && open && <SubmitRevisionDialog planId={planId} onSubmitted={submitted} onClose={() => setOpen(false)} />}
    </div>
  );
}
