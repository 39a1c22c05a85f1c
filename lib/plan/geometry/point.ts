// Points on the plan, in pixels of the background image.

export interface Point {
  readonly x: number;
  readonly y: number;
}

export function distancePx(a: Point, b: Point): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

export function pointsEqual(a: Point, b: Point, tolerancePx = 1e-9): boolean {
  return distancePx(a, b) <= tolerancePx;
}

/** The point a fraction t of the way from a to b. */
export function lerpPoint(a: Point, b: Point, t: number): Point {
  return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
}
