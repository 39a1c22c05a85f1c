// Plan background uploads: checked by content, stored through the S3 client, recorded per team.
import { createHash, randomUUID } from 'node:crypto';
import type { DxfSummary } from '@/lib/dxf/read';
import { cadFileKind, namedAsDxf } from '@/lib/dxf/sniff';
import { AppError } from '@/lib/errors';
import { isId } from '@/lib/ids';
import { getObject, putObject } from '@/lib/storage/object-store';
import { Upload } from '@/models';
import { boundedPlanImage, type BoundedImage } from './bounded-image';
import { storableDxf, type StorableDxf } from './dxf-upload';
import { renderPdfFirstPage } from './pdf-first-page';
import { assertDeclaredPixels } from './pixel-limits';
import { sniffPlanFile, type SniffedFile } from './sniff';

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
export const UPLOAD_TOO_LARGE = 'The file is over 20 MB. Export the plan at a lower resolution, or save only the floor or the layers you need as DXF.';

export interface UploadSummary { id: string; fileName: string; contentType: string; bytes: number; widthPx: number | null; heightPx: number | null }
/** A stored plan drawing; a DXF's answer also says the scale its units state and the layers it has. */
export type StoredDrawing = UploadSummary & { dxf?: DxfSummary };

export function toUploadSummary(row: Upload): UploadSummary {
  return { id: row.id, fileName: row.fileName, contentType: row.contentType, bytes: row.bytes, widthPx: row.widthPx, heightPx: row.heightPx };
}

function cleanFileName(name: string): string {
  return name.replace(/[\\/\u0000-\u001f]/g, '_').slice(0, 200) || 'plan';
}

/** What a sniffed upload becomes before it is stored: a PDF's first page as PNG, every image bounded. */
async function storableImage(bytes: Uint8Array, sniffed: SniffedFile, fileName: string): Promise<BoundedImage & { fileName: string }> {
  if (sniffed.contentType === 'application/pdf') {
    const page = await renderPdfFirstPage(bytes);
    const pageName = `${fileName.replace(/\.pdf$/i, '')} (page 1).png`;
    return { ...(await boundedPlanImage(page, 'image/png', pageName)), fileName: pageName };
  }
  assertDeclaredPixels(sniffed.widthPx ?? 0, sniffed.heightPx ?? 0, fileName);
  return { ...(await boundedPlanImage(bytes, sniffed.contentType, fileName)), fileName };
}

/** What the bytes become: a DXF's paths (a DWG or binary DXF refused), else an image or a PDF's first page; refused with what is wrong. */
async function storableDrawing(bytes: Uint8Array, fileName: string): Promise<(BoundedImage & { fileName: string }) | (StorableDxf & { fileName: string })> {
  const cad = cadFileKind(bytes);
  if (cad) return { ...(await storableDxf(bytes, cad, fileName)), fileName };
  const sniffed = await sniffPlanFile(bytes);
  if (sniffed) return storableImage(bytes, sniffed, fileName);
  if (namedAsDxf(fileName)) {
    throw new AppError('bad_input', `“${fileName}” is named as DXF but its content is not DXF text (a DXF file opens with the lines 0 and SECTION). Save it again as DXF from your CAD program.`, { field: 'file' });
  }
  throw new AppError('bad_input', `“${fileName}” is not a PNG, JPEG, WebP, PDF or DXF file (judged by its content, not its name).`, { field: 'file' });
}

// Stores a plan background: an image re-encoded within the pixel limits (pixel-limits.ts), a PDF's first page drawn as PNG,
// or a DXF's paths per layer (lib/dxf) as JSON. Nothing is stored and the plan keeps its drawing when the file is refused.
export async function storePlanBackground(teamId: string, userId: string, fileName: string, bytes: Uint8Array): Promise<StoredDrawing> {
  if (bytes.byteLength === 0) throw new AppError('bad_input', 'The file is empty.', { field: 'file' });
  if (bytes.byteLength > MAX_UPLOAD_BYTES) throw new AppError('too_large', UPLOAD_TOO_LARGE, { field: 'file' });
  const image = await storableDrawing(bytes, cleanFileName(fileName));
  const storageKey = `teams/${teamId}/plans/${randomUUID()}`;
  await putObject(storageKey, image.bytes, image.contentType);
  const row = await Upload.create({
    teamId, uploadedById: userId, storageKey, fileName: image.fileName, contentType: image.contentType,
    bytes: image.bytes.byteLength, sha256: createHash('sha256').update(image.bytes).digest('hex'), widthPx: image.widthPx, heightPx: image.heightPx,
  });
  return 'dxf' in image ? { ...toUploadSummary(row), dxf: image.dxf } : toUploadSummary(row);
}

export async function readUpload(teamId: string, uploadId: string): Promise<{ summary: UploadSummary; bytes: Uint8Array } | null> {
  if (!isId(uploadId)) return null;
  const row = await Upload.findOne({ where: { id: uploadId, teamId } });
  if (!row) return null;
  return { summary: toUploadSummary(row), bytes: await getObject(row.storageKey) };
}

/** An earlier plan drawing of the team, to put back on a plan; refused with what is wrong otherwise. */
export async function requirePlanDrawing(teamId: string, uploadId: string): Promise<UploadSummary> {
  const row = isId(uploadId) ? await Upload.findOne({ where: { id: uploadId, teamId } }) : null;
  if (!row) throw new AppError('not_found', 'That drawing is not one of this team’s uploads.', { field: 'uploadId' });
  if (!row.widthPx || !row.heightPx) throw new AppError('bad_input', 'That upload is not a plan drawing.', { field: 'uploadId' });
  return toUploadSummary(row);
}
