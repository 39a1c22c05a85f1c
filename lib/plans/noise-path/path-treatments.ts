// Treatments of a level flag raised by the room's noise, each judged through the paths before and
// after at the flag's listener and band: a fibrous liner in the longest unlined duct of the outlet path
// that contributes most there. (A silencer or plenum is put in by hand on the segment panel; the paths
// then show its effect.)
import { OCTAVE_BANDS_HZ, type RiskFlag } from '@/lib/acoustic';
import type { PlanDocument } from '@/lib/plan/document';
import { segmentLabelOf, type PlanLabels } from '@/lib/plan/labels';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { applyPlanChange } from '@/lib/plan/commands/treatments';
import type { TreatmentOption } from '../treatment-options';
import { listenerOfSubject, pathLevelFlags } from './room-path';
import { roomNoise, type RoomNoise } from './room-noise';

/** The liner offered: 50 mm fibrous liner, absorbing by band for its thickness in the path and in the duct model alike. Product default. */
const OFFERED_LINING = { thicknessM: 0.05 };

function levelAt(noise: RoomNoise, listenerId: string, band: number): number | null {
  return noise.listeners.find((listener) => listener.listenerId === listenerId)?.levelDb[band] ?? null;
}

export function pathTreatmentOptions(doc: PlanDocument, metresPerPixel: number, room: PlanRoom, flag: RiskFlag, labels: PlanLabels): TreatmentOption[] {
  const before = roomNoise(doc, metresPerPixel, room);
  const band = OCTAVE_BANDS_HZ.indexOf(flag.targetHz);
  const listenerId = listenerOfSubject(flag.subject);
  const listener = before.listeners.find((candidate) => candidate.listenerId === listenerId);
  if (band < 0 || !listener) return [];
  // the outlet that brings the most to this listener in this band
  const loudest = listener.contributions.reduce((most, part) => (part.levelDb[band] > most.levelDb[band] ? part : most));
  const outlet = before.outlets.find((candidate) => candidate.outletId === loudest.outletId);
  const ducts = (outlet?.elements ?? []).flatMap((element, index) => {
    const segmentId = outlet!.sources[index].segmentId;
    const lined = doc.segments.find((segment) => segment.id === segmentId)?.lining;
    return element.kind === 'duct' && segmentId !== null && !lined ? [{ segmentId, lengthM: element.lengthM }] : [];
  });
  if (ducts.length === 0) return [];
  const { segmentId } = ducts.reduce((longest, duct) => (duct.lengthM > longest.lengthM ? duct : longest));
  const planChange = { kind: 'lining' as const, segmentId, lining: OFFERED_LINING };
  const treated = applyPlanChange(doc, planChange);
  const after = roomNoise(treated, metresPerPixel, room);
  const levelBefore = levelAt(before, listenerId, band) as number;
  const levelAfter = levelAt(after, listenerId, band);
  if (levelAfter === null) return [];
  const afterFlags = pathLevelFlags(room, after);
  const beforeFlags = pathLevelFlags(room, before);
  const raises = afterFlags.filter((candidate) => !beforeFlags.some((old) => old.subject === candidate.subject)).map((raised) => `${raised.severity}: ${raised.reason}`);
  const segmentIndex = doc.segments.findIndex((segment) => segment.id === segmentId);
  const option: TreatmentOption = {
    treatment: { kind: 'line-segment', segmentIndex: Math.max(0, segmentIndex), ...OFFERED_LINING },
    description: `Line ${segmentLabelOf(labels, segmentId)} with ${(OFFERED_LINING.thicknessM * 1000).toFixed(0)} mm fibrous liner (judged through the noise path)`,
    before: flag.quantity,
    after: { levelDb: levelAfter, criterionDb: after.criterionDb[band] },
    clears: !afterFlags.some((candidate) => candidate.subject === flag.subject),
    raises,
    effect: { bandLossDb: OCTAVE_BANDS_HZ.map((_, index) => (levelAt(before, listenerId, index) ?? 0) - (levelAt(after, listenerId, index) ?? 0)) },
    notes: [`level at listener ${listener.name}, ${flag.targetHz} Hz: ${levelBefore.toFixed(1)} → ${levelAfter.toFixed(1)} dB`],
    planChange,
  };
  return levelAfter < levelBefore - 0.05 ? [option] : [];
}
