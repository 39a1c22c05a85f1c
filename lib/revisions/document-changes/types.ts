// One line of "what changed in the plan" between two revisions, in plain words.
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanLabels } from '@/lib/plan/labels';
import type { UnitSystem } from '@/lib/plan/units';

export type ChangeArea = 'plan' | 'run' | 'fan' | 'end' | 'segment' | 'room' | 'treatment';

export interface DocumentChange {
  area: ChangeArea;
  /** What changed, by its label: "Run A (Supply run 1)", "A3", "A4 end", "Recital room". */
  subject: string;
  /** Which property: "Fan blades", "Section", "Criterion"; "Added" or "Removed" for a whole item. */
  what: string;
  before: string;
  after: string;
}

/** A frozen plan: its document, scale and labels. */
export interface PlanSide {
  document: PlanDocument;
  metresPerPixel: number;
  labels: PlanLabels;
}

export interface ChangeContext {
  before: PlanSide;
  after: PlanSide;
  units: UnitSystem;
}

export const NONE = '—';
