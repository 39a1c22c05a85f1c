// Move a node (a segment end or a tee) to a new position on the plan. A room's outlet fed from
// that end moves with it (to the nearest point inside the room when the end leaves the room).
import { findNode } from '../document';
import { PlanError } from '../errors';
import type { Point } from '../geometry/point';
import { checkedScale, placeOutletsAtEnds } from '../rooms/outlet-link';
import { defineCommand } from './define';
import { requireOnPlan } from './plan-limits';

export interface MoveNodeArgs {
  readonly nodeId: string;
  readonly to: Point;
  /** The plan scale, m per pixel: it places the outlet of a room fed from this end. */
  readonly metresPerPixel: number;
}

export const moveNode = defineCommand('move-node', 'Move a point of the run (an outlet fed from it moves with it).', (doc, state, args: MoveNodeArgs) => {
  if (!findNode(doc, args.nodeId)) throw new PlanError(`There is no point with id "${args.nodeId}".`, { nodeId: args.nodeId });
  requireOnPlan(args.to, { nodeId: args.nodeId });
  const metresPerPixel = checkedScale(args.metresPerPixel);
  const nodes = doc.nodes.map((node) => (node.id === args.nodeId ? { ...node, x: args.to.x, y: args.to.y } : node));
  return { doc: placeOutletsAtEnds({ ...doc, nodes }, metresPerPixel, args.nodeId), state };
});
