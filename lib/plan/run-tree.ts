// A valid run rooted at its start: children of each node and each segment's length in metres.
import { findRun, nodePositions, type PlanDocument, type PlanRun, type PlanSegment } from './document';
import { PlanError } from './errors';
import { segmentLengthM } from './geometry/length';
import { buildAdjacency, componentOf } from './graph';
import { validateRunTree, type RunProblem } from './topology';

export interface ChildLink {
  readonly segment: PlanSegment;
  readonly lengthM: number;
  readonly childNodeId: string;
}

export interface RunTree {
  readonly run: PlanRun;
  /** Children of each node away from the start, in document order of their segments. */
  readonly children: ReadonlyMap<string, readonly ChildLink[]>;
  /** Distance along the tree from the start, metres. */
  readonly distanceM: ReadonlyMap<string, number>;
  /** Longest distance from the node down to a leaf of its subtree, metres. */
  readonly reachM: ReadonlyMap<string, number>;
  /** Leaves other than the start, in document node order. */
  readonly leaves: readonly string[];
}

function throwProblem(run: PlanRun, problem: RunProblem): never {
  throw new PlanError(problem.message, { runId: run.id, nodeId: problem.nodeId, segmentId: problem.segmentId });
}

/** Roots the run at its start. Throws PlanError for any tree problem except the ones listed in `allow`. */
export function buildRunTree(doc: PlanDocument, runId: string, metresPerPixel: number, allow: readonly RunProblem['code'][] = []): RunTree {
  const run = findRun(doc, runId);
  if (!run) throw new PlanError(`There is no run with id "${runId}".`, { runId });
  if (!Number.isFinite(metresPerPixel) || metresPerPixel <= 0) throw new PlanError('Set the plan scale first (metres per pixel must be more than 0).', { runId });
  const blocking = validateRunTree(doc, runId).find((problem) => !allow.includes(problem.code));
  if (blocking) throwProblem(run, blocking);

  const positions = nodePositions(doc);
  const segmentsById = new Map(doc.segments.map((segment) => [segment.id, segment]));
  const adjacency = buildAdjacency(doc);
  const { segmentIds } = componentOf(adjacency, run.startNodeId);
  const order = new Map(doc.segments.map((segment, index) => [segment.id, index]));
  const children = new Map<string, ChildLink[]>();
  const distanceM = new Map<string, number>([[run.startNodeId, 0]]);
  const visitOrder: string[] = [];
  const stack = [run.startNodeId];
  while (stack.length > 0) {
    const nodeId = stack.pop() as string;
    visitOrder.push(nodeId);
    const links: ChildLink[] = [];
    for (const edge of adjacency.get(nodeId) ?? []) {
      if (distanceM.has(edge.otherNodeId)) continue;
      const segment = segmentsById.get(edge.segmentId) as PlanSegment;
      const from = positions.get(segment.from);
      const to = positions.get(segment.to);
      const lengthM = from && to ? segmentLengthM(from, to, metresPerPixel, segment.lengthOverrideM) : 0;
      if (!(lengthM > 0)) throw new PlanError(`${run.name}: a segment has zero length; move one of its ends or give it a length.`, { runId: run.id, segmentId: segment.id });
      distanceM.set(edge.otherNodeId, (distanceM.get(nodeId) ?? 0) + lengthM);
      links.push({ segment, lengthM, childNodeId: edge.otherNodeId });
      stack.push(edge.otherNodeId);
    }
    links.sort((a, b) => (order.get(a.segment.id) ?? 0) - (order.get(b.segment.id) ?? 0));
    children.set(nodeId, links);
  }
  const reachM = new Map<string, number>();
  for (const nodeId of [...visitOrder].reverse()) {
    const links = children.get(nodeId) ?? [];
    reachM.set(nodeId, links.reduce((longest, link) => Math.max(longest, link.lengthM + (reachM.get(link.childNodeId) ?? 0)), 0));
  }
  const leaves = doc.nodes.filter((node) => node.id !== run.startNodeId && distanceM.has(node.id) && (children.get(node.id) ?? []).length === 0).map((node) => node.id);
  if (segmentIds.size === 0 || leaves.length === 0) throw new PlanError(`${run.name} has no segments yet.`, { runId: run.id });
  return { run, children, distanceM, reachM, leaves };
}

/** The chosen end, or the leaf farthest from the start (first in document order on a tie). */
export function resolvedEndNodeId(tree: RunTree): string {
  if (tree.run.endNodeId !== null) return tree.run.endNodeId;
  return tree.leaves.reduce((best, leaf) => ((tree.distanceM.get(leaf) ?? 0) > (tree.distanceM.get(best) ?? 0) ? leaf : best));
}

export interface MainPathPiece {
  readonly segmentId: string;
  readonly fromNodeId: string;
  readonly toNodeId: string;
  readonly startM: number;
  readonly endM: number;
}

/** The main path from the start to the (resolved) end, with distances from the start. */
export function mainPathOf(tree: RunTree): { pieces: MainPathPiece[]; links: ChildLink[] } {
  const endNodeId = resolvedEndNodeId(tree);
  const parentLink = new Map<string, { parentNodeId: string; link: ChildLink }>();
  tree.children.forEach((links, parentNodeId) => links.forEach((link) => parentLink.set(link.childNodeId, { parentNodeId, link })));
  const links: ChildLink[] = [];
  const pieces: MainPathPiece[] = [];
  for (let nodeId = endNodeId; nodeId !== tree.run.startNodeId; ) {
    const parent = parentLink.get(nodeId);
    if (!parent) break;
    links.unshift(parent.link);
    pieces.unshift({
      segmentId: parent.link.segment.id,
      fromNodeId: parent.parentNodeId,
      toNodeId: nodeId,
      startM: tree.distanceM.get(parent.parentNodeId) ?? 0,
      endM: tree.distanceM.get(nodeId) ?? 0,
    });
    nodeId = parent.parentNodeId;
  }
  return { pieces, links };
}
