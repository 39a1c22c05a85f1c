'use client';

import { useEffect, useId, useState } from 'react';
import { formatTemperature, parseTemperature } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';

interface TemperatureInputProps {
  label: string;
  valueC: number;
  unitSystem: UnitSystem;
  onCommit: (valueC: number) => void;
}

// An air temperature in the person's units (°C or °F; either may be typed), kept in °C. A value
// not retyped keeps its full precision.
export function TemperatureInput({ label, valueC, unitSystem, onCommit }: TemperatureInputProps) {
  const id = useId();
  const shown = formatTemperature(valueC, unitSystem);
  const [text, setText] = useState(shown);
  const [feedback, setFeedback] = useState<{ ok: boolean; message: string } | null>(null);
  useEffect(() => { setText(shown); setFeedback((current) => (current?.ok ? current : null)); }, [shown]);
  const defaultUnit = unitSystem === 'si' ? 'C' : 'F';

  function commit() {
    if (text === shown) return;
    const parsed = parseTemperature(text, { defaultUnit });
    if (!parsed.ok) { setFeedback({ ok: false, message: parsed.message }); return; }
    setFeedback({ ok: true, message: `Read as ${parsed.understood}` });
    if (formatTemperature(parsed.valueC, unitSystem) === shown) { setText(shown); return; }
    onCommit(parsed.valueC);
  }

  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label}</label>
      <input id={id} className="field-input mt-0.5 py-1" inputMode="decimal" value={text} placeholder={`in °${defaultUnit}`}
        aria-invalid={feedback && !feedback.ok ? true : undefined} aria-describedby={feedback ? `${id}-feedback` : undefined}
        onChange={(event) => setText(event.target.value)} onBlur={commit}
        onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); commit(); } }} />
      {feedback && (
        <p id={`${id}-feedback`} role={feedback.ok ? 'status' : 'alert'} className={`mt-0.5 text-xs ${feedback.ok ? 'text-graphite-500' : 'text-risk-ink'}`}>{feedback.message}</p>
      )}
    </div>
  );
}
