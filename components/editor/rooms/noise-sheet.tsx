'use client';

import { useEffect } from 'react';
import type { NoiseTables } from '@/lib/plans/noise-path/path-tables';
import type { UnitSystem } from '@/lib/plan/units';
import { NoiseTablesView } from '@/components/noise/noise-tables';
import { csvFileName } from '@/lib/csv/file-name';
import { listenerPathCsv } from '@/lib/plans/exports';
import { DownloadCsvButton } from '../results/download-csv-button';

// The room's noise path tables on a sheet over the canvas (the canvas keeps its size, so nothing under
// the pointer moves), wide enough for an element column and eight band columns that never wrap.
export function NoiseSheet({ planName, roomName, tables, unitSystem, onClose, onPlace }: { planName: string; roomName: string; tables: NoiseTables; unitSystem: UnitSystem; onClose: () => void; onPlace?: (place: { segmentId: string | null; nodeId: string | null } | null) => void }) {
  useEffect(() => {
    const close = (event: KeyboardEvent) => { if (event.key === 'Escape') onClose(); };
    window.addEventListener('keydown', close);
    return () => window.removeEventListener('keydown', close);
  }, [onClose]);
  return (
    <section role="dialog" aria-labelledby="noise-sheet-title" className="panel absolute inset-y-2 right-2 z-20 w-[44rem] max-w-[calc(100%-1rem)] overflow-y-auto p-4 shadow-panel" data-testid="noise-sheet">
      <div className="mb-2 flex items-center gap-2">
        <h2 id="noise-sheet-title" className="text-sm font-semibold">Noise path tables: {roomName}</h2>
        <button type="button" className="btn-quiet ml-auto px-2 py-0.5 text-xs" onClick={onClose}>Close the tables</button>
      </div>
      <p className="mb-2 text-xs text-graphite-500">Point at an element to see where it lies on the plan.</p>
      <NoiseTablesView tables={tables} units={unitSystem} onPlace={onPlace} listenerAction={(listener) => (
        <DownloadCsvButton what={`the path table at listener ${listener.name}`} fileName={csvFileName([planName, roomName, listener.name], 'noise-path')}
          csv={() => listenerPathCsv(tables, listener.listenerId, unitSystem)} />
      )} />
    </section>
  );
}
