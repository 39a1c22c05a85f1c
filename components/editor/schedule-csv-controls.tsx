'use client';

import { useRef, useState } from 'react';
import type { PlanDocument } from '@/lib/plan';
import { csvFileName } from '@/lib/csv/file-name';
import { applySchedule, parseScheduleCsv, scheduleToCsv, type ScheduleError } from '@/lib/plan/schedule-csv';
import { downloadCsv } from './download-csv';

interface ScheduleCsvControlsProps {
  document: PlanDocument;
  runId: string | null;
  runName: string;
  metresPerPixel: number;
  editable: boolean;
  onApply: (document: PlanDocument) => void;
}

// Export the chosen run's segment schedule as CSV, or import one to set its sections,
// linings and lengths. A bad file changes nothing and says which row and column is wrong.
export function ScheduleCsvControls({ document: doc, runId, runName, metresPerPixel, editable, onApply }: ScheduleCsvControlsProps) {
  const input = useRef<HTMLInputElement>(null);
  const [errors, setErrors] = useState<ScheduleError[] | string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  if (!runId) return null;

  function download() {
    downloadCsv(csvFileName([runName || 'run'], 'schedule'), scheduleToCsv(doc, runId!, metresPerPixel));
  }

  async function importFile(file: File) {
    setErrors(null);
    setDone(null);
    const parsed = parseScheduleCsv(await file.text());
    if (!parsed.ok) { setErrors(parsed.errors); return; }
    const applied = applySchedule(doc, runId!, parsed.rows, metresPerPixel);
    if (!applied.ok) { setErrors(applied.message); return; }
    onApply(applied.doc);
    setDone(`${file.name}: ${parsed.rows.length} segments updated.`);
  }

  return (
    <div className="space-y-2" data-testid="schedule-csv">
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-quiet" onClick={download}>Export schedule (CSV)</button>
        {editable && (
          <>
            <input ref={input} id="schedule-file" type="file" accept=".csv,text/csv" className="sr-only" aria-label="Schedule CSV file"
              onChange={(event) => { const file = event.target.files?.[0]; if (file) void importFile(file); event.target.value = ''; }} />
            <label htmlFor="schedule-file" className="btn-quiet cursor-pointer">Import schedule…</label>
          </>
        )}
      </div>
      {done && <p role="status" className="text-xs text-graphite-500">{done}</p>}
      {errors && (
        <div role="alert" className="rounded border border-risk bg-risk-soft p-2 text-xs text-risk-ink">
          <p className="font-semibold">Nothing was imported.</p>
          {typeof errors === 'string' ? <p>{errors}</p> : (
            <ul className="mt-1 list-disc pl-4">
              {errors.slice(0, 12).map((error) => <li key={`${error.row}-${error.column}`}>{error.message}</li>)}
              {errors.length > 12 && <li>…and {errors.length - 12} more.</li>}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
