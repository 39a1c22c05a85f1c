// Hit tests: distance from a point to a segment, nearest node and nearest segment within a tolerance.
import { distancePx, lerpPoint, type Point } from './point';

export interface SegmentProjection {
  distancePx: number;
  /** 0 at `a`, 1 at `b`, clamped. */
  t: number;
  closest: Point;
}

export function projectOntoSegment(point: Point, a: Point, b: Point): SegmentProjection {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSquared = dx * dx + dy * dy;
  const raw = lengthSquared === 0 ? 0 : ((point.x - a.x) * dx + (point.y - a.y) * dy) / lengthSquared;
  const t = Math.min(1, Math.max(0, raw));
  const closest = lerpPoint(a, b, t);
  return { distancePx: distancePx(point, closest), t, closest };
}

export function pointToSegmentDistancePx(point: Point, a: Point, b: Point): number {
  return projectOntoSegment(point, a, b).distancePx;
}

export interface IdentifiedPoint extends Point {
  readonly id: string;
}

export interface IdentifiedSegment {
  readonly id: string;
  readonly a: Point;
  readonly b: Point;
}

/** The nearest point within tolerancePx (first in order on a tie), or null. */
export function nearestPoint(points: readonly IdentifiedPoint[], point: Point, tolerancePx: number, excludeIds: readonly string[] = []): { id: string; distancePx: number } | null {
  let best: { id: string; distancePx: number } | null = null;
  for (const candidate of points) {
    if (excludeIds.includes(candidate.id)) continue;
    const distance = distancePx(candidate, point);
    if (distance <= tolerancePx && (best === null || distance < best.distancePx)) best = { id: candidate.id, distancePx: distance };
  }
  return best;
}

/** The nearest segment within tolerancePx (first in order on a tie), or null. */
export function nearestSegment(segments: readonly IdentifiedSegment[], point: Point, tolerancePx: number): ({ id: string } & SegmentProjection) | null {
  let best: ({ id: string } & SegmentProjection) | null = null;
  for (const candidate of segments) {
    const projection = projectOntoSegment(point, candidate.a, candidate.b);
    if (projection.distancePx <= tolerancePx && (best === null || projection.distancePx < best.distancePx)) best = { id: candidate.id, ...projection };
  }
  return best;
}
