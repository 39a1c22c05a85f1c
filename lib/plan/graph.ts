// The plan as an undirected graph: adjacency and connected components.
import type { PlanDocument } from './document';

export interface Edge {
  readonly segmentId: string;
  readonly otherNodeId: string;
}

export type Adjacency = ReadonlyMap<string, readonly Edge[]>;

export function buildAdjacency(doc: PlanDocument): Adjacency {
  const adjacency = new Map<string, Edge[]>(doc.nodes.map((node) => [node.id, []]));
  for (const segment of doc.segments) {
    adjacency.get(segment.from)?.push({ segmentId: segment.id, otherNodeId: segment.to });
    adjacency.get(segment.to)?.push({ segmentId: segment.id, otherNodeId: segment.from });
  }
  return adjacency;
}

export interface Component {
  readonly nodeIds: ReadonlySet<string>;
  readonly segmentIds: ReadonlySet<string>;
}

/** Everything connected to the node (just the node when it has no segments). */
export function componentOf(adjacency: Adjacency, nodeId: string): Component {
  const nodeIds = new Set<string>([nodeId]);
  const segmentIds = new Set<string>();
  const stack = [nodeId];
  while (stack.length > 0) {
    const current = stack.pop() as string;
    for (const edge of adjacency.get(current) ?? []) {
      segmentIds.add(edge.segmentId);
      if (!nodeIds.has(edge.otherNodeId)) {
        nodeIds.add(edge.otherNodeId);
        stack.push(edge.otherNodeId);
      }
    }
  }
  return { nodeIds, segmentIds };
}

/** Every connected component that has at least one segment, in node order. */
export function components(doc: PlanDocument, adjacency: Adjacency = buildAdjacency(doc)): Component[] {
  const seen = new Set<string>();
  const found: Component[] = [];
  for (const node of doc.nodes) {
    if (seen.has(node.id)) continue;
    const component = componentOf(adjacency, node.id);
    component.nodeIds.forEach((id) => seen.add(id));
    if (component.segmentIds.size > 0) found.push(component);
  }
  return found;
}

export function degreeIn(adjacency: Adjacency, nodeId: string): number {
  return adjacency.get(nodeId)?.length ?? 0;
}
