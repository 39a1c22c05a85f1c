// The noise path from a run's fan to a room's listener, read off the drawing: each straight segment
// on the way from the start to the room's outlet is a duct (its section, length and liner), a bend
// of more than ELBOW_MIN_TURN_DEG at a plain joint is an elbow, a tee is a branch power split by the
// areas leaving it, whatever the person put into a segment (silencer, other loss) follows it, and
// the outlet's end reflection loss comes last. Each element says where it came from on the plan.
import { equivalentRadiusM, sectionArea, type NoisePathInput, type PathElement, type PathElementKind } from '@/lib/acoustic';
import { findSegment, nodePositions, type PlanDocument, type PlanSegment } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { segmentLengthM } from '@/lib/plan/geometry/length';
import { buildAdjacency } from '@/lib/plan/graph';
import { nodeLabelOf, planLabels, segmentLabelOf } from '@/lib/plan/labels';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { pathBetween } from '@/lib/plan/topology';
import { feedingRun } from '../risk-context';

/** A change of direction above this at a joint of two segments counts as an elbow (common practice, no source). */
export const ELBOW_MIN_TURN_DEG = 30;
/** Outlet to listener closer than this is taken as this, m: Schultz's relation is empirical and not meant for the near field (product rule). */
const MIN_LISTENER_DISTANCE_M = 0.5;

export interface PathElementSource {
  kind: PathElementKind;
  /** In words, with the plan's labels: "A2, 6.00 m", "A2/A3 elbow", "A2 tee: to A3". */
  label: string;
  segmentId: string | null;
  nodeId: string | null;
}

export interface DerivedPath {
  input: NoisePathInput;
  sources: PathElementSource[];
  runId: string;
}

function turnDeg(from: { x: number; y: number }, joint: { x: number; y: number }, to: { x: number; y: number }): number {
  const first = Math.atan2(joint.y - from.y, joint.x - from.x);
  const second = Math.atan2(to.y - joint.y, to.x - joint.x);
  const turn = Math.abs(((second - first + 3 * Math.PI) % (2 * Math.PI)) - Math.PI);
  return (turn * 180) / Math.PI;
}

function insertElement(insert: NonNullable<PlanSegment['inserts']>[number]): PathElement {
  return insert.kind === 'silencer' ? { kind: 'silencer', insertionLossDb: [...insert.insertionLossDb] } : { kind: 'loss', label: insert.label, lossDb: [...insert.lossDb] };
}

/** The path to the room's listener. Throws PlanError saying what is missing. */
export function derivePath(doc: PlanDocument, metresPerPixel: number, room: PlanRoom): DerivedPath {
  const { run, outletNodeId } = feedingRun(doc, room);
  if (!run.fanSoundPowerDb) throw new PlanError(`${run.name}: give its fan's sound power (eight octave bands) to predict the level at the listener of ${room.name}.`, { runId: run.id, roomId: room.id });
  const steps = pathBetween(doc, run.startNodeId, outletNodeId);
  if (!steps || steps.length === 0) throw new PlanError(`${room.name}: its outlet is not reached from the start of ${run.name}.`, { roomId: room.id });
  const labels = planLabels(doc);
  const positions = nodePositions(doc);
  const adjacency = buildAdjacency(doc);
  const segments = new Map(doc.segments.map((segment) => [segment.id, segment]));
  const elements: PathElement[] = [];
  const sources: PathElementSource[] = [];
  const add = (element: PathElement, label: string, segmentId: string | null, nodeId: string | null) => {
    elements.push(element);
    sources.push({ kind: element.kind, label, segmentId, nodeId });
  };
  steps.forEach((step, index) => {
    const segment = segments.get(step.segmentId) as PlanSegment;
    if (index > 0) {
      const previous = steps[index - 1];
      const incoming = segments.get(previous.segmentId) as PlanSegment;
      const leaving = (adjacency.get(step.fromNodeId) ?? []).filter((edge) => edge.segmentId !== previous.segmentId);
      if (leaving.length > 1) {
        const totalAreaM2 = leaving.reduce((sum, edge) => sum + sectionArea((segments.get(edge.segmentId) as PlanSegment).section), 0);
        add({ kind: 'split', branchAreaM2: sectionArea(segment.section), totalAreaM2 }, `${nodeLabelOf(labels, step.fromNodeId)}: to ${segmentLabelOf(labels, segment.id)}`, segment.id, step.fromNodeId);
      } else {
        const before = positions.get(previous.fromNodeId);
        const joint = positions.get(step.fromNodeId);
        const after = positions.get(step.toNodeId);
        if (before && joint && after && turnDeg(before, joint, after) > ELBOW_MIN_TURN_DEG) {
          add({ kind: 'elbow', section: { ...incoming.section } }, `${nodeLabelOf(labels, step.fromNodeId)} elbow`, null, step.fromNodeId);
        }
      }
    }
    const from = positions.get(step.fromNodeId);
    const to = positions.get(step.toNodeId);
    const lengthM = from && to ? segmentLengthM(from, to, metresPerPixel, segment.lengthOverrideM) : 0;
    if (!(lengthM > 0)) throw new PlanError(`${run.name}: ${segmentLabelOf(labels, segment.id)} has zero length.`, { segmentId: segment.id });
    add(
      { kind: 'duct', section: { ...segment.section }, lengthM, ...(segment.lining ? { lining: { thicknessM: segment.lining.thicknessM } } : {}) },
      `${segmentLabelOf(labels, segment.id)}, ${lengthM.toFixed(2)} m${segment.lining ? `, lined ${(segment.lining.thicknessM * 1000).toFixed(0)} mm` : ''}`, segment.id, null,
    );
    for (const insert of segment.inserts ?? []) add(insertElement(insert), `${insert.label} (after ${segmentLabelOf(labels, segment.id)})`, segment.id, null);
  });
  const last = findSegment(doc, steps[steps.length - 1].segmentId) as PlanSegment;
  const termination = run.terminations[outletNodeId];
  const mounting = termination?.kind === 'open' && termination.flange === 'flanged' ? 'flush' : 'free';
  const diameterM = 2 * equivalentRadiusM(last.section);
  add({ kind: 'outlet', diameterM, mounting }, `Outlet ${nodeLabelOf(labels, outletNodeId)}, ${mounting === 'flush' ? 'flush with the ceiling or wall' : 'free-hanging'}`, null, outletNodeId);
  const { outlet, listener } = room;
  const distanceM = Math.max(MIN_LISTENER_DISTANCE_M, Math.hypot(outlet.xM - listener.xM, outlet.yM - listener.yM, outlet.zM - listener.zM));
  return {
    runId: run.id,
    input: { soundPowerDb: [...run.fanSoundPowerDb], elements, room: { volumeM3: room.lengthM * room.widthM * room.heightM, distanceM }, temperatureC: run.temperatureC },
    sources,
  };
}
