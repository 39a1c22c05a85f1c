// Candidate treatments for one flag of a plan version, each re-run through the engine, with the
// change each would make to the drawing when chosen, described with the plan's stable labels. Only
// treatments that change something drawn on the flag's own path and improve the flagged quantity
// are offered.
import { candidateTreatments, describeTreatment, lowersQuantity, type RiskFlag, type Treatment, type TreatmentNames, type TreatmentResult } from '@/lib/acoustic';
import { AppError } from '@/lib/errors';
import type { PlanDocument } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { nodeLabelOf, segmentLabelOf, type PlanLabels } from '@/lib/plan/labels';
import type { PlanChange } from '@/lib/plan/rooms/room-types';
import type { MainPathPiece } from '@/lib/plan/to-run-input';
import { computePlanAnalysis } from './analysis/compute';
import type { PlanAnalysis } from './analysis/types';
import { pathTreatmentOptions } from './noise-path/path-treatments';
import { contextFor, riskContext, type RiskContext, type RiskTarget } from './risk-context';

export interface TreatmentOption extends TreatmentResult {
  /** What choosing it changes on the drawing; null: recorded in the list only (a side branch to draw by hand). */
  planChange: PlanChange | null;
}

export interface TreatmentOptions {
  flag: RiskFlag;
  runId: string;
  roomId: string | null;
  options: TreatmentOption[];
}

/** Maps an engine treatment (main-path segment indices, run ends) onto the drawing's segments and nodes. */
export function planChangeFor(treatment: Treatment, path: readonly MainPathPiece[], segmentLengthsM: readonly number[], startNodeId: string): PlanChange | null {
  switch (treatment.kind) {
    case 'retune-length': {
      const index = treatment.segmentIndex;
      if (index === undefined || treatment.deltaLengthM === undefined || !path[index]) return null;
      return { kind: 'length-override', segmentId: path[index].segmentId, lengthM: segmentLengthsM[index] + treatment.deltaLengthM };
    }
    case 'line-segment': {
      const piece = path[treatment.segmentIndex];
      const whole = treatment.lengthM === undefined || treatment.lengthM >= segmentLengthsM[treatment.segmentIndex];
      const lining = { thicknessM: treatment.thicknessM, ...(treatment.absorption === undefined ? {} : { absorption: treatment.absorption }) };
      return piece && whole ? { kind: 'lining', segmentId: piece.segmentId, lining } : null;
    }
    case 'change-termination': {
      const nodeId = treatment.end === 'start' ? startNodeId : path.at(-1)?.toNodeId;
      return nodeId ? { kind: 'termination', nodeId, termination: treatment.termination } : null;
    }
    case 'side-branch-resonator':
      return null;
  }
}

function namesFor(labels: PlanLabels, path: readonly MainPathPiece[], startNodeId: string): TreatmentNames {
  return {
    segment: (index) => (path[index] ? segmentLabelOf(labels, path[index].segmentId) : `segment ${index + 1}`),
    end: (end) => `the termination at ${nodeLabelOf(labels, end === 'start' ? startNodeId : path.at(-1)?.toNodeId ?? '')}`,
  };
}


function optionsFor(context: RiskContext, labels: PlanLabels, flag: RiskFlag): TreatmentOption[] {
  const { input, path } = contextFor(context, flag.kind);
  const lengthsM = input.run.segments.map((segment) => segment.lengthM);
  const names = namesFor(labels, path, context.run.startNodeId);
  return candidateTreatments(input, flag)
    .map((result) => ({ ...result, description: describeTreatment(result.treatment, names), planChange: planChangeFor(result.treatment, path, lengthsM, context.run.startNodeId) }))
    .filter((option) => (option.planChange !== null || option.treatment.kind === 'side-branch-resonator') && lowersQuantity(option.before, option.after, option.clears));
}

/** The flag as the stored analysis has it, for this target. */
export function findFlag(analysis: PlanAnalysis, target: RiskTarget, flagId: string): RiskFlag {
  const flag = analysis.risks.flags.find((candidate) => candidate.id === flagId && ('roomId' in target ? candidate.roomId === target.roomId : candidate.runId === target.runId && candidate.roomId === null));
  if (!flag) throw new AppError('conflict', 'That flag is no longer raised on the saved plan; the risk list is being refreshed.', { field: 'flagId' });
  return flag;
}

export function treatmentOptionsFromAnalysis(doc: PlanDocument, metresPerPixel: number, analysis: PlanAnalysis, target: RiskTarget, flagId: string): TreatmentOptions {
  let context: RiskContext;
  try {
    context = riskContext(doc, metresPerPixel, target);
  } catch (error) {
    if (error instanceof PlanError || error instanceof RangeError) throw new AppError('bad_input', error.message);
    throw error;
  }
  const flag = findFlag(analysis, target, flagId);
  const options = flag.id.startsWith('path-level:') && context.room
    ? pathTreatmentOptions(doc, metresPerPixel, context.room, flag, analysis.labels)
    : optionsFor(context, analysis.labels, flag);
  return { flag, runId: context.run.id, roomId: context.room?.id ?? null, options };
}

/** The same, analysing the document first (scripts and tests; the app reads the stored analysis). */
export function treatmentOptions(doc: PlanDocument, metresPerPixel: number, target: RiskTarget, flagId: string, analysis: PlanAnalysis = computePlanAnalysis(doc, metresPerPixel)): TreatmentOptions {
  return treatmentOptionsFromAnalysis(doc, metresPerPixel, analysis, target, flagId);
}
