'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import { FormAlert } from '@/components/forms/form-alert';
import type { RevisionSummary } from '@/lib/revisions/types';

interface SubmitRevisionDialogProps {
  planId: string;
  onSubmitted: (revision: RevisionSummary) => void;
  onClose: () => void;
}

// Submitting the saved plan for review, in a dialog over the page (the header keeps its height):
// what submitting does, an optional note for the reviewers, then Submit or Cancel.
export function SubmitRevisionDialog({ planId, onSubmitted, onClose }: SubmitRevisionDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const noteId = useId();
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);

  const submit = async () => {
    setBusy(true);
    setError(null);
    const answer = await apiFetch<{ revision: RevisionSummary }>(`/api/v1/plans/${planId}/revisions`, { method: 'POST', body: { note } });
    setBusy(false);
    if (!answer.ok) { setError(answer.error.message); return; }
    onSubmitted(answer.data.revision);
  };

  return (
    <dialog ref={ref} aria-labelledby={titleId} onCancel={(event) => { event.preventDefault(); if (!busy) onClose(); }}
      className="panel m-auto w-[min(28rem,calc(100vw-2rem))] p-0 text-graphite backdrop:bg-graphite/40">
      <form className="space-y-3 p-5" onSubmit={(event) => { event.preventDefault(); void submit(); }}>
        <h2 id={titleId} className="text-lg font-semibold">Submit for review</h2>
        <p className="text-sm text-graphite-500">Freezes the saved plan and its analysis as the next revision and asks the engineers to review it.</p>
        <div>
          <label htmlFor={noteId} className="field-label">Note for the reviewers (optional)</label>
          <textarea id={noteId} className="field-input" rows={3} value={note} onChange={(event) => setNote(event.target.value)} />
        </div>
        <FormAlert message={error} />
        <div className="flex justify-end gap-2">
          <button type="button" className="btn-quiet" disabled={busy} onClick={onClose}>Cancel</button>
          <button type="submit" className="btn-primary" disabled={busy}>{busy ? 'Submitting…' : 'Submit'}</button>
        </div>
      </form>
    </dialog>
  );
}
