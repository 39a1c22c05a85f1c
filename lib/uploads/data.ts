// Plan background uploads: checked by content, stored through the S3 client, recorded per team.
import { createHash, randomUUID } from 'node:crypto';
import { AppError } from '@/lib/errors';
import { isId } from '@/lib/ids';
import { getObject, putObject } from '@/lib/storage/object-store';
import { Upload } from '@/models';
import { renderPdfFirstPage } from './pdf-first-page';
import { sniffPlanFile } from './sniff';

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

export interface UploadSummary { id: string; fileName: string; contentType: string; bytes: number; widthPx: number | null; heightPx: number | null }

export function toUploadSummary(row: Upload): UploadSummary {
  return { id: row.id, fileName: row.fileName, contentType: row.contentType, bytes: row.bytes, widthPx: row.widthPx, heightPx: row.heightPx };
}

function cleanFileName(name: string): string {
  return name.replace(/[\\/\u0000-\u001f]/g, '_').slice(0, 200) || 'plan';
}

// Stores a plan background. A PDF's first page becomes the PNG that is stored.
export async function storePlanBackground(teamId: string, userId: string, fileName: string, bytes: Uint8Array): Promise<UploadSummary> {
  if (bytes.byteLength === 0) throw new AppError('bad_input', 'The file is empty.', { field: 'file' });
  if (bytes.byteLength > MAX_UPLOAD_BYTES) throw new AppError('too_large', 'The file is over 20 MB. Export the plan at a lower resolution.', { field: 'file' });
  let sniffed = await sniffPlanFile(bytes);
  if (!sniffed) {
    throw new AppError('bad_input', `“${cleanFileName(fileName)}” is not a PNG, JPEG, WebP or PDF file (judged by its content, not its name).`, { field: 'file' });
  }
  let stored = bytes;
  let storedName = cleanFileName(fileName);
  if (sniffed.contentType === 'application/pdf') {
    stored = await renderPdfFirstPage(bytes);
    storedName = `${storedName.replace(/\.pdf$/i, '')} (page 1).png`;
    sniffed = await sniffPlanFile(stored);
    if (!sniffed) throw new AppError('bad_input', 'The first page of the PDF could not be turned into an image.', { field: 'file' });
  }
  const storageKey = `teams/${teamId}/plans/${randomUUID()}`;
  await putObject(storageKey, stored, sniffed.contentType);
  const row = await Upload.create({
    teamId, uploadedById: userId, storageKey, fileName: storedName, contentType: sniffed.contentType,
    bytes: stored.byteLength, sha256: createHash('sha256').update(stored).digest('hex'), widthPx: sniffed.widthPx, heightPx: sniffed.heightPx,
  });
  return toUploadSummary(row);
}

export async function readUpload(teamId: string, uploadId: string): Promise<{ summary: UploadSummary; bytes: Uint8Array } | null> {
  if (!isId(uploadId)) return null;
  const row = await Upload.findOne({ where: { id: uploadId, teamId } });
  if (!row) return null;
  return { summary: toUploadSummary(row), bytes: await getObject(row.storageKey) };
}
