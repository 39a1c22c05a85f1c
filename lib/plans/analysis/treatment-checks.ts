// Chosen treatments re-judged on the plan as it is: is the change still on the drawing, is the flag
// it promised to clear still raised, and its flagged quantity without the change and with it.
import { measureFlag, type FlaggedQuantity, type RiskFlag } from '@/lib/acoustic';
import { changeStillApplied, currentValueOf } from '@/lib/plan/commands/treatments';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanTreatment } from '@/lib/plan/rooms/room-types';
import type { PlacedFlag, PlanRisks } from '../risks';
import { planRisks } from '../risks';
import { contextFor, riskContext } from '../risk-context';
import { withoutTreatment } from './baseline';
import type { TreatmentCheck } from './types';

function sameFlag(treatment: PlanTreatment) {
  return (flag: PlacedFlag): boolean => flag.kind === treatment.flagKind && flag.subject === treatment.flagSubject && flag.runId === treatment.runId && flag.roomId === treatment.roomId;
}

/** The flag's quantity on the plan as it is now (measured even when it is no longer raised). */
function measuredNow(doc: PlanDocument, metresPerPixel: number, treatment: PlanTreatment, flag: RiskFlag): FlaggedQuantity | null {
  try {
    const context = riskContext(doc, metresPerPixel, treatment.roomId ? { roomId: treatment.roomId } : { runId: treatment.runId });
    const { input } = contextFor(context, flag.kind);
    return measureFlag(input, flag, input.run).quantity;
  } catch {
    return null;
  }
}

function check(doc: PlanDocument, metresPerPixel: number, risks: PlanRisks, treatment: PlanTreatment): TreatmentCheck {
  const base = { treatmentId: treatment.id };
  const change = treatment.planChange;
  if (change && currentValueOf(doc, change) === null) {
    return { ...base, standing: 'element-gone', message: 'What it changed is no longer on the plan; remove it from the list.', before: null, after: null };
  }
  if (change && !changeStillApplied(doc, change)) {
    return { ...base, standing: 'change-undone', message: 'That element has been edited since, so the drawing no longer carries this change; its effect no longer applies.', before: null, after: null };
  }
  const raisedNow = risks.flags.find(sameFlag(treatment)) ?? null;
  const without = withoutTreatment(doc, treatment);
  const raisedWithout = without === doc ? raisedNow : planRisks(without, metresPerPixel).flags.find(sameFlag(treatment)) ?? null;
  if (!raisedWithout) {
    return { ...base, standing: 'flag-gone', message: 'Its flag would not be raised even without it, after later changes; it may no longer be needed.', before: null, after: raisedNow?.quantity ?? null };
  }
  const after = raisedNow?.quantity ?? measuredNow(doc, metresPerPixel, treatment, raisedWithout);
  if (!change) {
    return { ...base, standing: 'recorded', message: 'Recorded only: draw it on the plan for its effect to count.', before: raisedWithout.quantity, after };
  }
  if (raisedNow && treatment.clears) {
    return { ...base, standing: 'no-longer-clears', message: `It no longer clears its flag: ${raisedNow.reason}`, before: raisedWithout.quantity, after };
  }
  return { ...base, standing: 'holds', message: raisedNow ? 'On the plan; its flag is reduced but still raised.' : 'On the plan; its flag is cleared.', before: raisedWithout.quantity, after };
}

export function checkChosenTreatments(doc: PlanDocument, metresPerPixel: number, risks: PlanRisks): TreatmentCheck[] {
  return (doc.treatments ?? []).map((treatment) => check(doc, metresPerPixel, risks, treatment));
}
