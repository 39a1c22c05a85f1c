'use client';

import { useEffect, useId, useState } from 'react';
import { formatLength, parseLength } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';

interface LengthInputProps {
  label: string;
  valueM: number | null;
  kind: 'run' | 'section';
  unitSystem: UnitSystem;
  placeholder?: string;
  allowEmpty?: boolean;
  onCommit: (valueM: number | null) => void;
}

// A length typed in any unit ("300 mm", "12 in", "1 ft 6 in"); shows what it understood,
// or what is wrong while keeping the text as typed.
export function LengthInput({ label, valueM, kind, unitSystem, placeholder, allowEmpty = false, onCommit }: LengthInputProps) {
  const id = useId();
  const shown = valueM === null ? '' : formatLength(valueM, unitSystem, kind);
  const [text, setText] = useState(shown);
  const [feedback, setFeedback] = useState<{ ok: boolean; message: string } | null>(null);
  // A new value from outside replaces the text; a confirmation of what was just typed stays.
  useEffect(() => { setText(shown); setFeedback((current) => (current?.ok ? current : null)); }, [shown]);

  const defaultUnit = unitSystem === 'si' ? (kind === 'section' ? 'mm' : 'm') : kind === 'section' ? 'in' : 'ft';

  function commit() {
    if (text.trim() === '' && allowEmpty) { setFeedback(null); if (valueM !== null) onCommit(null); return; }
    if (text === shown) return;
    const parsed = parseLength(text, { defaultUnit });
    if (!parsed.ok) { setFeedback({ ok: false, message: parsed.message }); return; }
    setFeedback({ ok: true, message: `Read as ${parsed.understood}` });
    onCommit(parsed.valueM);
  }

  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label}</label>
      <input
        id={id}
        className="field-input mt-0.5 py-1"
        inputMode="decimal"
        value={text}
        placeholder={placeholder}
        aria-invalid={feedback && !feedback.ok ? true : undefined}
        aria-describedby={feedback ? `${id}-feedback` : undefined}
        onChange={(event) => setText(event.target.value)}
        onBlur={commit}
        onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); commit(); } }}
      />
      {feedback && (
        <p id={`${id}-feedback`} role={feedback.ok ? 'status' : 'alert'} className={`mt-0.5 text-xs ${feedback.ok ? 'text-graphite-500' : 'text-risk-ink'}`}>
          {feedback.message}
        </p>
      )}
    </div>
  );
}
