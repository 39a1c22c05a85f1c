'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import type { ReviewTally } from '@/lib/reviews/outcome';

// The reviewer's closing step, saying what finishing now will do.
export function FinishReview({ revisionId, tally }: { revisionId: string; tally: ReviewTally }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const finish = async () => {
    setBusy(true);
    const answer = await apiFetch(`/api/v1/revisions/${revisionId}/review`, { method: 'POST', body: {} });
    setBusy(false);
    if (!answer.ok) setError(answer.error.message);
    else router.refresh();
  };
  return (
    <div className="panel space-y-2 p-4">
      <p className="text-sm" data-testid="review-tally">
        {tally.accepted} accepted · {tally.flagged} flagged · {tally.open} not reviewed, of {tally.rows} rows.
        {' '}{tally.outcome === 'approved' ? 'Finishing now approves this revision.' : 'Finishing now returns it with changes requested.'}
      </p>
      <FormAlert message={error} />
      <button type="button" className={tally.outcome === 'approved' ? 'btn-primary' : 'btn-risk'} disabled={busy} onClick={finish}>
        {tally.outcome === 'approved' ? 'Finish review: approve' : 'Finish review: request changes'}
      </button>
    </div>
  );
}
