// Rooms, risk flags, labels and chosen treatments (with how each stands) of a plan version, as plain
// rows frozen into a revision from the version's one analysis (absent when the plan has none).
import type { FlaggedQuantity } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import type { PlanAnalysis } from '@/lib/plans/analysis/types';
import { noiseTables } from '@/lib/plans/noise-path/path-tables';
import type { RoomNoise } from '@/lib/plans/noise-path/room-noise';
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

export function freezeExtras(document: PlanDocument, analysis: PlanAnalysis): RevisionExtras {
  const extras: { -readonly [K in keyof RevisionExtras]: RevisionExtras[K] } = { labels: analysis.labels, contentHash: analysis.contentHash };
  if (document.rooms.length > 0 || document.runs.some((run) => run.fan)) {
    const risks = analysis.risks;
    if (risks.rooms.length > 0) {
      extras.rooms = risks.rooms.map((room): RoomRow => ({
        id: room.roomId, name: room.name, problem: room.problem, noise: room.noise ? noiseTables(room.noise) : null,
        summary: room.analysis ? `Schroeder frequency ${room.analysis.schroederHz.toFixed(0)} Hz${room.noise ? `, ${noiseSummary(room.noise)} against NC ${room.criterionNc}` : room.levelsNc !== null ? `, predicted NC ${room.levelsNc.toFixed(0)} against NC ${room.criterionNc}` : `, criterion NC ${room.criterionNc}`}` : '',
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
    const checks = new Map(analysis.treatments.map((check) => [check.treatmentId, check]));
    extras.treatments = (document.treatments ?? []).map((treatment) => {
      const check = checks.get(treatment.id);
      const current = analysis.risks.flags.find((flag) => flag.kind === treatment.flagKind && flag.subject === treatment.flagSubject && flag.runId === treatment.runId && flag.roomId === treatment.roomId);
      return {
        id: treatment.id, riskId: current?.id ?? treatment.flagId, kind: treatment.treatment.kind, label: treatment.description,
        before: quantityText(check?.before ?? treatment.before), after: quantityText(check?.after ?? treatment.after),
        clears: check ? check.standing === 'holds' && current === undefined : treatment.clears,
        standing: check?.standing ?? 'holds', standingText: check?.message ?? '',
      };
    });
  }
  return extras;
}


/** "NC 24 at L1 (the worst of 2 listeners) by the noise paths of 2 outlets". */
function noiseSummary(noise: RoomNoise): string {
  const worst = noise.listeners.find((listener) => listener.listenerId === noise.worstListenerId) ?? noise.listeners[0];
  const listeners = noise.listeners.length > 1 ? ` (the worst of ${noise.listeners.length} listeners)` : '';
  const outlets = noise.outlets.length > 1 ? `the noise paths of ${noise.outlets.length} outlets` : 'the noise path';
  return `NC ${worst.nc.toFixed(0)} at ${worst.name}${listeners} by ${outlets}`;
}
