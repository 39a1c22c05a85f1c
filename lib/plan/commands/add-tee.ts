// Add a tee: split a segment at a point and draw a branch from the new node.
import type { Point } from '../geometry/point';
import { defineCommand } from './define';
import { drawSegmentEdit, type NodeRef } from './draw-segment';
import { splitSegmentEdit } from './split-segment';
import type { Section } from '../document';

export interface AddTeeArgs {
  readonly segmentId: string;
  /** Where the tee sits, projected onto the segment. */
  readonly at: Point;
  /** The far end of the branch's first segment. */
  readonly to: NodeRef;
  /** Default: the section of the segment split. */
  readonly section?: Section;
}

export const addTee = defineCommand('add-tee', 'Add a tee on the segment and draw its branch.', (doc, state, args: AddTeeArgs, newId) => {
  const split = splitSegmentEdit(doc, state, { segmentId: args.segmentId, at: args.at }, newId);
  return drawSegmentEdit(split.doc, split.state, { from: { nodeId: split.nodeId }, to: args.to, section: args.section }, newId);
});
