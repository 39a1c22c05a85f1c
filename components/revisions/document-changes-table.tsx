import type { ChangeArea, DocumentChange } from '@/lib/revisions/document-changes';

const AREA_WORDS: Record<ChangeArea, string> = {
  plan: 'Plan', run: 'Runs', fan: 'Fans', end: 'Ends', segment: 'Segments and points', room: 'Rooms', treatment: 'Treatments',
};
const AREA_ORDER: ChangeArea[] = ['plan', 'run', 'fan', 'end', 'segment', 'room', 'treatment'];

// Every change to the plan document since the previous revision, grouped by what it touches.
export function DocumentChangesTable({ changes, previousNumber }: { changes: readonly DocumentChange[]; previousNumber: number }) {
  if (changes.length === 0) {
    return <p className="text-sm text-graphite-500" data-testid="plan-changes">Nothing in the plan changed since revision {previousNumber}: the same runs, fans, ends, segments, rooms and treatments.</p>;
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Changes to the plan" data-testid="plan-changes">
        <thead>
          <tr className="border-b border-graphite-100 text-left text-xs text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">Item</th>
            <th scope="col" className="py-1 pr-2 font-medium">What</th>
            <th scope="col" className="py-1 pr-2 font-medium">Revision {previousNumber}</th>
            <th scope="col" className="py-1 font-medium">Now</th>
          </tr>
        </thead>
        {AREA_ORDER.map((area) => {
          const lines = changes.filter((change) => change.area === area);
          if (lines.length === 0) return null;
          return (
            <tbody key={area}>
              <tr><th scope="rowgroup" colSpan={4} className="pt-2 pb-1 text-left text-xs font-semibold uppercase tracking-wider text-graphite-500">{AREA_WORDS[area]}</th></tr>
              {lines.map((change, index) => (
                <tr key={`${change.subject}-${change.what}-${index}`} className="border-b border-graphite-100 align-top">
                  <td className="py-1 pr-2">{change.subject}</td>
                  <td className="py-1 pr-2">{change.what}</td>
                  <td className="num py-1 pr-2 text-graphite-500">{change.before}</td>
                  <td className="num py-1">{change.after}</td>
                </tr>
              ))}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
