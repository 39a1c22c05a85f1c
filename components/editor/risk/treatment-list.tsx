'use client';

import type { PlanDocument, PlanTreatment } from '@/lib/plan';
import { changeStillApplied } from '@/lib/plan/commands/treatments';
import type { TreatmentCheck, TreatmentStanding } from '@/lib/plans/analysis/types';
import { formatQuantity } from './quantity';

const STANDING_WORDS: Record<TreatmentStanding, { mark: string; text: string }> = {
  holds: { mark: '✓', text: 'Holds' },
  'no-longer-clears': { mark: '✗', text: 'No longer clears' },
  'change-undone': { mark: '✗', text: 'Change undone' },
  'element-gone': { mark: '✗', text: 'Element gone' },
  'flag-gone': { mark: '○', text: 'Flag gone' },
  recorded: { mark: '○', text: 'Recorded only' },
};

interface TreatmentListProps {
  document: PlanDocument;
  treatments: readonly PlanTreatment[];
  /** How each stands on the saved plan (from its analysis); absent while loading. */
  checks: readonly TreatmentCheck[] | null;
  editable: boolean;
  onRemove: (treatmentId: string, keepDrawing: boolean) => void;
}

// The plan's chosen treatments, each with the flag it answers, its before and after on the plan as it
// is now, and whether it still does what it said. Removing one puts back what its change replaced.
export function TreatmentList({ document, treatments, checks, editable, onRemove }: TreatmentListProps) {
  if (treatments.length === 0) return <p className="text-sm text-graphite-500">No treatments chosen yet. Open a flag&apos;s treatments and add the one you want to the plan.</p>;
  const byId = new Map((checks ?? []).map((check) => [check.treatmentId, check]));
  return (
    <table className="w-full text-left text-sm" data-testid="treatment-list">
      <thead className="text-xs text-graphite-500"><tr><th className="py-1 pr-2 font-medium">Treatment</th><th className="pr-2 font-medium">For</th><th className="pr-2 font-medium">Before</th><th className="pr-2 font-medium">After</th><th className="pr-2 font-medium">On the plan now</th><th /></tr></thead>
      <tbody>
        {treatments.map((treatment) => {
          const check = byId.get(treatment.id);
          const words = check ? STANDING_WORDS[check.standing] : null;
          const revertible = treatment.planChange === null || !treatment.previous || changeStillApplied(document, treatment.planChange);
          return (
            <tr key={treatment.id} className="border-t border-graphite-100 align-top" data-testid="treatment-row">
              <td className="py-1 pr-2">{treatment.description}</td>
              <td className="pr-2 text-xs">{treatment.flagReason}</td>
              <td className="num pr-2 text-xs" data-testid="treatment-before">{formatQuantity(check?.before ?? treatment.before)}</td>
              <td className="num pr-2 text-xs" data-testid="treatment-after">{formatQuantity(check?.after ?? treatment.after)}</td>
              <td className="pr-2 text-xs" data-testid="treatment-standing" title={check?.message}>
                {words ? <><span aria-hidden="true">{words.mark} </span>{words.text}<span className="block text-graphite-500">{check?.message}</span></> : 'Checking…'}
              </td>
              <td className="py-1">
                {editable && (revertible
                  ? <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => onRemove(treatment.id, false)} title="Remove it and put back what its change replaced">Remove</button>
                  : <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => onRemove(treatment.id, true)} title="The element was edited since; the drawing stays as it is now">Remove from the list only</button>)}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
