// Curves of a DXF drawing as short straight pieces, in the drawing's own units.

export interface Point { x: number; y: number }

const FULL_TURN = 2 * Math.PI;
/** Pieces per full turn: a chord of a 1 m radius at 48 per turn sits within 2 mm of the arc (r(1 − cos(π/48))). */
const PIECES_PER_TURN = 48;

function piecesFor(sweepRad: number): number {
  return Math.max(2, Math.ceil((Math.abs(sweepRad) / FULL_TURN) * PIECES_PER_TURN));
}

/** An arc counter-clockwise from startRad to endRad (DXF ARC: angles measured counter-clockwise from the x axis). */
export function arcPoints(center: Point, radius: number, startRad: number, endRad: number): Point[] {
  let sweep = endRad - startRad;
  while (sweep <= 0) sweep += FULL_TURN;
  const pieces = piecesFor(sweep);
  return Array.from({ length: pieces + 1 }, (_, index) => {
    const angle = startRad + (sweep * index) / pieces;
    return { x: center.x + radius * Math.cos(angle), y: center.y + radius * Math.sin(angle) };
  });
}

export function circlePoints(center: Point, radius: number): Point[] {
  return arcPoints(center, radius, 0, FULL_TURN);
}

/**
 * The arc between two polyline vertices with a bulge: bulge = tan(θ/4), θ the included angle,
 * positive counter-clockwise (AutoCAD DXF Reference, LWPOLYLINE group 42). The end points included.
 */
export function bulgePoints(from: Point, to: Point, bulge: number): Point[] {
  const chord = Math.hypot(to.x - from.x, to.y - from.y);
  if (bulge === 0 || chord === 0) return [from, to];
  const included = 4 * Math.atan(bulge);
  // radius from the chord and the sagitta: r = c (1 + b²) / (4 |b|)
  const radius = (chord * (1 + bulge * bulge)) / (4 * Math.abs(bulge));
  const midX = (from.x + to.x) / 2;
  const midY = (from.y + to.y) / 2;
  // distance from the chord's middle to the centre, on the side the arc turns towards
  const apothem = radius - (chord * Math.abs(bulge)) / 2;
  const sign = bulge > 0 ? 1 : -1;
  const normalX = -(to.y - from.y) / chord;
  const normalY = (to.x - from.x) / chord;
  const center = { x: midX + sign * apothem * normalX, y: midY + sign * apothem * normalY };
  const startRad = Math.atan2(from.y - center.y, from.x - center.x);
  const pieces = piecesFor(included);
  return Array.from({ length: pieces + 1 }, (_, index) => {
    if (index === pieces) return to;
    const angle = startRad + (included * index) / pieces;
    return { x: center.x + radius * Math.cos(angle), y: center.y + radius * Math.sin(angle) };
  });
}

/** An ellipse or its arc: centre, the major axis's end point relative to it, minor/major ratio, parameters in radians. */
export function ellipsePoints(center: Point, majorEnd: Point, axisRatio: number, startParam: number, endParam: number): Point[] {
  const majorLength = Math.hypot(majorEnd.x, majorEnd.y);
  const rotation = Math.atan2(majorEnd.y, majorEnd.x);
  const minorLength = majorLength * axisRatio;
  let sweep = endParam - startParam;
  while (sweep <= 0) sweep += FULL_TURN;
  const pieces = piecesFor(sweep);
  const cos = Math.cos(rotation);
  const sin = Math.sin(rotation);
  return Array.from({ length: pieces + 1 }, (_, index) => {
    const parameter = startParam + (sweep * index) / pieces;
    const along = majorLength * Math.cos(parameter);
    const across = minorLength * Math.sin(parameter);
    return { x: center.x + along * cos - across * sin, y: center.y + along * sin + across * cos };
  });
}
