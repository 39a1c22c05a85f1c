// Places the plan figure's words clear of the drawn lines and of each other: each label tries its
// candidate boxes in order and takes the first that touches no line and no label already placed (or
// the one touching fewest). Plan pixels throughout. Common practice, no source.

export interface Box { x: number; y: number; widthPx: number; heightPx: number }
export interface LineSegment { x1: number; y1: number; x2: number; y2: number }

function inside(box: Box, x: number, y: number): boolean {
  return x >= box.x && x <= box.x + box.widthPx && y >= box.y && y <= box.y + box.heightPx;
}

function cross(ax: number, ay: number, bx: number, by: number): number {
  return ax * by - ay * bx;
}

/** Whether two closed segments meet (orientation test; collinear overlaps count). */
function segmentsMeet(a: LineSegment, b: LineSegment): boolean {
  const d1 = cross(b.x2 - b.x1, b.y2 - b.y1, a.x1 - b.x1, a.y1 - b.y1);
  const d2 = cross(b.x2 - b.x1, b.y2 - b.y1, a.x2 - b.x1, a.y2 - b.y1);
  const d3 = cross(a.x2 - a.x1, a.y2 - a.y1, b.x1 - a.x1, b.y1 - a.y1);
  const d4 = cross(a.x2 - a.x1, a.y2 - a.y1, b.x2 - a.x1, b.y2 - a.y1);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return true;
  const onSegment = (s: LineSegment, x: number, y: number) => x >= Math.min(s.x1, s.x2) && x <= Math.max(s.x1, s.x2) && y >= Math.min(s.y1, s.y2) && y <= Math.max(s.y1, s.y2);
  return (d1 === 0 && onSegment(b, a.x1, a.y1)) || (d2 === 0 && onSegment(b, a.x2, a.y2)) || (d3 === 0 && onSegment(a, b.x1, b.y1)) || (d4 === 0 && onSegment(a, b.x2, b.y2));
}

export function boxEdges(box: Box): LineSegment[] {
  const right = box.x + box.widthPx;
  const bottom = box.y + box.heightPx;
  return [
    { x1: box.x, y1: box.y, x2: right, y2: box.y }, { x1: right, y1: box.y, x2: right, y2: bottom },
    { x1: right, y1: bottom, x2: box.x, y2: bottom }, { x1: box.x, y1: bottom, x2: box.x, y2: box.y },
  ];
}

/** Whether a line crosses or lies in the box. */
export function lineHitsBox(line: LineSegment, box: Box): boolean {
  return inside(box, line.x1, line.y1) || inside(box, line.x2, line.y2) || boxEdges(box).some((edge) => segmentsMeet(line, edge));
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.widthPx && b.x < a.x + a.widthPx && a.y < b.y + b.heightPx && b.y < a.y + a.heightPx;
}

export interface Obstacles { lines: LineSegment[]; boxes: Box[]; bounds: Box }

function hits(box: Box, obstacles: Obstacles): number {
  const { bounds } = obstacles;
  const outOfBounds = box.x < bounds.x || box.y < bounds.y || box.x + box.widthPx > bounds.x + bounds.widthPx || box.y + box.heightPx > bounds.y + bounds.heightPx;
  return (outOfBounds ? 100 : 0) + obstacles.lines.filter((line) => lineHitsBox(line, box)).length + obstacles.boxes.filter((other) => boxesOverlap(box, other)).length;
}

/** The first candidate that touches nothing, or the one that touches least; the chosen box joins the obstacles. */
export function placeBox(candidates: readonly Box[], obstacles: Obstacles): Box {
  let best = candidates[0];
  let bestHits = Infinity;
  for (const candidate of candidates) {
    const count = hits(candidate, obstacles);
    if (count < bestHits) {
      best = candidate;
      bestHits = count;
    }
    if (count === 0) break;
  }
  obstacles.boxes.push(best);
  return best;
}
