// Keeps a document consistent after an edit: no dangling segments or lone nodes, one run per
// drawn tree (a tree without a run gets one), terminations exactly at each run's start and leaves,
// the chosen end a leaf, every run lettered and every segment numbered (labels/), and the editor
// selection pointing at things that exist.
import { DEFAULT_END_TERMINATION, DEFAULT_START_TERMINATION, DEFAULT_TEMPERATURE_C, type PlanDocument, type PlanRun, type Termination } from './document';
import type { EditorState } from './editor-state';
import { buildAdjacency, componentOf, components, degreeIn, type Adjacency, type Component } from './graph';
import type { IdGenerator } from './ids';
import { assignLabels } from './labels/assign';

/** "Run N" with the lowest N not already taken. */
export function nextRunName(runs: readonly PlanRun[]): string {
  const taken = new Set(runs.map((run) => run.name));
  let number = runs.length + 1;
  while (taken.has(`Run ${number}`)) number += 1;
  return `Run ${number}`;
}

function dropDanglingGeometry(doc: PlanDocument): PlanDocument {
  const nodeIds = new Set(doc.nodes.map((node) => node.id));
  const segments = doc.segments.filter((segment) => segment.from !== segment.to && nodeIds.has(segment.from) && nodeIds.has(segment.to));
  const used = new Set(segments.flatMap((segment) => [segment.from, segment.to]));
  const nodes = doc.nodes.filter((node) => used.has(node.id));
  return nodes.length === doc.nodes.length && segments.length === doc.segments.length ? doc : { ...doc, nodes, segments };
}

function terminationsFor(run: PlanRun, component: Component, adjacency: Adjacency, orphaned: ReadonlyMap<string, Termination>): Record<string, Termination> {
  const terminations: Record<string, Termination> = {};
  for (const nodeId of component.nodeIds) {
    const isStart = nodeId === run.startNodeId;
    if (!isStart && degreeIn(adjacency, nodeId) !== 1) continue;
    terminations[nodeId] = run.terminations[nodeId] ?? orphaned.get(nodeId) ?? (isStart ? DEFAULT_START_TERMINATION : DEFAULT_END_TERMINATION);
  }
  return terminations;
}

/** A tree left without a run (e.g. cut off by a deletion) gets a run starting at its first closed leaf, else its first leaf. */
function runForOrphanTree(doc: PlanDocument, component: Component, adjacency: Adjacency, orphaned: ReadonlyMap<string, Termination>, runs: readonly PlanRun[], newId: IdGenerator): PlanRun {
  const leaves = doc.nodes.filter((node) => component.nodeIds.has(node.id) && degreeIn(adjacency, node.id) === 1).map((node) => node.id);
  const candidates = leaves.length > 0 ? leaves : [...component.nodeIds];
  const startNodeId = candidates.find((nodeId) => orphaned.get(nodeId)?.kind === 'closed') ?? candidates[0];
  return { id: newId(), name: nextRunName(runs), startNodeId, endNodeId: null, temperatureC: DEFAULT_TEMPERATURE_C, fan: null, terminations: {} };
}

export function normalizeDocument(input: PlanDocument, newId: IdGenerator): PlanDocument {
  const doc = dropDanglingGeometry(input);
  const adjacency = buildAdjacency(doc);
  const orphaned = new Map<string, Termination>();
  const claimed = new Set<string>();
  const kept: { run: PlanRun; component: Component }[] = [];
  for (const run of doc.runs) {
    const component = adjacency.has(run.startNodeId) ? componentOf(adjacency, run.startNodeId) : null;
    const alreadyClaimed = component !== null && [...component.nodeIds].some((nodeId) => claimed.has(nodeId));
    if (component === null || component.segmentIds.size === 0 || alreadyClaimed) {
      Object.entries(run.terminations).forEach(([nodeId, termination]) => orphaned.set(nodeId, termination));
      continue;
    }
    component.nodeIds.forEach((nodeId) => claimed.add(nodeId));
    Object.entries(run.terminations).forEach(([nodeId, termination]) => {
      if (!component.nodeIds.has(nodeId)) orphaned.set(nodeId, termination);
    });
    kept.push({ run, component });
  }
  for (const component of components(doc, adjacency)) {
    const [anyNode] = component.nodeIds;
    if (claimed.has(anyNode)) continue;
    const run = runForOrphanTree(doc, component, adjacency, orphaned, kept.map((entry) => entry.run), newId);
    component.nodeIds.forEach((nodeId) => claimed.add(nodeId));
    kept.push({ run, component });
  }
  const runs = kept.map(({ run, component }) => {
    const terminations = terminationsFor(run, component, adjacency, orphaned);
    const endValid = run.endNodeId !== null && run.endNodeId !== run.startNodeId && component.nodeIds.has(run.endNodeId) && degreeIn(adjacency, run.endNodeId) === 1;
    return { ...run, endNodeId: endValid ? run.endNodeId : null, terminations };
  });
  return assignLabels({ ...doc, runs, rooms: unlinkMissingOutlets(doc) });
}

/** A room whose outlet point was deleted keeps that outlet's place in the room but feeds it from no run (every outlet alike). */
function unlinkMissingOutlets(doc: PlanDocument): PlanDocument['rooms'] {
  const nodeIds = new Set(doc.nodes.map((node) => node.id));
  const missing = (nodeId: string | null) => nodeId !== null && !nodeIds.has(nodeId);
  const stale = doc.rooms.some((room) => missing(room.outlet.nodeId) || (room.extraOutlets ?? []).some((outlet) => missing(outlet.nodeId)));
  if (!stale) return doc.rooms;
  return doc.rooms.map((room) => {
    const extraOutlets = room.extraOutlets?.map((outlet) => (missing(outlet.nodeId) ? { ...outlet, nodeId: null } : outlet));
    return {
      ...room,
      outlet: missing(room.outlet.nodeId) ? { ...room.outlet, nodeId: null } : room.outlet,
      ...(extraOutlets ? { extraOutlets } : {}),
    };
  });
}

/** Drops selected ids that no longer exist and an active run that is gone. */
export function normalizeState(doc: PlanDocument, state: EditorState): EditorState {
  const nodeIds = new Set(doc.nodes.map((node) => node.id));
  const segmentIds = new Set(doc.segments.map((segment) => segment.id));
  const activeRunId = state.activeRunId !== null && doc.runs.some((run) => run.id === state.activeRunId) ? state.activeRunId : null;
  return {
    selection: { nodeIds: state.selection.nodeIds.filter((id) => nodeIds.has(id)), segmentIds: state.selection.segmentIds.filter((id) => segmentIds.has(id)) },
    activeRunId,
  };
}
