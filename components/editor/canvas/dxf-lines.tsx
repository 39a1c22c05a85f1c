'use client';

// A DXF drawing's paths under the duct runs: one konva Shape per shown layer whose scene function
// strokes all of that layer's paths as one canvas path (thousands of Line nodes would each cost a
// node, a hit region and a draw call). Not listening: the drawing is never a target of a click.
import type { Context } from 'konva/lib/Context';
import type { Shape as KonvaShape } from 'konva/lib/Shape';
import { memo } from 'react';
import { Shape } from 'react-konva';
import type { DxfDrawing, DxfLayer } from '@/lib/dxf/drawing';

const DRAWING_LINE = '#7d838c';
/** Line width on screen, px, at any zoom. */
const LINE_SCREEN_PX = 1;

function strokeLayer(layer: DxfLayer) {
  return (context: Context, shape: KonvaShape) => {
    context.beginPath();
    for (const path of layer.paths) {
      context.moveTo(path[0]!, path[1]!);
      for (let index = 2; index < path.length; index += 2) context.lineTo(path[index]!, path[index + 1]!);
    }
    context.strokeShape(shape);
  };
}

export const DxfLines = memo(function DxfLines({ drawing, hiddenLayers }: { drawing: DxfDrawing; hiddenLayers: ReadonlySet<string> }) {
  return (
    <>
      {drawing.layers.filter((layer) => !hiddenLayers.has(layer.name)).map((layer) => (
        <Shape key={layer.name} name="dxf-layer" sceneFunc={strokeLayer(layer)} stroke={DRAWING_LINE} strokeWidth={LINE_SCREEN_PX}
          strokeScaleEnabled={false} listening={false} perfectDrawEnabled={false} shadowForStrokeEnabled={false} />
      ))}
    </>
  );
});
