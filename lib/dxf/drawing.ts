// A DXF drawing as the plan keeps it: straight-line paths per layer, in plan pixels (x to the right,
// y down, the drawing's extents from (0, 0)), with the scale its units state. Stored as JSON beside
// the upload record; read by the editor's canvas and the schedule's plan figure.

/** The stored object's content type (the upload row's contentType says the drawing is this). */
export const DXF_DRAWING_CONTENT_TYPE = 'application/vnd.antinode.dxf-drawing+json';
export const DXF_DRAWING_FORMAT = 1;

export interface DxfLayer {
  name: string;
  /** Off or frozen in the file's layer table: listed, but not drawn until switched on. */
  offInFile: boolean;
  /** Each path as flat plan-pixel pairs [x0, y0, x1, y1, …]. */
  paths: number[][];
}

export interface DxfDrawing {
  format: typeof DXF_DRAWING_FORMAT;
  widthPx: number;
  heightPx: number;
  /** The plan scale the file's $INSUNITS states; null when it states none (set the scale by two points). */
  metresPerPixel: number | null;
  /** The units in words ("millimetres"), or null. */
  unitsName: string | null;
  entityCount: number;
  layers: DxfLayer[];
}

export function isDxfDrawingType(contentType: string): boolean {
  return contentType === DXF_DRAWING_CONTENT_TYPE;
}
