'use client';

import { useId, useState } from 'react';
import type { PathInsert } from '@/lib/plan';

const BAND_COUNT = 8;

// Silencers (insertion loss from the maker's data) and other losses after a segment, for the noise
// path: a list with Remove, and a small form that reads eight octave-band values typed or pasted.
export function InsertsField({ inserts, editable, onChange }: { inserts: readonly PathInsert[]; editable: boolean; onChange: (inserts: PathInsert[]) => void }) {
  const id = useId();
  const [kind, setKind] = useState<PathInsert['kind']>('silencer');
  const [label, setLabel] = useState('');
  const [bands, setBands] = useState('');
  const [error, setError] = useState<string | null>(null);
  const add = () => {
    const values = bands.split(/[,;\s\t]+/).filter(Boolean).map(Number);
    if (!label.trim()) { setError('Give it a name, e.g. the maker\'s model.'); return; }
    if (values.length !== BAND_COUNT || values.some((value) => !Number.isFinite(value) || value < 0)) {
      setError(`Type ${BAND_COUNT} losses in dB (0 or more), 63 Hz to 8 kHz, separated by commas; you typed ${values.length}.`);
      return;
    }
    setError(null);
    const insert: PathInsert = kind === 'silencer' ? { kind, label: label.trim(), insertionLossDb: values } : { kind, label: label.trim(), lossDb: values };
    onChange([...inserts, insert]);
    setLabel('');
    setBands('');
  };
  return (
    <div className="space-y-2" data-testid="inserts">
      <p className="text-xs font-medium text-graphite-700">In the noise path after this segment</p>
      {inserts.length === 0 ? <p className="text-xs text-graphite-500">Nothing put in.</p> : (
        <ul className="space-y-1 text-xs">
          {inserts.map((insert, index) => (
            <li key={`${insert.label}-${index}`} className="flex items-start gap-2" data-testid="insert-row">
              <span className="flex-1">{insert.kind === 'silencer' ? 'Silencer' : 'Loss'}: {insert.label} <span className="num text-graphite-500">({(insert.kind === 'silencer' ? insert.insertionLossDb : insert.lossDb).join(', ')} dB)</span></span>
              {editable && <button type="button" className="btn-quiet px-2 py-0 text-xs" onClick={() => onChange(inserts.filter((_, at) => at !== index))}>Remove</button>}
            </li>
          ))}
        </ul>
      )}
      {editable && (
        <div className="space-y-1 rounded border border-graphite-100 p-2">
          <div className="flex gap-2">
            <select aria-label="What to put in" className="field-input py-1 text-xs" value={kind} onChange={(event) => setKind(event.target.value as PathInsert['kind'])}>
              <option value="silencer">Silencer (maker&apos;s insertion loss)</option>
              <option value="loss">Other loss</option>
            </select>
            <input aria-label="Its name" className="field-input py-1 text-xs" placeholder="e.g. model and length" value={label} onChange={(event) => setLabel(event.target.value)} />
          </div>
          <label htmlFor={id} className="block text-xs text-graphite-700">Loss by octave band, dB (63 Hz to 8 kHz)</label>
          <input id={id} className="field-input num py-1 text-xs" placeholder="e.g. 4, 7, 13, 22, 28, 27, 22, 16" value={bands} onChange={(event) => setBands(event.target.value)}
            onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); add(); } }} aria-invalid={error ? true : undefined} />
          {error && <p role="alert" className="text-xs text-risk-ink">{error}</p>}
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={add}>Put it in</button>
        </div>
      )}
    </div>
  );
}
