// The end reflection loss at each outlet of a plan, by octave band: every end of a run (not its
// start) that is open or feeds a room. Flanged open ends sit flush with a ceiling or wall, every
// other outlet is taken as free-hanging, and a rectangular end as the round one of equal area, as the
// noise path takes them (lib/plans/noise-path/derive-path.ts).
import { endReflectionLoss, equivalentRadiusM, OCTAVE_BANDS_HZ, type Mounting } from '@/lib/acoustic';
import type { PlanDocument, PlanSegment } from './document';
import { planLabels, type PlanLabels } from './labels';
import { roomOutlets } from './rooms/room-places';

export interface OutletReflectionLoss {
  runId: string;
  runName: string;
  nodeId: string;
  /** The end's stable label, "A3 end". */
  label: string;
  /** Names of the rooms it feeds (none for an open end that feeds no drawn room). */
  rooms: string[];
  segmentId: string;
  diameterM: number;
  mounting: Mounting;
  temperatureC: number;
  /** ERL per band of OCTAVE_BANDS_HZ, dB. */
  erlDb: number[];
}

export const OUTLET_MOUNTING_WORDS: Record<Mounting, string> = { flush: 'flush with the ceiling or wall', free: 'free-hanging' };

function segmentEndingAt(doc: PlanDocument, nodeId: string): PlanSegment | undefined {
  return doc.segments.find((segment) => segment.from === nodeId || segment.to === nodeId);
}

/** Every outlet of the plan (or of one run), in run order and then in the order of the run's ends. */
export function outletReflectionLosses(doc: PlanDocument, runId?: string, labels: PlanLabels = planLabels(doc)): OutletReflectionLoss[] {
  const roomsByNode = new Map<string, string[]>();
  for (const room of doc.rooms) {
    for (const outlet of roomOutlets(room)) {
      if (outlet.nodeId) roomsByNode.set(outlet.nodeId, [...(roomsByNode.get(outlet.nodeId) ?? []), room.name]);
    }
  }
  return doc.runs.filter((run) => runId === undefined || run.id === runId).flatMap((run) => Object.entries(run.terminations).flatMap(([nodeId, termination]) => {
    const rooms = roomsByNode.get(nodeId) ?? [];
    if (nodeId === run.startNodeId || (termination.kind !== 'open' && rooms.length === 0)) return [];
    const segment = segmentEndingAt(doc, nodeId);
    if (!segment) return [];
    const mounting: Mounting = termination.kind === 'open' && termination.flange === 'flanged' ? 'flush' : 'free';
    const diameterM = 2 * equivalentRadiusM(segment.section);
    return [{
      runId: run.id, runName: run.name, nodeId, label: labels.nodes[nodeId] ?? nodeId, rooms, segmentId: segment.id, diameterM, mounting,
      temperatureC: run.temperatureC, erlDb: endReflectionLoss(diameterM, mounting, [...OCTAVE_BANDS_HZ], run.temperatureC),
    }];
  }));
}
