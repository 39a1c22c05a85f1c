'use client';

import type { PlanTreatment } from '@/lib/plan';
import { formatQuantity } from './quantity';

// The plan's chosen treatments, each with the flag it answers and the engine's before and after.
export function TreatmentList({ treatments, editable, onRemove }: { treatments: readonly PlanTreatment[]; editable: boolean; onRemove: (treatmentId: string) => void }) {
  if (treatments.length === 0) return <p className="text-sm text-graphite-500">No treatments chosen yet. Open a flag&apos;s treatments and add the one you want to the plan.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="treatment-list">
      <thead className="text-xs text-graphite-500"><tr><th className="py-1 pr-2 font-medium">Treatment</th><th className="pr-2 font-medium">For</th><th className="pr-2 font-medium">Before</th><th className="pr-2 font-medium">After</th><th className="pr-2 font-medium">Clears</th><th /></tr></thead>
      <tbody>
        {treatments.map((treatment) => (
          <tr key={treatment.id} className="border-t border-graphite-100 align-top" data-testid="treatment-row">
            <td className="py-1 pr-2">{treatment.description}</td>
            <td className="pr-2 text-xs">{treatment.flagReason}</td>
            <td className="num pr-2 text-xs" data-testid="treatment-before">{formatQuantity(treatment.before)}</td>
            <td className="num pr-2 text-xs" data-testid="treatment-after">{formatQuantity(treatment.after)}</td>
            <td className="pr-2 text-xs">{treatment.clears ? '✓ yes' : '✗ no'}</td>
            <td className="py-1">{editable && <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => onRemove(treatment.id)}>Remove</button>}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
