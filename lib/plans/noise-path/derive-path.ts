// The noise path from a run's fan to an outlet into a room, read off the drawing: each straight segment
// on the way from the start to the outlet is a duct (its section, length and liner), a bend of more
// than ELBOW_MIN_TURN_DEG at a plain joint is an elbow, a tee is a branch power split by the areas
// leaving it, whatever the person put into a segment (silencer, plenum, other loss) follows it, and the
// outlet's end reflection loss comes last. Each element says where it came from on the plan.
import { equivalentRadiusM, sectionArea, type NoisePathInput, type PathElement, type PathElementKind } from '@/lib/acoustic';
import { findSegment, nodePositions, type PathInsert, type PlanDocument, type PlanSegment } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { segmentLengthM } from '@/lib/plan/geometry/length';
import { buildAdjacency } from '@/lib/plan/graph';
import { nodeLabelOf, planLabels, segmentLabelOf, type PlanLabels } from '@/lib/plan/labels';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { pathBetween } from '@/lib/plan/topology';
import { runFan, startAreaM2 } from '@/lib/plan/shared-fan';
import { runFeedingOutlet } from '../risk-context';
import { fanStart, type FanStart } from './fan-start';
import { plenumElement } from './plenum-element';

/** A change of direction above this at a joint of two segments counts as an elbow (common practice, no source). */
export const ELBOW_MIN_TURN_DEG = 30;
/** Outlet to listener closer than this is taken as this, m: Schultz's relation is empirical and not meant for the near field (product rule). */
export const MIN_LISTENER_DISTANCE_M = 0.5;

export interface PathElementSource {
  kind: PathElementKind;
  /** In words, with the plan's labels and SI lengths: "A2, 6.00 m", "A2/A3 elbow", "A2 tee: to A3". */
  label: string;
  segmentId: string | null;
  nodeId: string | null;
  /** A duct's segment label, length and liner thickness, for giving its label in the reader's units. */
  place?: string;
  lengthM?: number;
  liningThicknessM?: number;
}

export interface DerivedOutletPath {
  runId: string;
  runName: string;
  outletNodeId: string;
  /** "Outlet A3 end". */
  outletLabel: string;
  fan: FanStart;
  elements: PathElement[];
  sources: PathElementSource[];
  /** The run's air, for the ducts' air losses and the end reflection loss. */
  temperatureC: number;
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

function insertElement(insert: PathInsert): PathElement {
  if (insert.kind === 'silencer') return { kind: 'silencer', insertionLossDb: [...insert.insertionLossDb] };
  if (insert.kind === 'plenum') return plenumElement(insert.plenum);
  return { kind: 'loss', label: insert.label, lossDb: [...insert.lossDb] };
}

/** A duct's label in SI, as stored: "A2, 6.00 m, lined 50 mm". */
function ductLabel(place: string, lengthM: number, liningThicknessM: number | undefined): string {
  return `${place}, ${lengthM.toFixed(2)} m${liningThicknessM !== undefined ? `, lined ${(liningThicknessM * 1000).toFixed(0)} mm` : ''}`;
}

/** The path from the fan of the run that ends at outletNodeId to that outlet of the room. Throws PlanError saying what is missing. */
export function deriveOutletPath(doc: PlanDocument, metresPerPixel: number, room: PlanRoom, outletNodeId: string | null, labels: PlanLabels = planLabels(doc)): DerivedOutletPath {
  const { run, outletNodeId: nodeId } = runFeedingOutlet(doc, room, outletNodeId);
  const shared = runFan(doc, run);
  const fanSoundPowerDb = shared.fanSoundPowerDb;
  if (!fanSoundPowerDb) {
    const whose = shared.owner === run ? `${run.name}: give its fan's sound power` : `${run.name} shares the fan of ${shared.owner.name}: give that fan's sound power`;
    throw new PlanError(`${whose} (eight octave bands) to predict the level at the listener of ${room.name}.`, { runId: shared.owner.id, roomId: room.id });
  }
  const steps = pathBetween(doc, run.startNodeId, nodeId);
  if (!steps || steps.length === 0) throw new PlanError(`${room.name}: its outlet is not reached from the start of ${run.name}.`, { roomId: room.id });
  const positions = nodePositions(doc);
  const adjacency = buildAdjacency(doc);
  const segments = new Map(doc.segments.map((segment) => [segment.id, segment]));
  const elements: PathElement[] = [];
  const sources: PathElementSource[] = [];
  const add = (element: PathElement, source: Omit<PathElementSource, 'kind'>) => {
    elements.push(element);
    sources.push({ kind: element.kind, ...source });
  };
  if (shared.sharers.length > 1) {
    // the shared fan's power divides between its runs by the area of each run's first duct
    const areas = shared.sharers.map((sharer) => startAreaM2(doc, sharer, (segment) => sectionArea(segment.section)) ?? 0);
    const ownAreaM2 = startAreaM2(doc, run, (segment) => sectionArea(segment.section)) ?? 0;
    const totalAreaM2 = areas.reduce((sum, areaM2) => sum + areaM2, 0);
    if (ownAreaM2 > 0 && totalAreaM2 > ownAreaM2) {
      const names = shared.sharers.map((sharer) => sharer.name).join(', ');
      add({ kind: 'split', branchAreaM2: ownAreaM2, totalAreaM2 }, { label: `Fan shared by ${shared.sharers.length} runs (${names}): this run's share by duct area`, segmentId: null, nodeId: run.startNodeId });
    }
  }
  steps.forEach((step, index) => {
    const segment = segments.get(step.segmentId) as PlanSegment;
    if (index > 0) {
      const previous = steps[index - 1];
      const incoming = segments.get(previous.segmentId) as PlanSegment;
      const leaving = (adjacency.get(step.fromNodeId) ?? []).filter((edge) => edge.segmentId !== previous.segmentId);
      if (leaving.length > 1) {
        const totalAreaM2 = leaving.reduce((sum, edge) => sum + sectionArea((segments.get(edge.segmentId) as PlanSegment).section), 0);
        add({ kind: 'split', branchAreaM2: sectionArea(segment.section), totalAreaM2 }, { label: `${nodeLabelOf(labels, step.fromNodeId)}: to ${segmentLabelOf(labels, segment.id)}`, segmentId: segment.id, nodeId: step.fromNodeId });
      } else {
        const before = positions.get(previous.fromNodeId);
        const joint = positions.get(step.fromNodeId);
        const after = positions.get(step.toNodeId);
        if (before && joint && after && turnDeg(before, joint, after) > ELBOW_MIN_TURN_DEG) {
          add({ kind: 'elbow', section: { ...incoming.section } }, { label: `${nodeLabelOf(labels, step.fromNodeId)} elbow`, segmentId: null, nodeId: step.fromNodeId });
        }
      }
    }
    const from = positions.get(step.fromNodeId);
    const to = positions.get(step.toNodeId);
    const lengthM = from && to ? segmentLengthM(from, to, metresPerPixel, segment.lengthOverrideM) : 0;
    const place = segmentLabelOf(labels, segment.id);
    if (!(lengthM > 0)) throw new PlanError(`${run.name}: ${place} has zero length.`, { segmentId: segment.id });
    const liningThicknessM = segment.lining ? segment.lining.thicknessM : undefined;
    add(
      { kind: 'duct', section: { ...segment.section }, lengthM, ...(liningThicknessM !== undefined ? { lining: { thicknessM: liningThicknessM } } : {}) },
      { label: ductLabel(place, lengthM, liningThicknessM), segmentId: segment.id, nodeId: null, place, lengthM, ...(liningThicknessM !== undefined ? { liningThicknessM } : {}) },
    );
    for (const insert of segment.inserts ?? []) add(insertElement(insert), { label: `${insert.label} (after ${place})`, segmentId: segment.id, nodeId: null });
  });
  const last = findSegment(doc, steps[steps.length - 1].segmentId) as PlanSegment;
  const termination = run.terminations[nodeId];
  const mounting = termination?.kind === 'open' && termination.flange === 'flanged' ? 'flush' : 'free';
  const diameterM = 2 * equivalentRadiusM(last.section);
  const outletLabel = `Outlet ${nodeLabelOf(labels, nodeId)}`;
  add({ kind: 'outlet', diameterM, mounting }, { label: `${outletLabel}, ${mounting === 'flush' ? 'flush with the ceiling or wall' : 'free-hanging'}`, segmentId: null, nodeId });
  return { runId: run.id, runName: run.name, outletNodeId: nodeId, outletLabel, fan: fanStart({ ...run, fan: shared.fan }, fanSoundPowerDb), elements, sources, temperatureC: run.temperatureC };
}

/** Outlet to listener, m, no closer than MIN_LISTENER_DISTANCE_M. */
export function listenerDistanceM(outlet: { xM: number; yM: number; zM: number }, listener: { xM: number; yM: number; zM: number }): number {
  return Math.max(MIN_LISTENER_DISTANCE_M, Math.hypot(outlet.xM - listener.xM, outlet.yM - listener.yM, outlet.zM - listener.zM));
}

/** The path to the room's first listener from its first outlet, as the engine's input (Schultz's room correction). */
export function derivePath(doc: PlanDocument, metresPerPixel: number, room: PlanRoom): DerivedPath {
  const path = deriveOutletPath(doc, metresPerPixel, room, room.outlet.nodeId);
  return {
    runId: path.runId,
    input: {
      soundPowerDb: path.fan.startPowerDb, elements: path.elements, temperatureC: path.temperatureC,
      room: { volumeM3: room.lengthM * room.widthM * room.heightM, distanceM: listenerDistanceM(room.outlet, room.listener) },
    },
    sources: path.sources,
  };
}

