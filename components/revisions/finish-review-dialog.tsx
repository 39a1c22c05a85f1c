'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useId, useRef, useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import { outcomeRefusal, type RaisedQuery, type ReviewTally } from '@/lib/reviews/outcome';
import { OUTCOME_MEANINGS, REVIEW_OUTCOMES, REVISION_STATE_LABELS, type ReviewOutcome } from '@/lib/revisions/states';

interface FinishReviewDialogProps {
  revisionId: string;
  number: number;
  submittedByName: string;
  tally: ReviewTally;
  queries: readonly RaisedQuery[];
  onClose: () => void;
}

function plural(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}

// Finishing the review: what the review holds, the outcome to stamp and the engineer's overall
// note, confirmed before anything is saved. The note goes into the mail and the schedule.
export function FinishReviewDialog({ revisionId, number, submittedByName, tally, queries, onClose }: FinishReviewDialogProps) {
  const router = useRouter();
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const noteId = useId();
  const [outcome, setOutcome] = useState<ReviewOutcome>(tally.suggested);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; field?: string } | null>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  const refusal = outcomeRefusal(tally, outcome, note);
  const confirm = async () => {
    if (refusal) { setError(refusal); return; }
    setBusy(true);
    setError(null);
    const answer = await apiFetch(`/api/v1/revisions/${revisionId}/review`, { method: 'POST', body: { outcome, note } });
    setBusy(false);
    if (!answer.ok) { setError({ message: answer.error.message, field: answer.error.field }); return; }
    onClose();
    router.refresh();
  };

  return (
    <dialog ref={ref} aria-labelledby={titleId} onCancel={(event) => { event.preventDefault(); if (!busy) onClose(); }}
      className="panel m-auto w-[min(40rem,calc(100vw-2rem))] max-h-[calc(100vh-2rem)] overflow-y-auto p-0 text-graphite backdrop:bg-graphite/40">
      <div className="space-y-4 p-5">
        <h2 id={titleId} className="text-lg font-semibold">Finish the review of revision {number}</h2>
        <section aria-label="What the review holds" className="rounded border border-graphite-100 bg-paper p-3 text-sm">
          <ul className="num grid gap-1 sm:grid-cols-3" data-testid="finish-summary">
            <li><span aria-hidden="true">✓ </span>{plural(tally.checked, 'row', 'rows')} checked, of {tally.rows}</li>
            <li className={tally.queries > 0 ? 'text-risk-ink' : ''}><span aria-hidden="true">? </span>{plural(tally.queries, 'query', 'queries')} raised</li>
            <li className={tally.unchecked > 0 ? 'text-risk-ink' : ''}><span aria-hidden="true">○ </span>{plural(tally.unchecked, 'row', 'rows')} not checked yet</li>
          </ul>
          {queries.length > 0 && (
            <ul className="mt-2 list-disc space-y-0.5 pl-5 text-xs text-graphite-700" aria-label="Queries raised">
              {queries.map((query) => <li key={query.row}><span className="font-medium">{query.row}:</span> {query.note}</li>)}
            </ul>
          )}
        </section>
        <fieldset className="space-y-2">
          <legend className="field-label mb-1">Outcome</legend>
          {REVIEW_OUTCOMES.map((candidate) => {
            const blocked = outcomeRefusal(tally, candidate, note);
            const unavailable = blocked?.field === 'outcome';
            return (
              <label key={candidate} className={`flex gap-2 rounded border p-2 text-sm ${outcome === candidate ? 'border-select bg-select-soft' : 'border-graphite-100'} ${unavailable ? 'opacity-60' : 'cursor-pointer'}`}>
                <input type="radio" name="outcome" value={candidate} checked={outcome === candidate} disabled={unavailable || busy} onChange={() => { setOutcome(candidate); setError(null); }} className="mt-0.5" />
                <span>
                  <span className="font-medium">{REVISION_STATE_LABELS[candidate]}</span>
                  <span className="block text-xs text-graphite-500">{unavailable ? blocked.message : OUTCOME_MEANINGS[candidate]}</span>
                </span>
              </label>
            );
          })}
        </fieldset>
        <div>
          <label htmlFor={noteId} className="field-label">Note to {submittedByName}{outcome === 'accepted' ? ' (optional)' : ''}</label>
          <p className="text-xs text-graphite-500">Goes into the mail to {submittedByName} and the revision history of the treatment schedule.</p>
          <textarea id={noteId} className="field-input" rows={4} maxLength={4000} value={note} disabled={busy}
            aria-invalid={error?.field === 'note' || undefined} onChange={(event) => { setNote(event.target.value); setError(null); }} />
        </div>
        <FormAlert message={error?.message ?? null} />
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" className="btn-quiet" disabled={busy} onClick={onClose}>Go back to the rows</button>
          <button type="button" className={outcome === 'accepted' || outcome === 'accepted_with_notes' ? 'btn-primary' : 'btn-risk'} disabled={busy} onClick={confirm}>
            {busy ? 'Saving…' : `Confirm: ${REVISION_STATE_LABELS[outcome].toLowerCase()}`}
          </button>
        </div>
      </div>
    </dialog>
  );
}
