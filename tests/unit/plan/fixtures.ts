import { emptyDocument, initialEditorState, performCommand, sequentialIds, type CommandResult, type EditorState, type IdGenerator, type PlanDocument } from '@/lib/plan';

export interface Point {
  x: number;
  y: number;
}

/** Draws a chain through the points (a new run from empty space), with deterministic ids. */
export function drawChain(points: Point[], newId: IdGenerator = sequentialIds('n'), start: CommandResult = { doc: emptyDocument(), state: initialEditorState() }): CommandResult & { nodeIds: string[] } {
  let result = performCommand('draw-segment', start.doc, start.state, { from: { point: points[0] }, to: { point: points[1] } }, newId);
  const nodeIds = [segmentEnd(result, 'from'), segmentEnd(result, 'to')];
  for (const point of points.slice(2)) {
    result = performCommand('draw-segment', result.doc, result.state, { from: { nodeId: nodeIds[nodeIds.length - 1] }, to: { point } }, newId);
    nodeIds.push(segmentEnd(result, 'to'));
  }
  return { ...result, nodeIds };
}

/** The end of the segment just drawn (the selected one). */
export function segmentEnd(result: { doc: PlanDocument; state: EditorState }, end: 'from' | 'to'): string {
  const segmentId = result.state.selection.segmentIds[0];
  const segment = result.doc.segments.find((candidate) => candidate.id === segmentId);
  if (!segment) throw new Error('no segment selected');
  return segment[end];
}

export function nodeAt(doc: PlanDocument, x: number, y: number): string {
  const node = doc.nodes.find((candidate) => Math.abs(candidate.x - x) < 1e-9 && Math.abs(candidate.y - y) < 1e-9);
  if (!node) throw new Error(`no node at ${x},${y}`);
  return node.id;
}
