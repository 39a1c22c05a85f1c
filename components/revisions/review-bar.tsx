'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import type { RaisedQuery, ReviewTally } from '@/lib/reviews/outcome';
import { FinishReviewDialog } from './finish-review-dialog';
import { ReviewTallyText } from './review-tally-text';

interface ReviewBarProps {
  revisionId: string;
  number: number;
  submittedByName: string;
  tally: ReviewTally;
  queries: readonly RaisedQuery[];
}

// The engineer's controls over the whole review: where it stands, checking every clear row in one
// step, and finishing (which asks for the outcome and a note before it acts).
export function ReviewBar({ revisionId, number, submittedByName, tally, queries }: ReviewBarProps) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [finishing, setFinishing] = useState(false);

  const checkClear = async () => {
    setBusy(true);
    setError(null);
    setDone(null);
    const answer = await apiFetch<{ checked: number }>(`/api/v1/revisions/${revisionId}/clear-rows`, { method: 'POST', body: {} });
    setBusy(false);
    if (!answer.ok) { setError(answer.error.message); return; }
    setDone(`${answer.data.checked} clear ${answer.data.checked === 1 ? 'row' : 'rows'} checked.`);
    router.refresh();
  };

  return (
    <section className="panel space-y-3 p-4" aria-label="Review of this revision">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <ReviewTallyText tally={tally} />
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-quiet" disabled={busy || tally.clear === 0} onClick={checkClear}>
            {busy ? 'Checking…' : `Check all clear rows (${tally.clear})`}
          </button>
          <button type="button" className="btn-primary" disabled={busy} onClick={() => setFinishing(true)}>Finish the review…</button>
        </div>
      </div>
      <p className="text-xs text-graphite-500">
        Clear rows are rows not checked yet with no fan-tone or risk mark and no open remark. Rows near a fan tone and risk flags are left for you to check or query one by one.
      </p>
      {done && <p role="status" className="text-sm text-graphite-700">{done}</p>}
      <FormAlert message={error} />
      {finishing && (
        <FinishReviewDialog revisionId={revisionId} number={number} submittedByName={submittedByName} tally={tally} queries={queries} onClose={() => setFinishing(false)} />
      )}
    </section>
  );
}
