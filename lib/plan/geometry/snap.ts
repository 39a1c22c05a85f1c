// Snapping a pointer position: to existing nodes, to 0/45/90° from an anchor, to a grid.
import { nearestPoint, type IdentifiedPoint } from './hit-test';
import { distancePx, type Point } from './point';

export interface SnapOptions {
  /** Existing nodes to snap onto, within nodeRadiusPx. */
  nodes?: readonly IdentifiedPoint[];
  nodeRadiusPx?: number;
  /** Node ids never snapped to (e.g. the node being dragged). */
  excludeNodeIds?: readonly string[];
  /** The point a segment is drawn from: enables angle snapping. */
  anchor?: Point | null;
  /** Angle step in degrees (45 gives 0/45/90/…); null or 0 turns angle snapping off. */
  angleStepDeg?: number | null;
  /** Grid spacing in pixels; null or 0 turns grid snapping off. */
  gridSpacingPx?: number | null;
  /** Where the grid starts (a line crossing), plan pixels; the plan's corner when absent. */
  gridOrigin?: Point | null;
}

export type SnapTarget =
  | { kind: 'node'; nodeId: string }
  | { kind: 'angle'; angleDeg: number; onGrid: boolean }
  | { kind: 'grid' }
  | { kind: 'none' };

export interface SnapResult {
  point: Point;
  target: SnapTarget;
}

export const DEFAULT_NODE_RADIUS_PX = 8;

/** The nearest grid crossing; the grid's lines pass through the origin (default the plan's corner). */
export function snapToGrid(point: Point, spacingPx: number, origin: Point | null = null): Point {
  if (!(spacingPx > 0)) return point;
  const start = origin ?? { x: 0, y: 0 };
  return {
    x: start.x + Math.round((point.x - start.x) / spacingPx) * spacingPx,
    y: start.y + Math.round((point.y - start.y) / spacingPx) * spacingPx,
  };
}

/**
 * Projects the point onto the nearest ray from the anchor at a multiple of stepDeg (screen angles, y down).
 * With a grid, the distance along the ray is rounded to whole grid spacings.
 */
export function snapToAngle(point: Point, anchor: Point, stepDeg: number, gridSpacingPx: number | null = null): { point: Point; angleDeg: number } {
  const raw = (Math.atan2(point.y - anchor.y, point.x - anchor.x) * 180) / Math.PI;
  const angleDeg = ((Math.round(raw / stepDeg) * stepDeg) % 360 + 360) % 360;
  const radians = (angleDeg * Math.PI) / 180;
  const directionX = Math.cos(radians);
  const directionY = Math.sin(radians);
  let alongPx = Math.max(0, (point.x - anchor.x) * directionX + (point.y - anchor.y) * directionY);
  if (gridSpacingPx !== null && gridSpacingPx > 0) alongPx = Math.round(alongPx / gridSpacingPx) * gridSpacingPx;
  return { point: { x: anchor.x + alongPx * directionX, y: anchor.y + alongPx * directionY }, angleDeg };
}

/** Node first (within its radius), then angle from the anchor, then grid; otherwise the point unchanged. */
export function snapPoint(point: Point, options: SnapOptions = {}): SnapResult {
  const radiusPx = options.nodeRadiusPx ?? DEFAULT_NODE_RADIUS_PX;
  const node = options.nodes ? nearestPoint(options.nodes, point, radiusPx, options.excludeNodeIds ?? []) : null;
  if (node) {
    const found = options.nodes?.find((candidate) => candidate.id === node.id);
    if (found) return { point: { x: found.x, y: found.y }, target: { kind: 'node', nodeId: node.id } };
  }
  const grid = options.gridSpacingPx && options.gridSpacingPx > 0 ? options.gridSpacingPx : null;
  const anchor = options.anchor ?? null;
  if (anchor && options.angleStepDeg && options.angleStepDeg > 0 && distancePx(anchor, point) > 0) {
    const snapped = snapToAngle(point, anchor, options.angleStepDeg, grid);
    return { point: snapped.point, target: { kind: 'angle', angleDeg: snapped.angleDeg, onGrid: grid !== null } };
  }
  if (grid !== null) return { point: snapToGrid(point, grid, options.gridOrigin ?? null), target: { kind: 'grid' } };
  return { point, target: { kind: 'none' } };
}
