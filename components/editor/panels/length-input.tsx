'use client';

import { useEffect, useId, useState } from 'react';
import { defaultLengthUnit, formatLength, keptLength, parseLength, plausibilityWarning, type LengthUse } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';
import { UnitHint } from './unit-hint';

interface LengthInputProps {
  label: string;
  valueM: number | null;
  kind: 'run' | 'section';
  unitSystem: UnitSystem;
  placeholder?: string;
  allowEmpty?: boolean;
  /** What the length is, for a warning when it is outside what is usually made. */
  use?: LengthUse;
  onCommit: (valueM: number | null) => void;
}

type Feedback = { tone: 'ok' | 'warning' | 'error'; message: string };

const TONE_CLASS: Readonly<Record<Feedback['tone'], string>> = { ok: 'text-graphite-500', warning: 'text-risk-ink', error: 'text-risk-ink' };

// A length typed in any unit ("300 mm", "12 in", "1 ft 6 in", "10 000 mm"); a bare number is read in
// the person's unit for this field, shown in the field. Shows what it understood, a warning for a size
// outside what is made, or what is wrong while keeping the text as typed.
export function LengthInput({ label, valueM, kind, unitSystem, placeholder, allowEmpty = false, use, onCommit }: LengthInputProps) {
  const id = useId();
  const shown = valueM === null ? '' : formatLength(valueM, unitSystem, kind);
  const [text, setText] = useState(shown);
  const [feedback, setFeedback] = useState<Feedback | null>(null);
  // A new value from outside replaces the text; a confirmation or warning about what was just typed stays.
  useEffect(() => { setText(shown); setFeedback((current) => (current && current.tone !== 'error' ? current : null)); }, [shown]);

  const defaultUnit = defaultLengthUnit(unitSystem, kind);

  function commit() {
    if (text.trim() === '' && allowEmpty) { setFeedback(null); if (valueM !== null) onCommit(null); return; }
    // Not retyped: the value keeps its full precision.
    if (text === shown) return;
    const parsed = parseLength(text, { defaultUnit });
    if (!parsed.ok) { setFeedback({ tone: 'error', message: parsed.message }); return; }
    const keptM = keptLength(parsed.valueM, valueM, unitSystem, kind);
    const warning = use ? plausibilityWarning(keptM, use, unitSystem) : null;
    setFeedback(warning ? { tone: 'warning', message: `Read as ${parsed.understood}. ${warning}` } : { tone: 'ok', message: `Read as ${parsed.understood}` });
    if (keptM !== valueM) onCommit(keptM);
    else setText(shown);
  }

  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label}</label>
      <div className="relative mt-0.5">
        <input
          id={id}
          className="field-input py-1 pr-9"
          inputMode="decimal"
          value={text}
          placeholder={placeholder ?? `in ${defaultUnit}`}
          aria-invalid={feedback?.tone === 'error' ? true : undefined}
          aria-describedby={`${id}-unit${feedback ? ` ${id}-feedback` : ''}`}
          onChange={(event) => setText(event.target.value)}
          onBlur={commit}
          onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); commit(); } }}
        />
        <UnitHint id={`${id}-unit`} unit={defaultUnit} text={text} />
      </div>
      {feedback && (
        <p id={`${id}-feedback`} role={feedback.tone === 'ok' ? 'status' : 'alert'} data-tone={feedback.tone} className={`mt-0.5 text-xs ${TONE_CLASS[feedback.tone]}`}>
          {feedback.tone === 'warning' && <span aria-hidden="true">⚠ </span>}{feedback.message}
        </p>
      )}
    </div>
  );
}
