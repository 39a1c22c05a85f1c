'use client';

import { useEffect, useId, useState } from 'react';

const BAND_COUNT = 8;

// The outlet's sound power, eight octave bands typed as a list; empty means no level prediction.
export function SoundPowerField({ value, onCommit, label = 'Outlet sound power' }: { value: readonly number[] | null; onCommit: (bandsDb: number[] | null) => void; label?: string }) {
  const id = useId();
  const shown = value ? value.join(', ') : '';
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => { setText(shown); setError(null); }, [shown]);
  function commit() {
    if (text === shown) return;
    if (text.trim() === '') { setError(null); onCommit(null); return; }
    const bands = text.split(/[,;\s]+/).filter(Boolean).map(Number);
    if (bands.length !== BAND_COUNT || bands.some((band) => !Number.isFinite(band))) { setError(`Type ${BAND_COUNT} numbers in dB, 63 Hz to 8 kHz, separated by commas.`); return; }
    setError(null);
    onCommit(bands);
  }
  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label} <span className="font-normal text-graphite-500">(dB re 1 pW, 63 Hz to 8 kHz; optional)</span></label>
      <input id={id} className="field-input num mt-0.5 py-1" value={text} placeholder="e.g. 70, 66, 62, 58, 54, 50, 46, 42" aria-invalid={error ? true : undefined}
        onChange={(event) => setText(event.target.value)} onBlur={commit} onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); commit(); } }} />
      {error && <p role="alert" className="mt-0.5 text-xs text-risk-ink">{error}</p>}
    </div>
  );
}
