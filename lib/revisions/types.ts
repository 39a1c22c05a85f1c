// What a frozen revision holds, as read back by pages, routes and the schedule.
import type { NoiseTables } from '@/lib/plans/noise-path/path-tables';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanLabels } from '@/lib/plan/labels';
import type { TreatmentStanding } from '@/lib/plans/analysis/types';
import type { RunResult } from '@/lib/plans/results';
import type { RevisionState } from './states';

// Rooms, risk flags and treatments as they were when the revision was frozen (each present
// only when the plan had them).
export interface RevisionExtras {
  /** The stable labels of the frozen plan (absent in revisions frozen before labels existed). */
  labels?: PlanLabels;
  /** The frozen content's hash: a draft whose content hashes the same is unchanged since. */
  contentHash?: string;
  rooms?: readonly RoomRow[];
  risks?: readonly RiskRow[];
  treatments?: readonly TreatmentRow[];
}

export interface RiskRow { id: string; runId: string | null; label: string; detail: string; severity: string }
export interface TreatmentRow { id: string; riskId: string | null; kind: string; label: string; before: string; after: string; clears: boolean; standing?: TreatmentStanding; standingText?: string }
export interface RoomRow {
  id: string; name: string; problem: string | null; summary: string;
  /** Revisions frozen before rooms had several outlets and listeners: the one path's table, 8 octave bands each row. */
  path?: { rows: { label: string; valuesDb: number[]; total?: boolean }[]; nc: number; nr: number; dba: number; governingHz: number } | null;
  /** The room's noise as frozen: a table per outlet path and per listener. */
  noise?: NoiseTables | null;
}

export interface RevisionSummary {
  id: string;
  planId: string;
  number: number;
  planVersion: number;
  /** The frozen content's hash (null where the summary was read without the document). */
  contentHash: string | null;
  state: RevisionState;
  note: string;
  submittedByName: string;
  reviewedByName: string | null;
  reviewedAt: string | null;
  /** The engineer's overall note when finishing the review ('' before, or when none was written). */
  reviewNote: string;
  createdAt: string;
}

export interface RevisionView extends RevisionSummary {
  teamId: string;
  planName: string;
  project: { id: string; name: string };
  metresPerPixel: number;
  document: PlanDocument;
  analysis: RunResult[];
  extras: RevisionExtras;
  background: { id: string; contentType: string; widthPx: number | null; heightPx: number | null } | null;
}
