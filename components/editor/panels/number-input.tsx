'use client';

import { useEffect, useId, useState } from 'react';

interface NumberInputProps {
  label: string;
  value: number | null;
  unit?: string;
  min: number;
  max: number;
  integer?: boolean;
  allowEmpty?: boolean;
  onCommit: (value: number | null) => void;
}

// A plain number with a stated range; a wrong entry is explained and kept as typed.
export function NumberInput({ label, value, unit, min, max, integer = false, allowEmpty = false, onCommit }: NumberInputProps) {
  const id = useId();
  const shown = value === null ? '' : String(value);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => { setText(shown); setError(null); }, [shown]);

  function commit() {
    if (text === shown) return;
    if (text.trim() === '' && allowEmpty) { setError(null); onCommit(null); return; }
    const number = Number(text.replace(',', '.'));
    if (!Number.isFinite(number)) { setError(`“${text}” is not a number.`); return; }
    if (integer && !Number.isInteger(number)) { setError('Use a whole number.'); return; }
    if (number < min || number > max) { setError(`Use a value from ${min} to ${max}${unit ? ` ${unit}` : ''}.`); return; }
    setError(null);
    onCommit(number);
  }

  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label}{unit && <span className="font-normal text-graphite-500"> ({unit})</span>}</label>
      <input
        id={id}
        className="field-input mt-0.5 py-1"
        inputMode="decimal"
        value={text}
        aria-invalid={error ? true : undefined}
        onChange={(event) => setText(event.target.value)}
        onBlur={commit}
        onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); commit(); } }}
      />
      {error && <p role="alert" className="mt-0.5 text-xs text-risk-ink">{error}</p>}
    </div>
  );
}
