// Rooms, risk flags and chosen treatments of a plan, as plain rows frozen into a revision
// (computed from the document by lib/plans/risks.ts; absent when the plan has none).
import type { FlaggedQuantity } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import { planRisks } from '@/lib/plans/risks';
import type { RevisionExtras, RoomRow } from './types';

const KIND_WORDS: Record<string, string> = {
  'resonance-near-tone': 'Resonance near a fan tone',
  'resonance-near-room-mode': 'Resonance near a room mode',
  'level-above-criterion': 'Level above the room criterion',
};

export function quantityText(quantity: FlaggedQuantity): string {
  if (quantity.levelDb !== undefined) return `${quantity.levelDb.toFixed(1)} dB${quantity.criterionDb !== undefined ? ` (criterion ${quantity.criterionDb.toFixed(1)} dB)` : ''}`;
  if (quantity.valueHz !== undefined) return `${quantity.valueHz.toFixed(1)} Hz${quantity.distanceHz !== undefined ? `, ${quantity.distanceHz.toFixed(1)} Hz from the target` : ''}`;
  return '—';
}

export function freezeExtras(document: PlanDocument, metresPerPixel: number): RevisionExtras {
  const extras: { -readonly [K in keyof RevisionExtras]: RevisionExtras[K] } = {};
  if (document.rooms.length > 0 || document.runs.some((run) => run.fan)) {
    const risks = planRisks(document, metresPerPixel);
    if (risks.rooms.length > 0) {
      extras.rooms = risks.rooms.map((room): RoomRow => ({
        id: room.roomId, name: room.name, problem: room.problem,
        summary: room.analysis ? `Schroeder frequency ${room.analysis.schroederHz.toFixed(0)} Hz${room.levelsNc !== null ? `, predicted NC ${room.levelsNc.toFixed(0)} against NC ${room.criterionNc}` : `, criterion NC ${room.criterionNc}`}` : '',
      }));
    }
    if (risks.flags.length > 0) {
      extras.risks = risks.flags.map((flag) => ({
        id: flag.id, runId: flag.runId, severity: flag.severity,
        label: `${KIND_WORDS[flag.kind] ?? flag.kind}: ${flag.runName}${flag.roomName ? `, serving ${flag.roomName}` : ''}`, detail: flag.reason,
      }));
    }
  }
  if ((document.treatments ?? []).length > 0) {
    extras.treatments = (document.treatments ?? []).map((treatment) => ({
      id: treatment.id, riskId: treatment.flagId, kind: treatment.treatment.kind, label: treatment.description,
      before: quantityText(treatment.before), after: quantityText(treatment.after), clears: treatment.clears,
    }));
  }
  return extras;
}
