import { describe, expect, it } from 'vitest';
import { DXF_DRAWING_FORMAT, type DxfDrawing } from '@/lib/dxf/drawing';
import { drawingPaths } from '@/lib/schedules/drawing-paths';

// SVG path data: "M x y" starts a subpath, "L x y" draws a straight line to the point (SVG 1.1, 8.3.2 and 8.3.4).
describe('drawingPaths', () => {
  const drawing: DxfDrawing = {
    format: DXF_DRAWING_FORMAT, widthPx: 100, heightPx: 50, metresPerPixel: 0.01, unitsName: 'millimetres', entityCount: 3,
    layers: [
      { name: 'Doors', offInFile: false, paths: [[0, 0, 10.04, 20.06], [5, 5, 6, 6, 7, 5]] },
      { name: 'Grid', offInFile: true, paths: [[0, 0, 100, 0]] },
    ],
  };

  it('writes each layer switched on in the file as one path: a move to each path’s start, then lines, to 0.1 px', () => {
    expect(drawingPaths(drawing)).toEqual({ format: 'lines', layers: [{ name: 'Doors', d: 'M0 0L10 20.1M5 5L6 6L7 5' }] });
  });
});
