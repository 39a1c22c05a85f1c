// Candidate treatments for one flag on the saved plan, each re-run through the engine, with the
// change each would make to the drawing when chosen.
import { assessRisks, candidateTreatments, type RiskFlag, type Treatment, type TreatmentResult } from '@/lib/acoustic';
import { AppError } from '@/lib/errors';
import type { PlanDocument } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import type { PlanChange } from '@/lib/plan/rooms/room-types';
import { riskContext, type RiskContext, type RiskTarget } from './risk-context';

export interface TreatmentOption extends TreatmentResult {
  /** What choosing it changes on the drawing; null: recorded in the list only (e.g. a side branch to draw). */
  planChange: PlanChange | null;
}

export interface TreatmentOptions {
  flag: RiskFlag;
  runId: string;
  roomId: string | null;
  options: TreatmentOption[];
}

/** Maps an engine treatment (main-path segment indices, run ends) onto the drawing's segments and nodes. */
export function planChangeFor(treatment: Treatment, context: RiskContext): PlanChange | null {
  const segments = context.input.run.segments;
  switch (treatment.kind) {
    case 'retune-length': {
      const index = treatment.segmentIndex;
      if (index === undefined || treatment.deltaLengthM === undefined || !context.path[index]) return null;
      return { kind: 'length-override', segmentId: context.path[index].segmentId, lengthM: segments[index].lengthM + treatment.deltaLengthM };
    }
    case 'line-segment': {
      const piece = context.path[treatment.segmentIndex];
      const whole = treatment.lengthM === undefined || treatment.lengthM >= segments[treatment.segmentIndex].lengthM;
      return piece && whole ? { kind: 'lining', segmentId: piece.segmentId, lining: { thicknessM: treatment.thicknessM, absorption: treatment.absorption } } : null;
    }
    case 'change-termination': {
      const nodeId = treatment.end === 'start' ? context.run.startNodeId : context.path.at(-1)?.toNodeId;
      return nodeId ? { kind: 'termination', nodeId, termination: treatment.termination } : null;
    }
    case 'side-branch-resonator':
      return null;
  }
}

export function treatmentOptions(doc: PlanDocument, metresPerPixel: number, target: RiskTarget, flagId: string): TreatmentOptions {
  let context: RiskContext;
  try {
    context = riskContext(doc, metresPerPixel, target);
  } catch (error) {
    if (error instanceof PlanError || error instanceof RangeError) throw new AppError('bad_input', error.message);
    throw error;
  }
  const flag = assessRisks(context.input).find((candidate) => candidate.id === flagId);
  if (!flag) throw new AppError('conflict', 'That flag is no longer raised on the saved plan; the risk list is being refreshed.', { field: 'flagId' });
  const options = candidateTreatments(context.input, flag).map((result) => ({ ...result, planChange: planChangeFor(result.treatment, context) }));
  return { flag, runId: context.run.id, roomId: context.room?.id ?? null, options };
}
