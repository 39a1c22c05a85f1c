'use client';

import { useEffect, useId, useState } from 'react';
import type { Wall } from '@/lib/plan';

const BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

interface WallsFieldProps {
  label: string;
  /** null: inherited (the run's walls for a segment, sheet metal for a run). */
  wall: Wall | null;
  inheritedWords: string;
  onChange: (wall: Wall | null) => void;
}

/** Eight figures in dB/m, separated by spaces, commas or semicolons; null and a message when they are not. */
function parseBands(text: string): { values: number[] | null; error: string | null } {
  const cells = text.trim().split(/[\s,;]+/).filter(Boolean);
  if (cells.length !== 8) return { values: null, error: `Give eight figures, 63 Hz to 8 kHz; found ${cells.length}.` };
  const values = cells.map((cell) => Number(cell));
  const bad = values.findIndex((value) => !Number.isFinite(value) || value < 0 || value > 50);
  if (bad >= 0) return { values: null, error: `The ${BANDS[bad]} Hz figure “${cells[bad]}” must be a number from 0 to 50 dB/m.` };
  return { values, error: null };
}

// What the duct's walls take from the sound along it: inherited, rigid, sheet metal (published
// attenuation by size and band) or the user's measured figures per octave band.
export function WallsField({ label, wall, inheritedWords, onChange }: WallsFieldProps) {
  const id = useId();
  const measured = wall?.kind === 'measured' ? wall.attenuationDbPerM.join(' ') : '';
  const [text, setText] = useState(measured);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => { setText(measured); setError(null); }, [measured]);
  const kind = wall?.kind ?? 'inherited';
  return (
    <div className="space-y-1" data-testid="walls-field">
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">{label}</label>
      <select id={id} className="field-input py-1" value={kind} onChange={(event) => {
        const next = event.target.value;
        if (next === 'inherited') onChange(null);
        else if (next === 'measured') onChange({ kind: 'measured', attenuationDbPerM: wall?.kind === 'measured' ? wall.attenuationDbPerM : [1, 0.7, 0.3, 0.2, 0.2, 0.2, 0.2, 0.2] });
        else onChange({ kind: next as 'rigid' | 'sheet-metal' });
      }}>
        <option value="inherited">{inheritedWords}</option>
        <option value="sheet-metal">Sheet metal (published attenuation)</option>
        <option value="rigid">Rigid (air losses only: the sharpest case)</option>
        <option value="measured">Measured, dB/m per band</option>
      </select>
      {wall?.kind === 'measured' && (
        <div>
          <input aria-label="Measured attenuation, dB/m, 63 Hz to 8 kHz" className="field-input num py-1 text-xs" value={text} onChange={(event) => setText(event.target.value)}
            onBlur={() => {
              const parsed = parseBands(text);
              setError(parsed.error);
              if (parsed.values && parsed.values.join(' ') !== measured) onChange({ kind: 'measured', attenuationDbPerM: parsed.values });
            }} />
          <p className="text-xs text-graphite-500">dB/m at 63, 125, 250, 500 Hz, 1, 2, 4 and 8 kHz.</p>
          {error && <p role="alert" className="text-xs text-risk-ink">{error}</p>}
        </div>
      )}
    </div>
  );
}

/** Walls in a few words; null is the default, sheet metal. */
export function wallWords(wall: Wall | null): string {
  if (wall === null || wall.kind === 'sheet-metal') return 'sheet metal';
  return wall.kind === 'rigid' ? 'rigid' : 'measured';
}
