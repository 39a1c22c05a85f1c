// Move a node (a segment end or a tee) to a new position on the plan.
import { findNode } from '../document';
import { PlanError } from '../errors';
import type { Point } from '../geometry/point';
import { defineCommand } from './define';
import { requireOnPlan } from './plan-limits';

export interface MoveNodeArgs {
  readonly nodeId: string;
  readonly to: Point;
}

export const moveNode = defineCommand('move-node', 'Move a point of the run.', (doc, state, args: MoveNodeArgs) => {
  if (!findNode(doc, args.nodeId)) throw new PlanError(`There is no point with id "${args.nodeId}".`, { nodeId: args.nodeId });
  requireOnPlan(args.to, { nodeId: args.nodeId });
  const nodes = doc.nodes.map((node) => (node.id === args.nodeId ? { ...node, x: args.to.x, y: args.to.y } : node));
  return { doc: { ...doc, nodes }, state };
});
