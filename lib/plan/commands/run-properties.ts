// Run-level edits: a termination at an end, name, temperature and fan, and the chosen end.
import { findRun, type Fan, type PlanDocument, type PlanRun, type Termination, type Wall } from '../document';
import type { EditorState } from '../editor-state';
import { PlanError } from '../errors';
import { fanSchema, runNameSchema, temperatureCSchema, terminationSchema, wallSchema } from '../schema';
import { nodeDegree, runOfNode } from '../topology';
import { checked, defineCommand } from './define';
import { soundPowerBandsSchema } from '../rooms/room-schema';
import { renumberRun } from '../labels/renumber';
import { buildRunTree, resolvedEndNodeId } from '../run-tree';

function replaceRun(doc: PlanDocument, run: PlanRun): PlanDocument {
  return { ...doc, runs: doc.runs.map((candidate) => (candidate.id === run.id ? run : candidate)) };
}

function targetRun(doc: PlanDocument, state: EditorState, runId: string | undefined): PlanRun {
  const id = runId ?? state.activeRunId;
  if (id === null) throw new PlanError('Choose a run first.');
  const run = findRun(doc, id);
  if (!run) throw new PlanError(`There is no run with id "${id}".`, { runId: id });
  return run;
}

export interface SetTerminationArgs {
  readonly nodeId: string;
  readonly termination: Termination;
}

export const setTermination = defineCommand('set-termination', 'Set how an end of the run is terminated: closed, open, lined or anechoic.', (doc, state, args: SetTerminationArgs) => {
  const run = runOfNode(doc, args.nodeId);
  if (!run) throw new PlanError('That point is not part of a run.', { nodeId: args.nodeId });
  if (args.nodeId !== run.startNodeId && nodeDegree(doc, args.nodeId) !== 1) throw new PlanError('Only an end of the run takes a termination; this point joins segments.', { nodeId: args.nodeId });
  const termination = checked(terminationSchema, args.termination, 'Termination');
  return { doc: replaceRun(doc, { ...run, terminations: { ...run.terminations, [args.nodeId]: termination } }), state: { ...state, activeRunId: run.id } };
});

/** The run whose fan another shares: another run of the plan with a fan of its own. Throws PlanError. */
function sharedFanOwner(doc: PlanDocument, run: PlanRun, ownerId: string | null): string | null {
  if (ownerId === null) return null;
  const owner = findRun(doc, ownerId);
  if (!owner || owner.id === run.id) throw new PlanError('Choose another run of this plan whose fan this run shares.', { runId: run.id });
  if (owner.fanOfRunId != null) throw new PlanError(`${owner.name} itself shares the fan of another run; choose that run.`, { runId: run.id });
  if (doc.runs.some((other) => other.fanOfRunId === run.id)) throw new PlanError(`Other runs share the fan of ${run.name}; it keeps its own fan.`, { runId: run.id });
  return owner.id;
}

export interface SetRunPropertiesArgs {
  /** Default: the active run. */
  readonly runId?: string;
  readonly name?: string;
  readonly temperatureC?: number;
  readonly fan?: Fan | null;
  /** The run whose fan this run shares; null: its own fan. */
  readonly fanOfRunId?: string | null;
  /** The walls of the run's segments; null: sheet metal. */
  readonly walls?: Wall | null;
  /** The fan's sound power into the run, 8 octave bands, dB re 1 pW; null clears it. */
  readonly fanSoundPowerDb?: readonly number[] | null;
}

export const setRunProperties = defineCommand('set-run-properties', 'Rename the run, or set its air temperature, walls, fan or fan sound power.', (doc, state, args: SetRunPropertiesArgs) => {
  const run = targetRun(doc, state, args.runId);
  const changed: PlanRun = {
    ...run,
    ...(args.name !== undefined ? { name: checked(runNameSchema, args.name, 'Name') } : {}),
    ...(args.temperatureC !== undefined ? { temperatureC: checked(temperatureCSchema, args.temperatureC, 'Air temperature') } : {}),
    ...(args.fan !== undefined ? { fan: args.fan === null ? null : checked(fanSchema, args.fan, 'Fan') } : {}),
    ...(args.fanOfRunId !== undefined ? { fanOfRunId: sharedFanOwner(doc, run, args.fanOfRunId) } : {}),
    ...(args.walls !== undefined ? { walls: args.walls === null ? null : checked(wallSchema, args.walls, 'Walls') } : {}),
    ...(args.fanSoundPowerDb !== undefined ? { fanSoundPowerDb: args.fanSoundPowerDb === null ? null : checked(soundPowerBandsSchema, args.fanSoundPowerDb, "Fan's sound power") } : {}),
  };
  return { doc: replaceRun(doc, changed), state };
});

export interface ChooseEndArgs {
  /** Default: the run of the node. */
  readonly runId?: string;
  /** null: the farthest end from the start. */
  readonly nodeId: string | null;
}

export const chooseEnd = defineCommand('choose-end', "Choose which open end is the run's end for the results.", (doc, state, args: ChooseEndArgs) => {
  const run = args.runId !== undefined || args.nodeId === null ? targetRun(doc, state, args.runId) : runOfNode(doc, args.nodeId);
  if (!run) throw new PlanError('That point is not part of a run.', { nodeId: args.nodeId ?? undefined });
  if (args.nodeId !== null) {
    if (runOfNode(doc, args.nodeId)?.id !== run.id) throw new PlanError(`That point is not part of ${run.name}.`, { nodeId: args.nodeId, runId: run.id });
    if (args.nodeId === run.startNodeId || nodeDegree(doc, args.nodeId) !== 1) throw new PlanError('Choose an end of the run other than its start.', { nodeId: args.nodeId, runId: run.id });
  }
  return { doc: replaceRun(doc, { ...run, endNodeId: args.nodeId }), state: { ...state, activeRunId: run.id } };
});

export interface RenumberRunArgs {
  /** Default: the active run. */
  readonly runId?: string;
}

/** The run's end for numbering: the chosen end, else the farthest leaf (found without the scale: by drawn length). */
function numberingEnd(doc: PlanDocument, run: PlanRun): string | null {
  if (run.endNodeId !== null) return run.endNodeId;
  try {
    return resolvedEndNodeId(buildRunTree(doc, run.id, 1, ['missing-termination', 'cycle', 'shared-tree', 'start-not-leaf']));
  } catch {
    return null;
  }
}

export const renumberRunCommand = defineCommand('renumber-run', "Number the run's segments 1, 2, … again from its start, along the path to its end first.", (doc, state, args: RenumberRunArgs) => {
  const run = targetRun(doc, state, args.runId);
  return { doc: renumberRun(doc, run.id, numberingEnd(doc, run)), state };
});
