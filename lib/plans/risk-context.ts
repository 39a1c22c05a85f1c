// The engine's risk input for a run of the plan, alone or feeding a room. Resonances are properties
// of the whole run, so every flag about them uses the run as analysed for its results (its chosen
// end): one analysis, one set of numbers. Levels in a room follow the path to the room's outlet, and
// the outlet sound power is taken as given for the plan without its chosen treatments, so a chosen
// lining on that path is credited exactly as it was when it was offered.
import type { FanInput, RiskInput, RunInput } from '@/lib/acoustic';
import { findRoom, findRun, type PlanDocument, type PlanRun } from '@/lib/plan/document';
import { PlanError } from '@/lib/plan/errors';
import { toRoomInput } from '@/lib/plan/rooms/room-input';
import type { PlanRoom } from '@/lib/plan/rooms/room-types';
import { toRunInputWithMap, type MainPathPiece } from '@/lib/plan/to-run-input';
import { nodeDegree, runOfNode } from '@/lib/plan/topology';
import { runFan } from '@/lib/plan/shared-fan';
import { withoutTreatmentChanges } from './analysis/baseline';

/**
 * The rules the plan's flags use, stated in the risk list: the supply air's swing either side of the
 * run's temperature, °C; the fan's belt slip when no speed range is entered, percent; a point within this
 * fraction of a wavelength of a mode's pressure maximum (the engine's own defaults, passed explicitly).
 */
export const RISK_OPTIONS = { temperatureSwingC: 5, speedSlipPercent: 2, nearMaximumWavelengths: 1 / 8 } as const;

export interface LevelContext {
  /** The run ending at the room's outlet, the room, the outlet sound power and the baseline run it was given for. */
  input: RiskInput;
  path: MainPathPiece[];
}

export interface RiskContext {
  run: PlanRun;
  room: PlanRoom | null;
  /** The run as analysed for its results, with its fan and the room (resonance flags). */
  input: RiskInput;
  /** The main path of input.run, one piece per engine segment, for mapping treatments onto the drawing. */
  path: MainPathPiece[];
  /** Level flags: present when the room has an outlet sound power. */
  level: LevelContext | null;
}

/** The run's fan, or the fan of the run whose fan it shares. */
export function fanInput(doc: PlanDocument, run: PlanRun): FanInput | undefined {
  const fan = runFan(doc, run).fan;
  return fan ? { blades: fan.blades, rpm: fan.rpm, minRpm: fan.minRpm ?? null, maxRpm: fan.maxRpm ?? null } : undefined;
}

/** The run that feeds a room through its first outlet. Throws PlanError. */
export function feedingRun(doc: PlanDocument, room: PlanRoom): { run: PlanRun; outletNodeId: string } {
  return runFeedingOutlet(doc, room, room.outlet.nodeId);
}

/** The run whose open end nodeId is an outlet of the room. Throws PlanError saying what is wrong. */
export function runFeedingOutlet(doc: PlanDocument, room: PlanRoom, nodeId: string | null): { run: PlanRun; outletNodeId: string } {
  if (nodeId === null) throw new PlanError(`${room.name}: no run feeds it yet; choose the run end that is its outlet.`, { roomId: room.id });
  const run = runOfNode(doc, nodeId);
  if (!run) throw new PlanError(`${room.name}: its outlet point is not part of a run.`, { roomId: room.id });
  if (nodeId === run.startNodeId || nodeDegree(doc, nodeId) !== 1) throw new PlanError(`${room.name}: its outlet must be an open end of ${run.name}, not its start or a joint.`, { roomId: room.id });
  return { run, outletNodeId: nodeId };
}

/** The run's input with its end moved to the given leaf. */
function toOutlet(doc: PlanDocument, run: PlanRun, outletNodeId: string, metresPerPixel: number): { input: RunInput; path: MainPathPiece[] } {
  const moved = { ...doc, runs: doc.runs.map((candidate) => (candidate.id === run.id ? { ...run, endNodeId: outletNodeId } : candidate)) };
  return toRunInputWithMap(moved, run.id, metresPerPixel);
}

/** A room (with the run feeding it), or a run that feeds no room. */
export type RiskTarget = { roomId: string } | { runId: string };

/** The risk input of a room or of a run alone. Throws PlanError when it cannot be built. */
export function riskContext(doc: PlanDocument, metresPerPixel: number, target: RiskTarget): RiskContext {
  if ('roomId' in target) {
    const room = findRoom(doc, target.roomId);
    if (!room) throw new PlanError(`There is no room with id "${target.roomId}".`, { roomId: target.roomId });
    const { run, outletNodeId } = feedingRun(doc, room);
    const { input: runInput, path } = toRunInputWithMap(doc, run.id, metresPerPixel);
    const roomInput = toRoomInput(room, run.temperatureC);
    const input: RiskInput = { run: runInput, room: roomInput, fan: fanInput(doc, run), options: { ...RISK_OPTIONS } };
    let level: LevelContext | null = null;
    if (room.outletSoundPowerDb) {
      const outlet = toOutlet(doc, run, outletNodeId, metresPerPixel);
      const baselineDoc = withoutTreatmentChanges(doc);
      const baselineRun = baselineDoc === doc ? outlet.input : toOutlet(baselineDoc, run, outletNodeId, metresPerPixel).input;
      level = { input: { run: outlet.input, room: roomInput, outletSoundPowerDb: [...room.outletSoundPowerDb], baselineRun, options: { ...RISK_OPTIONS } }, path: outlet.path };
    }
    return { run, room, input, path, level };
  }
  const run = findRun(doc, target.runId);
  if (!run) throw new PlanError(`There is no run with id "${target.runId}".`, { runId: target.runId });
  const { input, path } = toRunInputWithMap(doc, run.id, metresPerPixel);
  return { run, room: null, input: { run: input, fan: fanInput(doc, run), options: { ...RISK_OPTIONS } }, path, level: null };
}

/** The input and path a flag of this kind is measured and treated on. */
export function contextFor(context: RiskContext, kind: string): { input: RiskInput; path: MainPathPiece[] } {
  return kind === 'level-above-criterion' && context.level ? context.level : { input: context.input, path: context.path };
}
