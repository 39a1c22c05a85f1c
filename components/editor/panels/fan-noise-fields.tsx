'use client';

import { useId, useRef, useState } from 'react';
import { fanSpeedSoundPowerChangeDb } from '@/lib/acoustic';
import { parseFanSpectrumCsv, type Fan } from '@/lib/plan';
import { NumberInput } from './number-input';
import { changeFixed } from '@/lib/signed-number';

/** A spectrum file larger than this is not a fan's eight bands (product rule). */
const MAX_CSV_BYTES = 64 * 1024;

interface FanNoiseFieldsProps {
  fan: Fan | null;
  editable: boolean;
  onFan: (fan: Fan) => void;
  onSpectrum: (bandsDb: number[]) => void;
}

// The fan's speed range (a variable-speed drive's limits: the path is worked at the top, by the fan
// laws) and its sound power imported from a CSV file, with every bad cell named.
export function FanNoiseFields({ fan, editable, onFan, onSpectrum }: FanNoiseFieldsProps) {
  const fileId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [report, setReport] = useState<{ ok: boolean; lines: string[] } | null>(null);
  async function importFile(file: File | undefined) {
    if (!file) return;
    if (file.size > MAX_CSV_BYTES) { setReport({ ok: false, lines: [`${file.name} is ${Math.round(file.size / 1024)} KB; a fan's spectrum is a few lines. Choose the CSV with its eight bands.`] }); return; }
    const result = parseFanSpectrumCsv(await file.text());
    if (result.ok) { setReport({ ok: true, lines: [`${file.name}: ${result.understood}`] }); onSpectrum(result.bandsDb); }
    else setReport({ ok: false, lines: [`${file.name} was not imported; nothing changed:`, ...result.errors] });
    if (input.current) input.current.value = '';
  }
  const top = fan?.maxRpm ?? null;
  return (
    <div className="space-y-2" data-testid="fan-noise">
      {fan && (
        <>
          <div className="grid grid-cols-2 gap-2">
            <NumberInput label="Lowest speed" unit="rpm" value={fan.minRpm ?? null} min={1} max={10000} allowEmpty onCommit={(minRpm) => onFan({ ...fan, minRpm })} />
            <NumberInput label="Highest speed" unit="rpm" value={fan.maxRpm ?? null} min={1} max={10000} allowEmpty onCommit={(maxRpm) => onFan({ ...fan, maxRpm })} />
          </div>
          {top !== null && top !== fan.rpm && (
            <p className="num text-xs text-graphite-500">The noise path is worked at {top} rpm: {changeFixed(fanSpeedSoundPowerChangeDb(fan.rpm, top), 1)} dB on the sound power given at {fan.rpm} rpm (fan laws, 50 log n₂/n₁).</p>
          )}
        </>
      )}
      {editable && (
        <div>
          <label htmlFor={fileId} className="block text-xs font-medium text-graphite-700">Import the fan&apos;s sound power from CSV <span className="font-normal text-graphite-500">(band and level per row, or bands over levels)</span></label>
          <input ref={input} id={fileId} type="file" accept=".csv,.txt,text/csv,text/plain" className="mt-0.5 block w-full text-xs" onChange={(event) => void importFile(event.target.files?.[0])} />
        </div>
      )}
      {report && (
        <ul role={report.ok ? 'status' : 'alert'} className={`space-y-0.5 text-xs ${report.ok ? 'text-graphite-700' : 'text-risk-ink'}`} data-testid="fan-csv-report">
          {report.lines.map((line) => <li key={line}>{line}</li>)}
        </ul>
      )}
    </div>
  );
}
