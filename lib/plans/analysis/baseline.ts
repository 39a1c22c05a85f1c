// The plan as it would be without its chosen treatments' changes: what each changed element held
// before, put back wherever the drawing still carries the change (latest treatment first).
import { applyPlanChange, changeStillApplied } from '@/lib/plan/commands/treatments';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanTreatment } from '@/lib/plan/rooms/room-types';

export function withoutTreatment(doc: PlanDocument, treatment: PlanTreatment): PlanDocument {
  const { planChange, previous } = treatment;
  if (!planChange || !previous || !changeStillApplied(doc, planChange)) return doc;
  return applyPlanChange(doc, previous);
}

export function withoutTreatmentChanges(doc: PlanDocument): PlanDocument {
  return [...(doc.treatments ?? [])].reverse().reduce(withoutTreatment, doc);
}
