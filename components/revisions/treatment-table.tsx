import type { TreatmentRow } from '@/lib/revisions/types';

// The chosen treatments as frozen in the revision: what each changes, the flagged quantity without
// it and with it, and how it stood on this revision (in words, with a mark).
export function TreatmentTable({ treatments }: { treatments: readonly TreatmentRow[] }) {
  if (treatments.length === 0) return null;
  return (
    <section className="panel p-4" aria-labelledby="treatments-title">
      <h2 id="treatments-title" className="mb-2 font-semibold">Chosen treatments</h2>
      <table className="w-full text-sm" aria-label="Chosen treatments">
        <thead>
          <tr className="border-b border-graphite-100 text-left text-xs text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">Treatment</th>
            <th scope="col" className="py-1 pr-2 font-medium">Without it</th>
            <th scope="col" className="py-1 pr-2 font-medium">With it (predicted)</th>
            <th scope="col" className="py-1 font-medium">On this revision</th>
          </tr>
        </thead>
        <tbody>
          {treatments.map((treatment) => (
            <tr key={treatment.id} className="border-b border-graphite-100 align-top" data-testid="revision-treatment">
              <td className="py-1 pr-2">{treatment.label}</td>
              <td className="num py-1 pr-2">{treatment.before}</td>
              <td className="num py-1 pr-2">{treatment.after}</td>
              <td className="py-1"><span aria-hidden="true">{treatment.standing === 'holds' ? '✓ ' : treatment.standing === 'recorded' || treatment.standing === 'flag-gone' ? '○ ' : '✗ '}</span>{treatment.standingText || (treatment.clears ? 'Clears its flag' : 'Does not clear its flag')}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
