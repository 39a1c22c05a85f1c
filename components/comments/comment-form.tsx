'use client';

import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { FormAlert } from '@/components/forms/form-alert';
import { insertMention, mentionAtCaret, mentionSuggestions, type MentionQuery } from '@/lib/comments/mention-query';

interface CommentFormProps {
  label: string;
  submitLabel: string;
  members: string[];
  onSend: (body: string) => Promise<string | null>;
  onCancel?: () => void;
}

// A comment or an answer. Typing "@" offers the team's members (arrow keys to move, Enter or Tab
// to choose, Escape to close); choosing writes "@Name", which mails that member.
export function CommentForm({ label, submitLabel, members, onSend, onCancel }: CommentFormProps) {
  const fieldId = useId();
  const listId = useId();
  const textarea = useRef<HTMLTextAreaElement>(null);
  const [body, setBody] = useState('');
  const [query, setQuery] = useState<MentionQuery | null>(null);
  const [dismissedAt, setDismissedAt] = useState<number | null>(null);
  const [active, setActive] = useState(0);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const suggestions = query && query.start !== dismissedAt ? mentionSuggestions(members, query.text) : [];
  const open = suggestions.length > 0;

  const follow = (text: string, caret: number) => {
    const next = mentionAtCaret(text, caret);
    setQuery(next);
    if (next?.start !== query?.start) setActive(0);
    if (dismissedAt !== null && next?.start !== dismissedAt) setDismissedAt(null);
  };

  const choose = (name: string) => {
    if (!query) return;
    const caret = textarea.current?.selectionStart ?? body.length;
    const next = insertMention(body, query, caret, name);
    setBody(next.body);
    setQuery(null);
    setDismissedAt(query.start);
    requestAnimationFrame(() => {
      textarea.current?.focus();
      textarea.current?.setSelectionRange(next.caret, next.caret);
    });
  };

  const onKeyDown = (event: KeyboardEvent<HTMLTextAreaElement>) => {
    if (!open) return;
    if (event.key === 'ArrowDown') { event.preventDefault(); setActive((index) => (index + 1) % suggestions.length); }
    else if (event.key === 'ArrowUp') { event.preventDefault(); setActive((index) => (index - 1 + suggestions.length) % suggestions.length); }
    else if (event.key === 'Enter' || event.key === 'Tab') { event.preventDefault(); choose(suggestions[Math.min(active, suggestions.length - 1)]); }
    else if (event.key === 'Escape') { event.preventDefault(); event.stopPropagation(); setDismissedAt(query!.start); }
  };

  const send = async () => {
    setBusy(true);
    const problem = await onSend(body);
    setBusy(false);
    setError(problem);
    if (!problem) { setBody(''); setQuery(null); }
  };
  const optionId = (index: number) => `${listId}-${index}`;
  return (
    <div className="space-y-2">
      <label htmlFor={fieldId} className="field-label">{label}</label>
      <div className="relative">
        <textarea
          ref={textarea} id={fieldId} className="field-input" rows={3} value={body}
          role="combobox" aria-autocomplete="list" aria-expanded={open} aria-controls={listId} aria-activedescendant={open ? optionId(active) : undefined}
          aria-describedby={members.length > 0 ? `${fieldId}-hint` : undefined}
          onChange={(event) => { setBody(event.target.value); follow(event.target.value, event.target.selectionStart); }}
          onSelect={(event) => follow(event.currentTarget.value, event.currentTarget.selectionStart)}
          onKeyDown={onKeyDown}
          onBlur={() => setQuery(null)}
        />
        <ul id={listId} role="listbox" aria-label="Team members to mention" hidden={!open}
          className="absolute left-0 right-0 top-full z-30 mt-1 max-h-48 overflow-y-auto rounded border border-graphite-200 bg-paper-raised py-1 text-sm shadow-panel">
          {suggestions.map((name, index) => (
            <li key={name} id={optionId(index)} role="option" aria-selected={index === active}
              className={`cursor-pointer px-3 py-1 ${index === active ? 'bg-select-soft text-select-ink' : ''}`}
              onMouseDown={(event) => { event.preventDefault(); choose(name); }} onMouseEnter={() => setActive(index)}>
              @{name}
            </li>
          ))}
        </ul>
      </div>
      {members.length > 0 && <p id={`${fieldId}-hint`} className="text-xs text-graphite-500">Type @ to mention a team member; they get a mail with a link here.</p>}
      <FormAlert message={error} />
      <div className="flex gap-2">
        <button type="button" className="btn-primary" disabled={busy || body.trim().length === 0} onClick={send}>{busy ? 'Sending…' : submitLabel}</button>
        {onCancel && <button type="button" className="btn-quiet" onClick={onCancel}>Cancel</button>}
      </div>
    </div>
  );
}
