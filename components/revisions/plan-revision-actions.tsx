'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import { revisionPath, revisionsPath, schedulePath } from '@/lib/revisions/links';
import type { RevisionSummary } from '@/lib/revisions/types';
import { RevisionStateBadge } from './revision-state-badge';

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
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const submit = async () => {
    setBusy(true);
    setError(null);
    const answer = await apiFetch<{ revision: RevisionSummary }>(`/api/v1/plans/${planId}/revisions`, { method: 'POST', body: { note } });
    setBusy(false);
    if (!answer.ok) { setError(answer.error.message); return; }
    setOpen(false);
    setNote('');
    if (onSubmitted) onSubmitted(answer.data.revision);
    else router.push(revisionPath(planId, answer.data.revision.number));
  };

  return (
    <div className="flex flex-wrap items-start gap-2">
      <span className="flex items-center gap-2 self-center text-sm" data-testid="plan-revision-state">
        {latest === null ? (
          <span className="text-graphite-500">Draft, never submitted</span>
        ) : latest.planVersion === planVersion || (contentHash !== null && latest.contentHash === contentHash) ? (
          <>Revision {latest.number} <RevisionStateBadge state={latest.state} /></>
        ) : (
          <span className="text-graphite-500">Draft: changed since revision {latest.number}</span>
        )}
      </span>
      {showListLink && <Link href={revisionsPath(planId)} className="btn-quiet">Revisions</Link>}
      {canIssue && latest !== null && (
        <Link href={schedulePath(planId, latest.number)} className="btn-quiet">Issue schedule</Link>
      )}
      {canSubmit && !open && <button type="button" className="btn-primary" onClick={() => setOpen(true)}>Submit for review</button>}
      {canSubmit && open && (
        <div className="panel w-80 space-y-2 p-3" role="group" aria-label="Submit for review">
          <p className="text-sm text-graphite-500">Freezes the saved plan and its analysis as the next revision and asks the engineers to review it.</p>
          <label htmlFor="revision-note" className="field-label">Note for the reviewers (optional)</label>
          <textarea id="revision-note" className="field-input" rows={2} value={note} onChange={(event) => setNote(event.target.value)} />
          <FormAlert message={error} />
          <div className="flex gap-2">
            <button type="button" className="btn-primary" disabled={busy} onClick={submit}>{busy ? 'Submitting…' : 'Submit'}</button>
            <button type="button" className="btn-quiet" onClick={() => setOpen(false)}>Cancel</button>
          </div>
        </div>
      )}
    </div>
  );
}
