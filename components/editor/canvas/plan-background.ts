// The plan's drawing as the canvas takes it: where to fetch it, its size in plan pixels, and whether
// it is an image or a DXF's paths (drawn as vector lines, with layers that can be hidden).
import { isDxfDrawingType } from '@/lib/dxf/drawing';

export interface PlanBackground {
  url: string;
  widthPx: number;
  heightPx: number;
  kind: 'image' | 'dxf';
  /** A DXF's layers not drawn. */
  hiddenLayers?: ReadonlySet<string>;
}

export function planBackgroundOf(upload: { id: string; contentType: string; widthPx: number | null; heightPx: number | null } | null): PlanBackground | null {
  if (!upload?.widthPx || !upload.heightPx) return null;
  return { url: `/api/v1/uploads/${upload.id}`, widthPx: upload.widthPx, heightPx: upload.heightPx, kind: isDxfDrawingType(upload.contentType) ? 'dxf' : 'image' };
}
