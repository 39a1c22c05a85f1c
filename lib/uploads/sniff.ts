// What a file really is, judged by its bytes (its name and declared type are ignored).
import { fileTypeFromBuffer } from 'file-type';
import { imageSize } from 'image-size';

export const PLAN_IMAGE_TYPES = ['image/png', 'image/jpeg', 'image/webp'] as const;
export type PlanImageType = (typeof PLAN_IMAGE_TYPES)[number];
export type PlanFileType = PlanImageType | 'application/pdf';

export interface SniffedFile { contentType: PlanFileType; widthPx: number | null; heightPx: number | null }

export async function sniffPlanFile(bytes: Uint8Array): Promise<SniffedFile | null> {
  const detected = await fileTypeFromBuffer(bytes);
  if (!detected) return null;
  if (detected.mime === 'application/pdf') return { contentType: 'application/pdf', widthPx: null, heightPx: null };
  if (!(PLAN_IMAGE_TYPES as readonly string[]).includes(detected.mime)) return null;
  try {
    const size = imageSize(bytes);
    if (!size.width || !size.height) return null;
    return { contentType: detected.mime as PlanImageType, widthPx: size.width, heightPx: size.height };
  } catch {
    return null;
  }
}
