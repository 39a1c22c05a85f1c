// The plan's treatment list: add a chosen treatment (applying its change to the drawing), remove one.
import { findSegment, type PlanDocument } from '../document';
import { PlanError } from '../errors';
import { planTreatmentSchema } from '../rooms/room-schema';
import type { PlanChange, PlanTreatment } from '../rooms/room-types';
import { runOfNode } from '../topology';
import { checked, defineCommand } from './define';

export interface AddTreatmentArgs {
  readonly treatment: Omit<PlanTreatment, 'id'>;
}

export interface RemoveTreatmentArgs {
  readonly treatmentId: string;
}

/** Applies a chosen treatment's change to the drawing: a length override, a lining or a termination. */
export function applyPlanChange(doc: PlanDocument, change: PlanChange): PlanDocument {
  if (change.kind === 'termination') {
    const run = runOfNode(doc, change.nodeId);
    if (!run || !(change.nodeId in run.terminations)) throw new PlanError('That treatment changes an end that is no longer on the plan.', { nodeId: change.nodeId });
    return { ...doc, runs: doc.runs.map((candidate) => (candidate.id === run.id ? { ...run, terminations: { ...run.terminations, [change.nodeId]: change.termination } } : candidate)) };
  }
  const segment = findSegment(doc, change.segmentId);
  if (!segment) throw new PlanError('That treatment changes a segment that is no longer on the plan.', { segmentId: change.segmentId });
  const changed = change.kind === 'length-override' ? { ...segment, lengthOverrideM: change.lengthM } : { ...segment, lining: change.lining };
  return { ...doc, segments: doc.segments.map((candidate) => (candidate.id === segment.id ? changed : candidate)) };
}

export const addTreatment = defineCommand('add-treatment', "Add a chosen treatment to the plan's list and apply its change to the drawing.", (doc, state, args: AddTreatmentArgs, newId) => {
  const treatment = checked(planTreatmentSchema, { ...args.treatment, id: newId() }, 'Treatment');
  const changed = treatment.planChange ? applyPlanChange(doc, treatment.planChange) : doc;
  return { doc: { ...changed, treatments: [...(doc.treatments ?? []), treatment] }, state };
});

export const removeTreatment = defineCommand('remove-treatment', 'Remove a treatment from the list (the drawing keeps any change it made; undo reverts both).', (doc, state, args: RemoveTreatmentArgs) => {
  const list = doc.treatments ?? [];
  if (!list.some((treatment) => treatment.id === args.treatmentId)) throw new PlanError(`There is no treatment with id "${args.treatmentId}".`);
  return { doc: { ...doc, treatments: list.filter((treatment) => treatment.id !== args.treatmentId) }, state };
});
