// Treatments of a level flag raised by the noise path, each judged through the path before and after:
// a fibrous liner in the longest unlined duct on the way to the room. (A silencer is put in by hand
// with the maker's data, on the segment panel; the path then shows its effect.)
import type { RiskFlag } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import { segmentLabelOf, type PlanLabels } from '@/lib/plan/labels';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { applyPlanChange } from '@/lib/plan/commands/treatments';
import type { TreatmentOption } from '../treatment-options';
import { roomNoisePath, pathLevelFlags } from './room-path';

/** The liner offered: 50 mm fibrous liner (its absorption by band follows the thickness in the path; 0.7 is kept for the duct model). Product default. */
const OFFERED_LINING = { thicknessM: 0.05, absorption: 0.7 };

function bandIndex(flag: RiskFlag, bandsHz: readonly number[]): number {
  return bandsHz.indexOf(flag.targetHz);
}

export function pathTreatmentOptions(doc: PlanDocument, metresPerPixel: number, room: PlanRoom, flag: RiskFlag, labels: PlanLabels): TreatmentOption[] {
  const before = roomNoisePath(doc, metresPerPixel, room);
  const band = bandIndex(flag, before.result.bandsHz);
  const ducts = before.elements.flatMap((element, index) => {
    const segmentId = before.sources[index].segmentId;
    const lined = doc.segments.find((segment) => segment.id === segmentId)?.lining;
    return element.kind === 'duct' && segmentId !== null && !lined ? [{ segmentId, lengthM: element.lengthM }] : [];
  });
  if (ducts.length === 0 || band < 0) return [];
  const { segmentId } = ducts.reduce((longest, duct) => (duct.lengthM > longest.lengthM ? duct : longest));
  const planChange = { kind: 'lining' as const, segmentId, lining: OFFERED_LINING };
  const treated = applyPlanChange(doc, planChange);
  const after = roomNoisePath(treated, metresPerPixel, room);
  const afterFlags = pathLevelFlags(room, after);
  const beforeFlags = pathLevelFlags(room, before);
  const raises = afterFlags.filter((candidate) => !beforeFlags.some((old) => old.subject === candidate.subject)).map((raised) => `${raised.severity}: ${raised.reason}`);
  const segmentIndex = doc.segments.findIndex((segment) => segment.id === segmentId);
  const option: TreatmentOption = {
    treatment: { kind: 'line-segment', segmentIndex: Math.max(0, segmentIndex), ...OFFERED_LINING },
    description: `Line ${segmentLabelOf(labels, segmentId)} with ${(OFFERED_LINING.thicknessM * 1000).toFixed(0)} mm fibrous liner (judged through the noise path)`,
    before: flag.quantity,
    after: { levelDb: after.result.listenerDb[band], criterionDb: after.criterionDb[band] },
    clears: !afterFlags.some((candidate) => candidate.subject === flag.subject),
    raises,
    notes: [`listener level at ${flag.targetHz} Hz: ${before.result.listenerDb[band].toFixed(1)} → ${after.result.listenerDb[band].toFixed(1)} dB`],
    planChange,
  };
  return after.result.listenerDb[band] < before.result.listenerDb[band] - 0.05 ? [option] : [];
}
