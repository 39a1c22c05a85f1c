'use client';

import { useMemo } from 'react';
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanLabels } from '@/lib/plan/labels';
import { OUTLET_MOUNTING_WORDS, outletReflectionLosses } from '@/lib/plan/outlet-reflection-loss';
import { formatLength, type UnitSystem } from '@/lib/plan/units';
import { csvFileName } from '@/lib/csv/file-name';
import { endReflectionLossCsv } from '@/lib/plans/exports';
import { DownloadCsvButton } from './download-csv-button';
import { signedFixed } from '@/lib/signed-number';

// The end reflection loss at each outlet of the chosen run, by octave band, worked from the drawing as it is now.
export function OutletReflectionLossTable({ document, runId, labels, unitSystem, planName = 'plan' }: { document: PlanDocument; runId: string; labels: PlanLabels; unitSystem: UnitSystem; planName?: string }) {
  const outlets = useMemo(() => outletReflectionLosses(document, runId, labels), [document, runId, labels]);
  const runName = document.runs.find((run) => run.id === runId)?.name ?? 'run';
  return (
    <section className="space-y-2" aria-label="End reflection loss at the outlets">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-xs font-semibold uppercase tracking-wider text-graphite-500">End reflection loss at the outlets</h3>
        {outlets.length > 0 && <DownloadCsvButton what="the end reflection loss" fileName={csvFileName([planName, runName], 'end-reflection-loss')} csv={() => endReflectionLossCsv(outlets, unitSystem)} />}
      </div>
      {outlets.length === 0 ? <p className="text-sm text-graphite-500">This run has no outlet: no end is open or feeds a room.</p> : (
        <div className="overflow-x-auto">
          <table className="w-full text-xs" aria-label="End reflection loss by octave band">
            <thead>
              <tr className="border-b border-graphite-100 text-left text-graphite-500">
                <th scope="col" className="py-1 pr-2 font-medium">Outlet</th>
                {OCTAVE_BANDS_HZ.map((hz) => <th key={hz} scope="col" className="num py-1 pr-1 text-right font-medium">{hz >= 1000 ? `${hz / 1000}k` : hz}</th>)}
              </tr>
            </thead>
            <tbody>
              {outlets.map((outlet) => (
                <tr key={outlet.nodeId} className="border-b border-graphite-100">
                  <th scope="row" className="py-1 pr-2 text-left font-normal">
                    <span className="num">{outlet.label}</span>
                    <span className="block text-graphite-500">Ø {formatLength(outlet.diameterM, unitSystem, 'section')}, {OUTLET_MOUNTING_WORDS[outlet.mounting]}{outlet.rooms.length > 0 ? ` · ${outlet.rooms.join(', ')}` : ''}</span>
                  </th>
                  {outlet.erlDb.map((db, index) => <td key={OCTAVE_BANDS_HZ[index]} className="num py-1 pr-1 text-right">{signedFixed(db, 1)}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-1 text-xs text-graphite-500">dB by octave band, Hz across: sound the outlet reflects back up the duct instead of passing into the room. A rectangular end is taken as the round one of equal area.</p>
        </div>
      )}
    </section>
  );
}
