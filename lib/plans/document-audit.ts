// What a plan save writes to the audit log: treatments chosen or removed, and a new scale. The
// drawing itself changes with every autosave and is recorded by revisions, not line by line here.
import { recordAudit, type AuditActor } from '@/lib/audit/record';
import type { PlanDocument } from '@/lib/plan/document';

interface SavedTreatment { id: string; description: string }

function treatmentsOf(document: unknown): SavedTreatment[] {
  const list = (document as { treatments?: unknown } | null)?.treatments;
  if (!Array.isArray(list)) return [];
  return list
    .filter((item): item is SavedTreatment => typeof item?.id === 'string' && typeof item?.description === 'string')
    .map((item) => ({ id: item.id, description: item.description }));
}

function millimetresPerPixel(metresPerPixel: number): string {
  return `1 px = ${Number((metresPerPixel * 1000).toPrecision(4))} mm`;
}

export async function recordDocumentAudit(
  teamId: string,
  actorOf: () => Promise<AuditActor>,
  planName: string,
  before: { document: unknown; metresPerPixel: number },
  after: { document: PlanDocument; metresPerPixel: number },
): Promise<void> {
  const old = treatmentsOf(before.document);
  const now = treatmentsOf(after.document);
  const oldIds = new Set(old.map((treatment) => treatment.id));
  const nowIds = new Set(now.map((treatment) => treatment.id));
  const chosen = now.filter((treatment) => !oldIds.has(treatment.id));
  const removed = old.filter((treatment) => !nowIds.has(treatment.id));
  const scaleChanged = before.metresPerPixel !== after.metresPerPixel;
  if (chosen.length === 0 && removed.length === 0 && !scaleChanged) return;
  const actor = await actorOf();
  for (const treatment of chosen) await recordAudit({ teamId, actor, action: 'treatment.chosen', subject: `${planName}: ${treatment.description}` });
  for (const treatment of removed) await recordAudit({ teamId, actor, action: 'treatment.removed', subject: `${planName}: ${treatment.description}` });
  if (scaleChanged) {
    await recordAudit({ teamId, actor, action: 'plan.scale_set', subject: `${planName}: ${millimetresPerPixel(after.metresPerPixel)} (was ${millimetresPerPixel(before.metresPerPixel)})` });
  }
}
