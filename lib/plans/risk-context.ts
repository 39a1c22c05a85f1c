// The engine's risk input for a run of the plan, alone or feeding a room: the run (ending at the
// room's outlet when there is one), its fan, and the room.
import type { FanInput, RiskInput } from '@/lib/acoustic';
import { findRoom, findRun, type PlanDocument, type PlanRun } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { toRoomInput } from '@/lib/plan/rooms/room-input';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { toRunInputWithMap, type MainPathPiece } from '@/lib/plan/to-run-input';
import { nodeDegree, runOfNode } from '@/lib/plan/topology';

/**
 * The coincidence rules the plan's flags use, stated in the risk list: a resonance within the wider of
 * its half bandwidth and this percentage of a tone or mode; a point within this fraction of a
 * wavelength of a mode's pressure maximum (the engine's own defaults, passed explicitly).
 */
export const RISK_OPTIONS = { coincidencePercent: 3, nearMaximumWavelengths: 1 / 8 } as const;

export interface RiskContext {
  run: PlanRun;
  room: PlanRoom | null;
  input: RiskInput;
  /** The main path, one piece per engine segment, for mapping treatments back onto the drawing. */
  path: MainPathPiece[];
}

export function fanInput(run: PlanRun): FanInput | undefined {
  return run.fan ? { blades: run.fan.blades, rpm: run.fan.rpm } : undefined;
}

/** The run that feeds a room, with its chosen end moved to the room's outlet. Throws PlanError. */
function feedingRun(doc: PlanDocument, room: PlanRoom): { doc: PlanDocument; run: PlanRun } {
  const nodeId = room.outlet.nodeId;
  if (nodeId === null) throw new PlanError(`${room.name}: no run feeds it yet; choose the run end that is its outlet.`, { roomId: room.id });
  const run = runOfNode(doc, nodeId);
  if (!run) throw new PlanError(`${room.name}: its outlet point is not part of a run.`, { roomId: room.id });
  if (nodeId === run.startNodeId || nodeDegree(doc, nodeId) !== 1) throw new PlanError(`${room.name}: its outlet must be an open end of ${run.name}, not its start or a joint.`, { roomId: room.id });
  const fed = { ...run, endNodeId: nodeId };
  return { doc: { ...doc, runs: doc.runs.map((candidate) => (candidate.id === run.id ? fed : candidate)) }, run: fed };
}

/** A room (with the run feeding it), or a run that feeds no room. */
export type RiskTarget = { roomId: string } | { runId: string };

/** The risk input of a room or of a run alone. Throws PlanError when it cannot be built. */
export function riskContext(doc: PlanDocument, metresPerPixel: number, target: RiskTarget): RiskContext {
  if ('roomId' in target) {
    const room = findRoom(doc, target.roomId);
    if (!room) throw new PlanError(`There is no room with id "${target.roomId}".`, { roomId: target.roomId });
    const fed = feedingRun(doc, room);
    const { input: run, path } = toRunInputWithMap(fed.doc, fed.run.id, metresPerPixel);
    const roomInput = toRoomInput(room, fed.run.temperatureC);
    const input: RiskInput = { run, room: roomInput, fan: fanInput(fed.run), options: { ...RISK_OPTIONS }, ...(room.outletSoundPowerDb ? { outletSoundPowerDb: [...room.outletSoundPowerDb] } : {}) };
    return { run: fed.run, room, input, path };
  }
  const run = findRun(doc, target.runId);
  if (!run) throw new PlanError(`There is no run with id "${target.runId}".`, { runId: target.runId });
  const { input, path } = toRunInputWithMap(doc, run.id, metresPerPixel);
  return { run, room: null, input: { run: input, fan: fanInput(run), options: { ...RISK_OPTIONS } }, path };
}
