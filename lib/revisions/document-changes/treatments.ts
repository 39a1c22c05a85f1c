// What changed in the chosen treatments: chosen, removed, or changed since (a new before/after).
import type { PlanTreatment } from '@/lib/plan';
import type { ChangeContext, DocumentChange } from './types';
import { NONE } from './types';
import { otherFields } from './words';

const DESCRIBED: readonly (keyof PlanTreatment)[] = ['id', 'description'];

export function treatmentChanges(context: ChangeContext): DocumentChange[] {
  const before = new Map((context.before.document.treatments ?? []).map((treatment) => [treatment.id, treatment]));
  const after = new Set((context.after.document.treatments ?? []).map((treatment) => treatment.id));
  const lines: DocumentChange[] = [];
  for (const treatment of context.after.document.treatments ?? []) {
    const old = before.get(treatment.id);
    if (!old) {
      lines.push({ area: 'treatment', subject: treatment.description, what: 'Chosen', before: NONE, after: treatment.clears ? 'clears its flag' : 'does not clear its flag' });
      continue;
    }
    if (old.description !== treatment.description) lines.push({ area: 'treatment', subject: treatment.description, what: 'Description', before: old.description, after: treatment.description });
    for (const other of otherFields(old, treatment, DESCRIBED)) lines.push({ area: 'treatment', subject: treatment.description, what: other.field, before: other.before, after: other.after });
  }
  for (const treatment of context.before.document.treatments ?? []) {
    if (!after.has(treatment.id)) lines.push({ area: 'treatment', subject: treatment.description, what: 'Removed', before: 'chosen', after: NONE });
  }
  return lines;
}
