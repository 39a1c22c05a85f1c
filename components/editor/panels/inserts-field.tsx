'use client';

import { useId, useState } from 'react';
import { describeIssues, plenumBoxSchema, type PathInsert, type PlenumBox } from '@/lib/plan';
import { formatLength } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';
import { EMPTY_PLENUM, PlenumFields, type PlenumDraft } from './plenum-fields';

const BAND_COUNT = 8;
const KIND_WORDS: Record<PathInsert['kind'], string> = { silencer: 'Silencer', loss: 'Loss', plenum: 'Plenum' };

function plenumWords(box: PlenumBox, unitSystem: UnitSystem): string {
  const side = (valueM: number) => formatLength(valueM, unitSystem, 'run');
  const area = unitSystem === 'si' ? `${box.outletAreaM2.toFixed(3)} m²` : `${(box.outletAreaM2 / 0.09290304).toFixed(2)} ft²`;
  return `${side(box.lengthM)} × ${side(box.widthM)} × ${side(box.heightM)}, outlet ${area}, ${side(box.offsetM)} off axis, absorption ${box.absorption}`;
}

function valuesOf(insert: PathInsert, unitSystem: UnitSystem): string {
  if (insert.kind === 'plenum') return plenumWords(insert.plenum, unitSystem);
  return `${(insert.kind === 'silencer' ? insert.insertionLossDb : insert.lossDb).join(', ')} dB`;
}

// Silencers (insertion loss from the maker's data), plenum boxes (by their dimensions, Wells' equation)
// and other losses after a segment, for the noise path: a list with Remove, and a small form.
export function InsertsField({ inserts, editable, unitSystem = 'si', onChange }: { inserts: readonly PathInsert[]; editable: boolean; unitSystem?: UnitSystem; onChange: (inserts: PathInsert[]) => void }) {
  const id = useId();
  const [kind, setKind] = useState<PathInsert['kind']>('silencer');
  const [label, setLabel] = useState('');
  const [bands, setBands] = useState('');
  const [plenum, setPlenum] = useState<PlenumDraft>(EMPTY_PLENUM);
  const [error, setError] = useState<string | null>(null);
  const add = () => {
    if (!label.trim()) { setError('Give it a name, e.g. the maker\'s model.'); return; }
    let insert: PathInsert;
    if (kind === 'plenum') {
      const parsed = plenumBoxSchema.safeParse(plenum);
      if (!parsed.success) { setError(`Plenum: ${describeIssues(parsed.error).join('; ')}.`); return; }
      insert = { kind, label: label.trim(), plenum: parsed.data };
    } else {
      const values = bands.split(/[,;\s\t]+/).filter(Boolean).map(Number);
      if (values.length !== BAND_COUNT || values.some((value) => !Number.isFinite(value) || value < 0)) {
        setError(`Type ${BAND_COUNT} losses in dB (0 or more), 63 Hz to 8 kHz, separated by commas; you typed ${values.length}.`);
        return;
      }
      insert = kind === 'silencer' ? { kind, label: label.trim(), insertionLossDb: values } : { kind, label: label.trim(), lossDb: values };
    }
    setError(null);
    onChange([...inserts, insert]);
    setLabel('');
    setBands('');
    setPlenum(EMPTY_PLENUM);
  };
  return (
    <div className="space-y-2" data-testid="inserts">
      <p className="text-xs font-medium text-graphite-700">In the noise path after this segment</p>
      {inserts.length === 0 ? <p className="text-xs text-graphite-500">Nothing put in.</p> : (
        <ul className="space-y-1 text-xs">
          {inserts.map((insert, index) => (
            <li key={`${insert.label}-${index}`} className="flex items-start gap-2" data-testid="insert-row">
              <span className="flex-1">{KIND_WORDS[insert.kind]}: {insert.label} <span className="num text-graphite-500">({valuesOf(insert, unitSystem)})</span></span>
              {editable && <button type="button" className="btn-quiet px-2 py-0 text-xs" onClick={() => onChange(inserts.filter((_, at) => at !== index))}>Remove</button>}
            </li>
          ))}
        </ul>
      )}
      {editable && (
        <div className="space-y-1 rounded border border-graphite-100 p-2">
          <div className="flex gap-2">
            <select aria-label="What to put in" className="field-input py-1 text-xs" value={kind} onChange={(event) => { setKind(event.target.value as PathInsert['kind']); setError(null); }}>
              <option value="silencer">Silencer (maker&apos;s insertion loss)</option>
              <option value="plenum">Plenum box (its dimensions)</option>
              <option value="loss">Other loss</option>
            </select>
            <input aria-label="Its name" className="field-input py-1 text-xs" placeholder={kind === 'plenum' ? 'e.g. supply plenum above the stage' : 'e.g. model and length'} value={label} onChange={(event) => setLabel(event.target.value)} />
          </div>
          {kind === 'plenum' ? <PlenumFields draft={plenum} unitSystem={unitSystem} onChange={setPlenum} /> : (
            <>
              <label htmlFor={id} className="block text-xs text-graphite-700">Loss by octave band, dB (63 Hz to 8 kHz)</label>
              <input id={id} className="field-input num py-1 text-xs" placeholder="e.g. 4, 7, 13, 22, 28, 27, 22, 16" value={bands} onChange={(event) => setBands(event.target.value)}
                onKeyDown={(event) => { if (event.key === 'Enter') { event.preventDefault(); add(); } }} aria-invalid={error ? true : undefined} />
            </>
          )}
          {error && <p role="alert" className="text-xs text-risk-ink">{error}</p>}
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={add}>Put it in</button>
        </div>
      )}
    </div>
  );
}
