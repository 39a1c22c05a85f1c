// Plan background uploads: checked by content, stored through the S3 client, recorded per team.
import { createHash, randomUUID } from 'node:crypto';
import { AppError } from '@/lib/errors';
import { isId } from '@/lib/ids';
import { getObject, putObject } from '@/lib/storage/object-store';
import { Upload } from '@/models';
import { boundedPlanImage, type BoundedImage } from './bounded-image';
import { renderPdfFirstPage } from './pdf-first-page';
import { assertDeclaredPixels } from './pixel-limits';
import { sniffPlanFile, type SniffedFile } from './sniff';

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

export interface UploadSummary { id: string; fileName: string; contentType: string; bytes: number; widthPx: number | null; heightPx: number | null }

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

// Stores a plan background: an image re-encoded within the pixel limits (pixel-limits.ts), or a PDF's first page drawn as PNG.
export async function storePlanBackground(teamId: string, userId: string, fileName: string, bytes: Uint8Array): Promise<UploadSummary> {
  if (bytes.byteLength === 0) throw new AppError('bad_input', 'The file is empty.', { field: 'file' });
  if (bytes.byteLength > MAX_UPLOAD_BYTES) throw new AppError('too_large', 'The file is over 20 MB. Export the plan at a lower resolution.', { field: 'file' });
  const sniffed = await sniffPlanFile(bytes);
  if (!sniffed) {
    throw new AppError('bad_input', `“${cleanFileName(fileName)}” is not a PNG, JPEG, WebP or PDF file (judged by its content, not its name).`, { field: 'file' });
  }
  const image = await storableImage(bytes, sniffed, cleanFileName(fileName));
  const storageKey = `teams/${teamId}/plans/${randomUUID()}`;
  await putObject(storageKey, image.bytes, image.contentType);
  const row = await Upload.create({
    teamId, uploadedById: userId, storageKey, fileName: image.fileName, contentType: image.contentType,
    bytes: image.bytes.byteLength, sha256: createHash('sha256').update(image.bytes).digest('hex'), widthPx: image.widthPx, heightPx: image.heightPx,
  });
  return toUploadSummary(row);
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
