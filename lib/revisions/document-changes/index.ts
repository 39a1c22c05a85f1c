// Everything that changed in the plan document between two revisions, field by field: the scale,
// runs and their fans and ends, segments, rooms and treatments. A field the summary has no words
// of its own for is still listed, under its field name, so no change goes unsaid.
import { planLabels, type PlanLabels } from '@/lib/plan/labels';
import type { PlanDocument } from '@/lib/plan/document';
import { formatLength, type UnitSystem } from '@/lib/plan/units';
import { pointChanges } from './points';
import { roomChanges } from './rooms';
import { runChanges } from './runs';
import { segmentChanges } from './segments';
import { treatmentChanges } from './treatments';
import type { ChangeContext, DocumentChange, PlanSide } from './types';
import { otherFields } from './words';

export type { ChangeArea, DocumentChange } from './types';

const DESCRIBED_DOCUMENT: readonly (keyof PlanDocument)[] = ['schemaVersion', 'nodes', 'segments', 'runs', 'rooms', 'treatments', 'gridOrigin'];

/** Where the grid starts, measured on the plan from the drawing's top-left corner. */
function gridOriginWords(origin: PlanDocument['gridOrigin'], metresPerPixel: number, units: UnitSystem): string {
  if (!origin) return 'the drawing’s corner';
  return `${formatLength(origin.x * metresPerPixel, units, 'run')} across, ${formatLength(origin.y * metresPerPixel, units, 'run')} down`;
}

function scaleWords(metresPerPixel: number, units: UnitSystem): string {
  return `1 px = ${formatLength(metresPerPixel, units, 'section')}`;
}

export function documentChanges(
  before: { document: PlanDocument; metresPerPixel: number; labels?: PlanLabels },
  after: { document: PlanDocument; metresPerPixel: number; labels?: PlanLabels },
  units: UnitSystem = 'si',
): DocumentChange[] {
  const side = (plan: typeof before): PlanSide => ({ document: plan.document, metresPerPixel: plan.metresPerPixel, labels: plan.labels ?? planLabels(plan.document) });
  const context: ChangeContext = { before: side(before), after: side(after), units };
  const lines: DocumentChange[] = [];
  if (before.metresPerPixel !== after.metresPerPixel) {
    lines.push({ area: 'plan', subject: 'Plan', what: 'Scale', before: scaleWords(before.metresPerPixel, units), after: scaleWords(after.metresPerPixel, units) });
  }
  if (before.document.schemaVersion !== after.document.schemaVersion) {
    lines.push({ area: 'plan', subject: 'Plan', what: 'Document format', before: `version ${before.document.schemaVersion}`, after: `version ${after.document.schemaVersion}` });
  }
  const [originBefore, originAfter] = [gridOriginWords(before.document.gridOrigin, before.metresPerPixel, units), gridOriginWords(after.document.gridOrigin, after.metresPerPixel, units)];
  if (originBefore !== originAfter) lines.push({ area: 'plan', subject: 'Plan', what: 'Grid origin', before: originBefore, after: originAfter });
  for (const other of otherFields(before.document, after.document, DESCRIBED_DOCUMENT)) {
    lines.push({ area: 'plan', subject: 'Plan', what: other.field, before: other.before, after: other.after });
  }
  return [...lines, ...runChanges(context), ...segmentChanges(context), ...pointChanges(context), ...roomChanges(context), ...treatmentChanges(context)];
}
