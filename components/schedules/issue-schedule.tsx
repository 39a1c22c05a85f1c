'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import { schedulesKey } from './schedule-list';

// Issues the schedule of a revision: asks for it; the list below shows it rendering, then issued.
export function IssueSchedule({ revisionId, accepted }: { revisionId: string; accepted: boolean }) {
  const queryClient = useQueryClient();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const issue = async () => {
    setBusy(true);
    setError(null);
    const answer = await apiFetch(`/api/v1/revisions/${revisionId}/schedules`, { method: 'POST', body: {} });
    setBusy(false);
    if (!answer.ok) setError(answer.error.message);
    else await queryClient.invalidateQueries({ queryKey: schedulesKey(revisionId) });
  };
  return (
    <div className="space-y-2">
      {!accepted && <p className="text-sm text-risk-ink">This revision has not been accepted in review: the schedule is issued as a draft, watermarked as such.</p>}
      <FormAlert message={error} />
      <button type="button" className="btn-primary" disabled={busy} onClick={issue}>{busy ? 'Asking…' : 'Issue schedule'}</button>
    </div>
  );
}
