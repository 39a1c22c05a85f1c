// Renumbering a run on request: segments numbered 1, 2, … from the start along the path to the
// chosen end (or the farthest leaf), then the side branches in the order they leave it.
import type { PlanDocument } from '../document';
import { buildAdjacency } from '../graph';
import { findRun } from '../document';
import { PlanError } from '../errors';

/** Depth-first from the start, the child on the way to the end first, others in document order. */
export function renumberRun(doc: PlanDocument, runId: string, endNodeId: string | null): PlanDocument {
  const run = findRun(doc, runId);
  if (!run) throw new PlanError(`There is no run with id "${runId}".`, { runId });
  const adjacency = buildAdjacency(doc);
  const order = new Map(doc.segments.map((segment, index) => [segment.id, index]));
  const parent = new Map<string, string>();
  const seen = new Set([run.startNodeId]);
  const queue = [run.startNodeId];
  for (let head = 0; head < queue.length; head += 1) {
    for (const edge of adjacency.get(queue[head]) ?? []) {
      if (seen.has(edge.otherNodeId)) continue;
      seen.add(edge.otherNodeId);
      parent.set(edge.otherNodeId, queue[head]);
      queue.push(edge.otherNodeId);
    }
  }
  const onPath = new Set<string>();
  for (let node = endNodeId ?? run.endNodeId; node && parent.has(node); node = parent.get(node) ?? null) onPath.add(node);
  const numbers = new Map<string, number>();
  const visited = new Set([run.startNodeId]);
  const visit = (nodeId: string): void => {
    const edges = [...(adjacency.get(nodeId) ?? [])]
      .filter((edge) => !visited.has(edge.otherNodeId))
      .sort((a, b) => Number(onPath.has(b.otherNodeId)) - Number(onPath.has(a.otherNodeId)) || (order.get(a.segmentId) ?? 0) - (order.get(b.segmentId) ?? 0));
    for (const edge of edges) {
      if (visited.has(edge.otherNodeId)) continue;
      visited.add(edge.otherNodeId);
      numbers.set(edge.segmentId, numbers.size + 1);
      visit(edge.otherNodeId);
    }
  };
  visit(run.startNodeId);
  return { ...doc, segments: doc.segments.map((segment) => (numbers.has(segment.id) ? { ...segment, number: numbers.get(segment.id) } : segment)) };
}
