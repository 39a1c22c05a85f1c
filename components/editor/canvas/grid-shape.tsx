'use client';

import { Shape } from 'react-konva';

const MAJOR_EVERY = 10;
const MIN_SCREEN_SPACING_PX = 8;

/** The first line at or after 0 of lines every stepPx through originPx. */
function firstLine(originPx: number, stepPx: number): number {
  return originPx - Math.floor(originPx / stepPx) * stepPx;
}

function gridLines(widthPx: number, heightPx: number, stepPx: number, origin: { x: number; y: number }) {
  return (context: { beginPath(): void; moveTo(x: number, y: number): void; lineTo(x: number, y: number): void }) => {
    context.beginPath();
    for (let x = firstLine(origin.x, stepPx); x <= widthPx; x += stepPx) { context.moveTo(x, 0); context.lineTo(x, heightPx); }
    for (let y = firstLine(origin.y, stepPx); y <= heightPx; y += stepPx) { context.moveTo(0, y); context.lineTo(widthPx, y); }
  };
}

// The drawing grid: minor and major lines through the grid's origin, each set in one shape (one
// draw call), thinned out when zoomed far out so lines never crowd closer than a few screen pixels.
// A grid moved off the drawing's corner marks its origin with a small cross.
export function GridShape({ widthPx, heightPx, spacingPx, origin, scale }: { widthPx: number; heightPx: number; spacingPx: number; origin: { x: number; y: number } | null; scale: number }) {
  const start = origin ?? { x: 0, y: 0 };
  const minor = spacingPx * Math.max(1, 2 ** Math.ceil(Math.log2(MIN_SCREEN_SPACING_PX / (spacingPx * scale))));
  const major = spacingPx * MAJOR_EVERY;
  return (
    <>
      {minor < major && (
        <Shape listening={false} perfectDrawEnabled={false} stroke="#efefef" strokeWidth={1 / scale}
          sceneFunc={(context, shape) => { gridLines(widthPx, heightPx, minor, start)(context); context.strokeShape(shape); }} />
      )}
      <Shape listening={false} perfectDrawEnabled={false} stroke="#dcdde0" strokeWidth={1 / scale}
        sceneFunc={(context, shape) => { gridLines(widthPx, heightPx, Math.max(major, minor), start)(context); context.strokeShape(shape); }} />
      {origin && (
        <Shape listening={false} stroke="#2d6a96" strokeWidth={1.5 / scale} name="grid-origin"
          sceneFunc={(context, shape) => {
            const arm = 8 / scale;
            context.beginPath();
            context.moveTo(origin.x - arm, origin.y); context.lineTo(origin.x + arm, origin.y);
            context.moveTo(origin.x, origin.y - arm); context.lineTo(origin.x, origin.y + arm);
            context.strokeShape(shape);
          }} />
      )}
    </>
  );
}
