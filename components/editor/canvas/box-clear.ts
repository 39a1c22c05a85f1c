// Whether a word's box on the canvas is clear of the drawn ducts: each duct a line of its drawn
// width; the box grown by half that width and tested against the centre line (plan pixels).

export interface Box { readonly x: number; readonly y: number; readonly width: number; readonly height: number }
export interface DuctLine { readonly x1: number; readonly y1: number; readonly x2: number; readonly y2: number; readonly halfWidth: number }

function inside(box: Box, x: number, y: number): boolean {
  return x >= box.x && x <= box.x + box.width && y >= box.y && y <= box.y + box.height;
}

/** Orientation of c against the line a→b: >0 left, <0 right, 0 on it. */
function side(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
}

function crosses(a: [number, number, number, number], b: [number, number, number, number]): boolean {
  const [p1x, p1y, p2x, p2y] = a;
  const [q1x, q1y, q2x, q2y] = b;
  return side(p1x, p1y, p2x, p2y, q1x, q1y) * side(p1x, p1y, p2x, p2y, q2x, q2y) < 0
    && side(q1x, q1y, q2x, q2y, p1x, p1y) * side(q1x, q1y, q2x, q2y, p2x, p2y) < 0;
}

/** True when the line (with its half width) touches the box. */
export function lineTouchesBox(line: DuctLine, box: Box): boolean {
  const grown = { x: box.x - line.halfWidth, y: box.y - line.halfWidth, width: box.width + 2 * line.halfWidth, height: box.height + 2 * line.halfWidth };
  if (inside(grown, line.x1, line.y1) || inside(grown, line.x2, line.y2)) return true;
  const { x, y, width, height } = grown;
  const edges: [number, number, number, number][] = [[x, y, x + width, y], [x + width, y, x + width, y + height], [x + width, y + height, x, y + height], [x, y + height, x, y]];
  return edges.some((edge) => crosses([line.x1, line.y1, line.x2, line.y2], edge));
}

export function boxIsClear(box: Box, lines: readonly DuctLine[]): boolean {
  return lines.every((line) => !lineTouchesBox(line, box));
}
