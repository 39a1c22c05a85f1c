// A CAD file given as the plan drawing: an ASCII DXF is read in the compute pool into the plan's
// paths (lib/dxf), stored as JSON; a DWG or a binary DXF is refused with what to do instead.
import { compute } from '@/lib/compute/pool';
import { DXF_DRAWING_CONTENT_TYPE } from '@/lib/dxf/drawing';
import type { ReadDxf } from '@/lib/dxf/read';
import type { CadFileKind } from '@/lib/dxf/sniff';
import { AppError } from '@/lib/errors';

export interface StorableDxf { bytes: Uint8Array; contentType: typeof DXF_DRAWING_CONTENT_TYPE; widthPx: number; heightPx: number; dxf: ReadDxf['summary'] }

export async function storableDxf(bytes: Uint8Array, kind: CadFileKind, fileName: string): Promise<StorableDxf> {
  if (kind === 'dwg') {
    throw new AppError('bad_input', `“${fileName}” is a DWG file, which the plan cannot read. Save it as DXF from your CAD program (Save As, type DXF) and upload that.`, { field: 'file' });
  }
  if (kind === 'binary_dxf') {
    throw new AppError('bad_input', `“${fileName}” is a binary DXF. Save it again as ASCII (text) DXF from your CAD program and upload that.`, { field: 'file' });
  }
  const read = await compute<ReadDxf>({ kind: 'dxf-drawing', bytes, fileName }, { reduce: 'the drawing (save only the floor or the layers you need as DXF)' });
  return { bytes: new TextEncoder().encode(read.json), contentType: DXF_DRAWING_CONTENT_TYPE, widthPx: read.widthPx, heightPx: read.heightPx, dxf: read.summary };
}
