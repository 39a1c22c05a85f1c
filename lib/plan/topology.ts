// Runs are trees: a run is everything connected to its start node.
import { findRun, type PlanDocument, type PlanRun, type PlanSegment } from './document';
import { buildAdjacency, componentOf, degreeIn, type Component } from './graph';

export function runComponent(doc: PlanDocument, run: PlanRun): Component {
  return componentOf(buildAdjacency(doc), run.startNodeId);
}

/** The run whose tree holds the node, or null. */
export function runOfNode(doc: PlanDocument, nodeId: string): PlanRun | null {
  const adjacency = buildAdjacency(doc);
  return doc.runs.find((run) => componentOf(adjacency, run.startNodeId).nodeIds.has(nodeId)) ?? null;
}

/** The run whose tree holds the segment, or null. */
export function runOfSegment(doc: PlanDocument, segmentId: string): PlanRun | null {
  const segment = doc.segments.find((candidate) => candidate.id === segmentId);
  return segment ? runOfNode(doc, segment.from) : null;
}

/** The run's segments, in document order. */
export function runSegments(doc: PlanDocument, runId: string): PlanSegment[] {
  const run = findRun(doc, runId);
  if (!run) return [];
  const { segmentIds } = runComponent(doc, run);
  return doc.segments.filter((segment) => segmentIds.has(segment.id));
}

export function nodeDegree(doc: PlanDocument, nodeId: string): number {
  return degreeIn(buildAdjacency(doc), nodeId);
}

/** Nodes of the run with exactly one segment (the start included when it is one), in document order. */
export function runLeaves(doc: PlanDocument, runId: string): string[] {
  const run = findRun(doc, runId);
  if (!run) return [];
  const adjacency = buildAdjacency(doc);
  const { nodeIds } = componentOf(adjacency, run.startNodeId);
  return doc.nodes.filter((node) => nodeIds.has(node.id) && degreeIn(adjacency, node.id) === 1).map((node) => node.id);
}

export interface PathStep {
  readonly segmentId: string;
  readonly fromNodeId: string;
  readonly toNodeId: string;
}

/** The tree path between two nodes as oriented segment steps ([] when equal), or null when not connected. */
export function pathBetween(doc: PlanDocument, fromNodeId: string, toNodeId: string): PathStep[] | null {
  const adjacency = buildAdjacency(doc);
  if (!adjacency.has(fromNodeId) || !adjacency.has(toNodeId)) return null;
  const arrivedBy = new Map<string, PathStep | null>([[fromNodeId, null]]);
  const queue = [fromNodeId];
  for (let head = 0; head < queue.length && !arrivedBy.has(toNodeId); head += 1) {
    const current = queue[head];
    for (const edge of adjacency.get(current) ?? []) {
      if (arrivedBy.has(edge.otherNodeId)) continue;
      arrivedBy.set(edge.otherNodeId, { segmentId: edge.segmentId, fromNodeId: current, toNodeId: edge.otherNodeId });
      queue.push(edge.otherNodeId);
    }
  }
  if (!arrivedBy.has(toNodeId)) return null;
  const steps: PathStep[] = [];
  for (let step = arrivedBy.get(toNodeId); step; step = arrivedBy.get(step.fromNodeId)) steps.unshift(step);
  return steps;
}

export type RunProblemCode = 'no-run' | 'no-segments' | 'cycle' | 'shared-tree' | 'disconnected' | 'start-not-leaf' | 'end-not-leaf' | 'missing-termination';

export interface RunProblem {
  readonly code: RunProblemCode;
  readonly message: string;
  readonly nodeId?: string;
  readonly segmentId?: string;
}

/** Everything that keeps the run from being analysed, in plain words; [] when it is a valid tree. */
export function validateRunTree(doc: PlanDocument, runId: string): RunProblem[] {
  const run = findRun(doc, runId);
  if (!run) return [{ code: 'no-run', message: `There is no run with id "${runId}".` }];
  const adjacency = buildAdjacency(doc);
  if (!adjacency.has(run.startNodeId)) return [{ code: 'disconnected', message: `${run.name}: its start point no longer exists.` }];
  const { nodeIds, segmentIds } = componentOf(adjacency, run.startNodeId);
  const problems: RunProblem[] = [];
  if (segmentIds.size === 0) return [{ code: 'no-segments', message: `${run.name} has no segments yet.`, nodeId: run.startNodeId }];
  if (segmentIds.size >= nodeIds.size) problems.push({ code: 'cycle', message: `${run.name} closes a loop; a duct run must branch like a tree, so delete one segment of the loop.` });
  const other = doc.runs.find((candidate) => candidate.id !== run.id && nodeIds.has(candidate.startNodeId));
  if (other) problems.push({ code: 'shared-tree', message: `${run.name} and ${other.name} are connected; join them into one run or delete one of them.`, nodeId: other.startNodeId });
  if (degreeIn(adjacency, run.startNodeId) !== 1) problems.push({ code: 'start-not-leaf', message: `${run.name}: the start has a tee right at it; the start must be the end of a single segment.`, nodeId: run.startNodeId });
  if (run.endNodeId !== null) {
    if (!nodeIds.has(run.endNodeId)) problems.push({ code: 'disconnected', message: `${run.name}: the chosen end is not connected to the start.`, nodeId: run.endNodeId });
    else if (run.endNodeId === run.startNodeId || degreeIn(adjacency, run.endNodeId) !== 1) problems.push({ code: 'end-not-leaf', message: `${run.name}: the chosen end must be an open end of the run other than its start.`, nodeId: run.endNodeId });
  }
  const terminationNodes = doc.nodes.filter((node) => nodeIds.has(node.id) && (node.id === run.startNodeId || degreeIn(adjacency, node.id) === 1));
  for (const node of terminationNodes) {
    if (!run.terminations[node.id]) problems.push({ code: 'missing-termination', message: `${run.name}: one end has no termination; choose closed, open, lined or anechoic.`, nodeId: node.id });
  }
  return problems;
}
