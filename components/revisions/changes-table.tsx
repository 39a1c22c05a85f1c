import type { RevisionChanges } from '@/lib/revisions/changes';
import type { DocumentChange } from '@/lib/revisions/document-changes';
import { DocumentChangesTable } from './document-changes-table';

function hzList(values: number[]): string {
  return values.length === 0 ? '—' : values.map((value) => value.toFixed(1)).join(', ') + ' Hz';
}

function metres(value: number | null): string {
  return value === null ? '—' : `${value.toFixed(2)} m`;
}

function count(value: number | null): string {
  return value === null ? '—' : String(value);
}

// Key numbers of this revision beside the previous one's, then every change to the plan itself.
export function ChangesTable({ changes, planChanges, number }: { changes: RevisionChanges; planChanges: readonly DocumentChange[] | null; number: number }) {
  const before = changes.previousNumber === null ? 'before' : `revision ${changes.previousNumber}`;
  return (
    <section className="panel p-4" aria-labelledby="changes-title">
      <h2 id="changes-title" className="mb-2 font-semibold">What changed since {changes.previousNumber === null ? 'the start (first revision)' : `revision ${changes.previousNumber}`}</h2>
      <p className="mb-2 text-sm text-graphite-500">Runs: {count(changes.runCount[0])} → {changes.runCount[1]} · segments: {count(changes.segmentCount[0])} → {changes.segmentCount[1]}</p>
      <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Changes by run">
        <thead>
          <tr className="border-b border-graphite-100 text-left text-xs text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">Run</th>
            <th scope="col" className="py-1 pr-2 font-medium">Length, {before}</th>
            <th scope="col" className="py-1 pr-2 font-medium">Length, revision {number}</th>
            <th scope="col" className="py-1 pr-2 font-medium">First resonances, {before}</th>
            <th scope="col" className="py-1 pr-2 font-medium">First resonances, revision {number}</th>
            <th scope="col" className="py-1 font-medium">Resonances</th>
          </tr>
        </thead>
        <tbody>
          {changes.runs.map((run) => {
            const changed = run.lengthM[0] !== run.lengthM[1] || run.resonanceCount[0] !== run.resonanceCount[1];
            return (
              <tr key={run.runId} className="border-b border-graphite-100">
                <td className="py-1 pr-2">{run.name}{run.status !== 'kept' && <span className="ml-1 text-xs text-graphite-500">({run.status})</span>}{changed && changes.previousNumber !== null && <span className="ml-1 text-xs text-risk-ink">· changed</span>}</td>
                <td className="num py-1 pr-2">{metres(run.lengthM[0])}</td>
                <td className="num py-1 pr-2">{metres(run.lengthM[1])}</td>
                <td className="num py-1 pr-2">{hzList(run.firstResonancesHz[0])}</td>
                <td className="num py-1 pr-2">{hzList(run.firstResonancesHz[1])}</td>
                <td className="num py-1">{count(run.resonanceCount[0])} → {count(run.resonanceCount[1])}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      </div>
      {changes.previousNumber !== null && planChanges && (
        <div className="mt-4">
          <h3 className="mb-1 text-sm font-semibold">Changes to the plan</h3>
          <DocumentChangesTable changes={planChanges} previousNumber={changes.previousNumber} />
        </div>
      )}
    </section>
  );
}
