'use client';

import { useId, useState } from 'react';
import { FormAlert } from '@/components/forms/form-alert';

interface CommentFormProps {
  label: string;
  submitLabel: string;
  members: string[];
  onSend: (body: string) => Promise<string | null>;
  onCancel?: () => void;
}

// A comment or an answer, with a picker that writes "@Name" for a team member.
export function CommentForm({ label, submitLabel, members, onSend, onCancel }: CommentFormProps) {
  const fieldId = useId();
  const [body, setBody] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const send = async () => {
    setBusy(true);
    const problem = await onSend(body);
    setBusy(false);
    setError(problem);
    if (!problem) setBody('');
  };
  return (
    <div className="space-y-2">
      <label htmlFor={fieldId} className="field-label">{label}</label>
      <textarea id={fieldId} className="field-input" rows={3} value={body} onChange={(event) => setBody(event.target.value)} />
      {members.length > 0 && (
        <label className="flex items-center gap-2 text-xs text-graphite-500">
          Mention
          <select
            className="rounded border border-graphite-200 bg-paper-raised px-1 py-0.5 text-xs"
            value=""
            onChange={(event) => { if (event.target.value) setBody((current) => `${current}${current && !current.endsWith(' ') ? ' ' : ''}@${event.target.value} `); }}
          >
            <option value="">a team member…</option>
            {members.map((name) => <option key={name} value={name}>{name}</option>)}
          </select>
        </label>
      )}
      <FormAlert message={error} />
      <div className="flex gap-2">
        <button type="button" className="btn-primary" disabled={busy || body.trim().length === 0} onClick={send}>{busy ? 'Sending…' : submitLabel}</button>
        {onCancel && <button type="button" className="btn-quiet" onClick={onCancel}>Cancel</button>}
      </div>
    </div>
  );
}
