// A DXF upload's bytes → the stored drawing's JSON text and what the upload answer says about it.
// Runs in the compute pool (lib/compute/tasks.ts): parsing a large file is work off the request thread.
// A DxfError becomes an AppError naming the file field, so it crosses the thread boundary whole.
import { AppError } from '@/lib/errors';
import { DxfError } from './errors';
import { normaliseDxf } from './normalise';

/** What the upload answer tells the editor: the scale to take, and the layers it will list. */
export interface DxfSummary { metresPerPixel: number | null; unitsName: string | null; entityCount: number; layerNames: string[] }
export interface ReadDxf { json: string; widthPx: number; heightPx: number; summary: DxfSummary }

export function readDxf(bytes: Uint8Array, fileName: string): ReadDxf {
  // DXF 2007 and later is UTF-8; older files use the drawing's code page, whose few non-ASCII letters in layer names show as "�".
  const text = new TextDecoder('utf-8').decode(bytes);
  try {
    const drawing = normaliseDxf(text, fileName);
    return {
      json: JSON.stringify(drawing), widthPx: drawing.widthPx, heightPx: drawing.heightPx,
      summary: { metresPerPixel: drawing.metresPerPixel, unitsName: drawing.unitsName, entityCount: drawing.entityCount, layerNames: drawing.layers.map((layer) => layer.name) },
    };
  } catch (error) {
    if (error instanceof DxfError) {
      const code = error.reason === 'too_many_entities' || error.reason === 'too_many_points' ? 'too_large' : 'bad_input';
      throw new AppError(code, error.message, { field: 'file' });
    }
    throw error;
  }
}
