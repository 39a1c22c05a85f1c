'use client';

import { Shape } from 'react-konva';

const MAJOR_EVERY = 10;
const MIN_SCREEN_SPACING_PX = 8;

function gridLines(widthPx: number, heightPx: number, stepPx: number) {
  return (context: { beginPath(): void; moveTo(x: number, y: number): void; lineTo(x: number, y: number): void }) => {
    context.beginPath();
    for (let x = 0; x <= widthPx; x += stepPx) { context.moveTo(x, 0); context.lineTo(x, heightPx); }
    for (let y = 0; y <= heightPx; y += stepPx) { context.moveTo(0, y); context.lineTo(widthPx, y); }
  };
}

// The drawing grid: minor and major lines, each set in one shape (one draw call), thinned
// out when zoomed far out so lines never crowd closer than a few screen pixels.
export function GridShape({ widthPx, heightPx, spacingPx, scale }: { widthPx: number; heightPx: number; spacingPx: number; scale: number }) {
  const minor = spacingPx * Math.max(1, 2 ** Math.ceil(Math.log2(MIN_SCREEN_SPACING_PX / (spacingPx * scale))));
  const major = spacingPx * MAJOR_EVERY;
  return (
    <>
      {minor < major && (
        <Shape listening={false} perfectDrawEnabled={false} stroke="#efefef" strokeWidth={1 / scale}
          sceneFunc={(context, shape) => { gridLines(widthPx, heightPx, minor)(context); context.strokeShape(shape); }} />
      )}
      <Shape listening={false} perfectDrawEnabled={false} stroke="#dcdde0" strokeWidth={1 / scale}
        sceneFunc={(context, shape) => { gridLines(widthPx, heightPx, Math.max(major, minor))(context); context.strokeShape(shape); }} />
    </>
  );
}
