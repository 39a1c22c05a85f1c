// Split a segment at a point: a new node on it and two segments with the same section and lining.
// A length override is shared between the halves in proportion to their drawn lengths.
import { findNode, findSegment, type PlanDocument, type PlanSegment } from '../document';
import type { EditorState } from '../editor-state';
import { PlanError } from '../errors';
import { projectOntoSegment } from '../geometry/hit-test';
import type { Point } from '../geometry/point';
import type { IdGenerator } from '../ids';
import { defineCommand, type CommandResult } from './define';
import { requireOnPlan } from './plan-limits';

export interface SplitSegmentArgs {
  readonly segmentId: string;
  /** Projected onto the segment. */
  readonly at: Point;
}

/** Closest a split may come to either end, as a fraction of the segment. */
const MIN_SPLIT_FRACTION = 1e-6;

export function splitSegmentEdit(doc: PlanDocument, state: EditorState, args: SplitSegmentArgs, newId: IdGenerator): CommandResult & { nodeId: string } {
  const segment = findSegment(doc, args.segmentId);
  if (!segment) throw new PlanError(`There is no segment with id "${args.segmentId}".`, { segmentId: args.segmentId });
  const from = findNode(doc, segment.from);
  const to = findNode(doc, segment.to);
  if (!from || !to) throw new PlanError('That segment has lost one of its ends.', { segmentId: segment.id });
  requireOnPlan(args.at);
  const { t, closest } = projectOntoSegment(args.at, from, to);
  if (t <= MIN_SPLIT_FRACTION || t >= 1 - MIN_SPLIT_FRACTION) throw new PlanError('Split inside the segment, away from its ends.', { segmentId: segment.id });
  const node = { id: newId(), x: closest.x, y: closest.y };
  const override = segment.lengthOverrideM ?? null;
  const first: PlanSegment = { ...segment, to: node.id, lengthOverrideM: override === null ? segment.lengthOverrideM : override * t };
  const second: PlanSegment = { ...segment, id: newId(), from: node.id, lengthOverrideM: override === null ? segment.lengthOverrideM : override * (1 - t) };
  const segments = doc.segments.flatMap((candidate) => (candidate.id === segment.id ? [first, second] : [candidate]));
  return {
    doc: { ...doc, nodes: [...doc.nodes, node], segments },
    state: { ...state, selection: { nodeIds: [node.id], segmentIds: [] } },
    nodeId: node.id,
  };
}

export const splitSegment = defineCommand('split-segment', 'Split the segment at a point into two with the same section and lining.', (doc, state, args: SplitSegmentArgs, newId) => {
  const split = splitSegmentEdit(doc, state, args, newId);
  return { doc: split.doc, state: split.state };
});
