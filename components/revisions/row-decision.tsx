'use client';

import { useState } from 'react';
import { DECISION_LABELS, DECISION_MARKS, NOT_CHECKED_LABEL, type Decision } from '@/lib/reviews/decisions';

export interface RowDecisionState { decision: Decision; note: string; reviewerName: string }

interface RowDecisionProps {
  label: string;
  current: RowDecisionState | null;
  canReview: boolean;
  busy: boolean;
  onDecide: (decision: Decision, note: string) => void;
}

// One row's mark: checked, a query with its question, or not checked yet; for the engineer, the
// controls to check the row or raise a query on it.
export function RowDecision({ label, current, canReview, busy, onDecide }: RowDecisionProps) {
  const [querying, setQuerying] = useState(false);
  const [note, setNote] = useState(current?.decision === 'query' ? current.note : '');
  const fieldId = `query-${label.replace(/\W+/g, '-')}`;
  return (
    <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
      <span className={`text-xs font-medium ${current?.decision === 'query' ? 'text-risk-ink' : current ? 'text-graphite' : 'text-graphite-500'}`} data-testid="row-decision">
        {current ? `${DECISION_MARKS[current.decision]} ${DECISION_LABELS[current.decision]}` : `${DECISION_MARKS.none} ${NOT_CHECKED_LABEL}`}
      </span>
      {current?.note && <span className="text-xs text-graphite-500">“{current.note}” ({current.reviewerName})</span>}
      {canReview && !querying && (
        <>
          {current?.decision !== 'checked' && (
            <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => onDecide('checked', '')} aria-label={`Check ${label}`}>Check</button>
          )}
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" disabled={busy} onClick={() => setQuerying(true)} aria-label={`Query ${label}`}>
            {current?.decision === 'query' ? 'Edit query…' : 'Query…'}
          </button>
        </>
      )}
      {canReview && querying && (
        <span className="flex max-w-full flex-wrap items-center gap-1">
          <label className="sr-only" htmlFor={fieldId}>Query on {label}</label>
          <input id={fieldId} className="w-80 max-w-full rounded border border-graphite-200 px-2 py-0.5 text-xs" placeholder="What should the acoustician answer or change?"
            value={note} onChange={(event) => setNote(event.target.value)} autoFocus
            onKeyDown={(event) => { if (event.key === 'Escape') setQuerying(false); }} />
          <button type="button" className="btn-risk px-2 py-0.5 text-xs" disabled={busy || note.trim().length === 0} onClick={() => { onDecide('query', note.trim()); setQuerying(false); }}>Raise query</button>
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setQuerying(false)}>Cancel</button>
        </span>
      )}
    </div>
  );
}
