// The analysis of one plan version: computed once from the saved document (off the request thread),
// stored under the content's hash, and read by results, risks, treatments, review rows and the
// schedule alike. A revision freezes it.
import type { FlaggedQuantity } from '@/lib/acoustic';
import type { PlanLabels } from '@/lib/plan/labels';
import type { RunResult } from '../results';
import type { PlanRisks } from '../risks';
import type { TreatmentOptions } from '../treatment-options';

/** Raised whenever what an analysis holds changes, so stored analyses of older forms are recomputed. */
export const ANALYSIS_FORMAT = 10;

/** How a chosen treatment stands on the plan as it is now. */
export type TreatmentStanding =
  | 'holds'             // the change is on the drawing and the flag it promised to clear is not raised
  | 'no-longer-clears'  // the change is on the drawing but its flag is raised again
  | 'change-undone'     // the element has been edited since: the drawing no longer carries the change
  | 'element-gone'      // the element it changed is no longer on the plan
  | 'flag-gone'         // its flag would not be raised even without it
  | 'recorded';         // nothing drawn changes (e.g. a side branch to draw by hand); its flag is still raised

export interface TreatmentCheck {
  treatmentId: string;
  standing: TreatmentStanding;
  /** Plain words for the standing, shown in the editor, the review and the schedule. */
  message: string;
  /** The flagged quantity without this treatment's change, and with the plan as it is (null where not measurable). */
  before: FlaggedQuantity | null;
  after: FlaggedQuantity | null;
}

export interface PlanAnalysis {
  format: number;
  contentHash: string;
  labels: PlanLabels;
  runs: RunResult[];
  risks: PlanRisks;
  treatments: TreatmentCheck[];
}

/** The candidate treatments of one flag, keyed by candidateKey(). */
export type CandidateMap = Record<string, TreatmentOptions>;

export function candidateKey(target: { roomId?: string | null; runId?: string | null }, flagId: string): string {
  return `${target.roomId ?? ''}|${target.roomId ? '' : target.runId ?? ''}|${flagId}`;
}
