'use client';

import { useState } from 'react';
import { DECISION_LABELS, type Decision } from '@/lib/reviews/decisions';

export interface RowDecisionState { decision: Decision; note: string; reviewerName: string }

interface RowDecisionProps {
  label: string;
  current: RowDecisionState | null;
  canReview: boolean;
  busy: boolean;
  onDecide: (decision: Decision, note: string) => void;
}

// One row's review: its decision in words, and for a reviewer the accept and flag controls.
export function RowDecision({ label, current, canReview, busy, onDecide }: RowDecisionProps) {
  const [flagging, setFlagging] = useState(false);
  const [note, setNote] = useState(current?.note ?? '');
  return (
    <div className="flex flex-wrap items-center gap-2">
      <span className={`text-xs font-medium ${current?.decision === 'flagged' ? 'text-risk-ink' : current ? 'text-graphite' : 'text-graphite-500'}`} data-testid="row-decision">
        {current ? `${current.decision === 'flagged' ? '⚑' : '✓'} ${DECISION_LABELS[current.decision]}` : '○ Not reviewed'}
      </span>
      {current?.note && <span className="text-xs text-graphite-500">“{current.note}” ({current.reviewerName})</span>}
      {canReview && !flagging && (
        <>
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => onDecide('accepted', '')} aria-label={`Accept ${label}`}>Accept</button>
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => setFlagging(true)} aria-label={`Flag ${label}`}>Flag…</button>
        </>
      )}
      {canReview && flagging && (
        <span className="flex items-center gap-1">
          <label className="sr-only" htmlFor={`flag-${label}`}>Why is {label} flagged?</label>
          <input id={`flag-${label}`} className="rounded border border-graphite-200 px-2 py-0.5 text-xs" placeholder="Why it is flagged" value={note} onChange={(event) => setNote(event.target.value)} />
          <button type="button" className="btn-risk px-2 py-0.5 text-xs" disabled={busy || note.trim().length === 0} onClick={() => { onDecide('flagged', note.trim()); setFlagging(false); }}>Save flag</button>
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setFlagging(false)}>Cancel</button>
        </span>
      )}
    </div>
  );
}
