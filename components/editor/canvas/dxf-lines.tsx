'use client';

// A DXF drawing's paths under the duct runs: one konva Shape per shown layer that strokes a Path2D
// built once from all of that layer's paths, so a pan or zoom frame is one native stroke per layer
// rather than tens of thousands of moveTo/lineTo calls (or thousands of Line nodes, each with a
// node, a hit region and a draw call). Not listening: the drawing is never the target of a click.
import type { Context } from 'konva/lib/Context';
import type { Shape as KonvaShape } from 'konva/lib/Shape';
import { memo, useMemo } from 'react';
import { Shape } from 'react-konva';
import type { DxfDrawing, DxfLayer } from '@/lib/dxf/drawing';

const DRAWING_LINE = '#6b7079';
/** Line width on screen, px, at any zoom. */
const LINE_SCREEN_PX = 1;

function layerPath(layer: DxfLayer): Path2D {
  const path2d = new Path2D();
  for (const path of layer.paths) {
    path2d.moveTo(path[0]!, path[1]!);
    for (let index = 2; index < path.length; index += 2) path2d.lineTo(path[index]!, path[index + 1]!);
  }
  return path2d;
}

function strokePath(path2d: Path2D) {
  return (context: Context, shape: KonvaShape) => {
    const native = context._context;
    native.strokeStyle = DRAWING_LINE;
    native.lineWidth = LINE_SCREEN_PX / Math.abs(shape.getAbsoluteScale().x || 1);
    native.stroke(path2d);
  };
}

/** Without a list of hidden layers (a frozen revision's view), the layers off or frozen in the file are not drawn. */
export const DxfLines = memo(function DxfLines({ drawing, hiddenLayers }: { drawing: DxfDrawing; hiddenLayers?: ReadonlySet<string> }) {
  const layers = useMemo(() => drawing.layers.map((layer) => ({ name: layer.name, offInFile: layer.offInFile, sceneFunc: strokePath(layerPath(layer)) })), [drawing]);
  const hidden = (layer: { name: string; offInFile: boolean }) => (hiddenLayers ? hiddenLayers.has(layer.name) : layer.offInFile);
  return (
    <>
      {layers.filter((layer) => !hidden(layer)).map((layer) => (
        <Shape key={layer.name} name="dxf-layer" layerName={layer.name} sceneFunc={layer.sceneFunc} listening={false} perfectDrawEnabled={false} />
      ))}
    </>
  );
});
