// The plan's treatment list: adding a chosen treatment applies its change to the drawing in the
// same undo step and remembers what the element held; removing it puts exactly that back, or
// refuses with the reason when the element has been edited since (the list-only removal stays open).
import { findSegment, type PlanDocument } from '../document';
import { PlanError } from '../errors';
import { planLabels, segmentLabelOf, nodeLabelOf } from '../labels';
import { planTreatmentSchema } from '../rooms/room-schema';
import type { PlanChange, PlanChangePrevious, PlanTreatment } from '../rooms/room-types';
import { runOfNode } from '../topology';
import { checked, defineCommand } from './define';

export interface AddTreatmentArgs {
  readonly treatment: Omit<PlanTreatment, 'id' | 'previous'>;
}

export interface RemoveTreatmentArgs {
  readonly treatmentId: string;
  /** Take it off the list but leave the drawing as it is now. */
  readonly keepDrawing?: boolean;
}

/** Applies a chosen treatment's change to the drawing: a length override, a lining or a termination. */
export function applyPlanChange(doc: PlanDocument, change: PlanChange | PlanChangePrevious): PlanDocument {
  if (change.kind === 'termination') {
    const run = runOfNode(doc, change.nodeId);
    if (!run || !(change.nodeId in run.terminations)) throw new PlanError('That treatment changes an end that is no longer on the plan.', { nodeId: change.nodeId });
    return { ...doc, runs: doc.runs.map((candidate) => (candidate.id === run.id ? { ...run, terminations: { ...run.terminations, [change.nodeId]: change.termination } } : candidate)) };
  }
  const segment = findSegment(doc, change.segmentId);
  if (!segment) throw new PlanError('That treatment changes a segment that is no longer on the plan.', { segmentId: change.segmentId });
  // putting back "none" leaves the field out, as a segment that never had one
  const { lengthOverrideM, lining, ...rest } = segment;
  const changed = change.kind === 'length-override'
    ? { ...rest, ...(lining !== undefined ? { lining } : {}), ...(change.lengthM !== null ? { lengthOverrideM: change.lengthM } : {}) }
    : { ...rest, ...(lengthOverrideM !== undefined ? { lengthOverrideM } : {}), ...(change.lining !== null ? { lining: change.lining } : {}) };
  return { ...doc, segments: doc.segments.map((candidate) => (candidate.id === segment.id ? changed : candidate)) };
}

/** What the element named by the change holds now, in the change's own shape; null when the element is gone. */
export function currentValueOf(doc: PlanDocument, change: PlanChange): PlanChangePrevious | null {
  if (change.kind === 'termination') {
    const termination = runOfNode(doc, change.nodeId)?.terminations[change.nodeId];
    return termination ? { kind: 'termination', nodeId: change.nodeId, termination } : null;
  }
  const segment = findSegment(doc, change.segmentId);
  if (!segment) return null;
  return change.kind === 'length-override'
    ? { kind: 'length-override', segmentId: segment.id, lengthM: segment.lengthOverrideM ?? null }
    : { kind: 'lining', segmentId: segment.id, lining: segment.lining ?? null };
}

function valueText(value: PlanChange | PlanChangePrevious): string {
  return JSON.stringify(value.kind === 'termination' ? value.termination : value.kind === 'lining' ? value.lining : value.lengthM);
}

/** Whether the drawing still carries exactly the change the treatment made. */
export function changeStillApplied(doc: PlanDocument, change: PlanChange): boolean {
  const current = currentValueOf(doc, change);
  return current !== null && valueText(current) === valueText(change);
}

export const addTreatment = defineCommand('add-treatment', "Add a chosen treatment to the plan's list and apply its change to the drawing.", (doc, state, args: AddTreatmentArgs, newId) => {
  const previous = args.treatment.planChange ? currentValueOf(doc, args.treatment.planChange) : null;
  if (args.treatment.planChange && previous === null) throw new PlanError('That treatment changes something that is no longer on the plan; refresh the risk list.');
  const treatment = checked(planTreatmentSchema, { ...args.treatment, id: newId(), previous }, 'Treatment');
  const changed = treatment.planChange ? applyPlanChange(doc, treatment.planChange) : doc;
  return { doc: { ...changed, treatments: [...(doc.treatments ?? []), treatment] }, state };
});

function elementName(doc: PlanDocument, change: PlanChange): string {
  const labels = planLabels(doc);
  return change.kind === 'termination' ? `the termination at ${nodeLabelOf(labels, change.nodeId)}` : `${change.kind === 'lining' ? 'the lining of' : 'the length of'} ${segmentLabelOf(labels, change.segmentId)}`;
}

export const removeTreatment = defineCommand('remove-treatment', 'Remove a treatment from the list and put back what its change replaced.', (doc, state, args: RemoveTreatmentArgs) => {
  const list = doc.treatments ?? [];
  const treatment = list.find((candidate) => candidate.id === args.treatmentId);
  if (!treatment) throw new PlanError(`There is no treatment with id "${args.treatmentId}".`);
  const remaining = { ...doc, treatments: list.filter((candidate) => candidate.id !== args.treatmentId) };
  const change = treatment.planChange;
  if (args.keepDrawing || !change || !treatment.previous || currentValueOf(doc, change) === null) return { doc: remaining, state };
  if (!changeStillApplied(doc, change)) {
    throw new PlanError(`${elementName(doc, change)} has been edited since this treatment was added, so removing it cannot put the old value back. Set it by hand, or remove the treatment from the list only.`);
  }
  return { doc: applyPlanChange(remaining, treatment.previous), state };
});
