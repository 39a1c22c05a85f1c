// A DXF drawing as the schedule's plan figure prints it: one SVG path per layer, in plan pixels, for
// the layers the file has switched on (what a person hides in the editor is a view of their own and
// is not printed). Coordinates to 0.1 px: far below what a 499 pt wide figure can show.
import type { DxfDrawing } from '@/lib/dxf/drawing';

export interface ScheduleLinesDrawing { format: 'lines'; layers: { name: string; d: string }[] }

const tenth = (value: number) => Math.round(value * 10) / 10;

function pathData(paths: readonly number[][]): string {
  const parts: string[] = [];
  for (const path of paths) {
    parts.push(`M${tenth(path[0]!)} ${tenth(path[1]!)}`);
    for (let index = 2; index < path.length; index += 2) parts.push(`L${tenth(path[index]!)} ${tenth(path[index + 1]!)}`);
  }
  return parts.join('');
}

export function drawingPaths(drawing: DxfDrawing): ScheduleLinesDrawing {
  return { format: 'lines', layers: drawing.layers.filter((layer) => !layer.offInFile).map((layer) => ({ name: layer.name, d: pathData(layer.paths) })) };
}
