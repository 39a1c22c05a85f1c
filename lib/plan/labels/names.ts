// The labels people see for a plan's pieces, derived from the stable run letters and segment
// numbers: segment "A3"; the run's start "A start"; a leaf "A4 end" (after the segment that ends
// there); a tee "A2 tee" (at the far end of the segment that feeds it); a plain joint "A2/A3".
import type { PlanDocument } from '../document';
import { buildAdjacency, componentOf } from '../graph';
import { assignLabels } from './assign';

export interface PlanLabels {
  /** Run id → letter. */
  readonly runs: Readonly<Record<string, string>>;
  /** Segment id → label such as "A3". */
  readonly segments: Readonly<Record<string, string>>;
  /** Node id → label of the end, tee or joint. */
  readonly nodes: Readonly<Record<string, string>>;
}

/** Labels of every run, segment and node; documents saved before labels existed get the ones the editor would give. */
export function planLabels(input: PlanDocument): PlanLabels {
  const doc = assignLabels(input);
  const adjacency = buildAdjacency(doc);
  const runs: Record<string, string> = {};
  const segments: Record<string, string> = {};
  const nodes: Record<string, string> = {};
  const segmentsById = new Map(doc.segments.map((segment) => [segment.id, segment]));
  for (const run of doc.runs) {
    const letter = run.letter ?? '?';
    runs[run.id] = letter;
    if (!adjacency.has(run.startNodeId)) continue;
    const { segmentIds } = componentOf(adjacency, run.startNodeId);
    for (const id of segmentIds) segments[id] = `${letter}${segmentsById.get(id)?.number ?? '?'}`;
    // walk from the start so each node knows the segment that reaches it
    const reachedBy = new Map<string, string>();
    const seen = new Set([run.startNodeId]);
    const stack = [run.startNodeId];
    while (stack.length > 0) {
      const nodeId = stack.pop() as string;
      for (const edge of adjacency.get(nodeId) ?? []) {
        if (seen.has(edge.otherNodeId)) continue;
        seen.add(edge.otherNodeId);
        reachedBy.set(edge.otherNodeId, edge.segmentId);
        stack.push(edge.otherNodeId);
      }
    }
    nodes[run.startNodeId] = `${letter} start`;
    for (const [nodeId, segmentId] of reachedBy) {
      const feeding = segments[segmentId];
      const onward = (adjacency.get(nodeId) ?? []).filter((edge) => edge.segmentId !== segmentId).map((edge) => segments[edge.segmentId]);
      if (onward.length === 0) nodes[nodeId] = `${feeding} end`;
      else if (onward.length === 1) nodes[nodeId] = `${feeding}/${onward[0]}`;
      else nodes[nodeId] = `${feeding} tee`;
    }
  }
  return { runs, segments, nodes };
}

/** A segment's label, or a plain fallback for an id the labels do not know. */
export function segmentLabelOf(labels: PlanLabels, segmentId: string): string {
  return labels.segments[segmentId] ?? 'a segment no longer on the plan';
}

/** An end's, tee's or joint's label, or a plain fallback. */
export function nodeLabelOf(labels: PlanLabels, nodeId: string): string {
  return labels.nodes[nodeId] ?? 'a point no longer on the plan';
}
