// A stored plan drawing as the PDF renderer of the treatment schedule takes it: PNG or JPEG, with its
// longest side at most MAX_PRINTED_SIDE_PX, decoded by sharp under the pixel cap. The renderer decodes
// what it is given into memory, so it is never handed the stored drawing itself.
import sharp from 'sharp';
import { MAX_DECODED_PIXELS, MAX_PRINTED_SIDE_PX } from './pixel-limits';

export interface PrintImage { data: Buffer; format: 'png' | 'jpg' }

/** The print copy; throws when the stored drawing cannot be decoded within the pixel cap. */
export async function printImage(bytes: Uint8Array, contentType: string): Promise<PrintImage> {
  const pipeline = sharp(bytes, { limitInputPixels: MAX_DECODED_PIXELS })
    .resize({ width: MAX_PRINTED_SIDE_PX, height: MAX_PRINTED_SIDE_PX, fit: 'inside', withoutEnlargement: true });
  if (contentType === 'image/jpeg') return { data: await pipeline.jpeg().toBuffer(), format: 'jpg' };
  return { data: await pipeline.png().toBuffer(), format: 'png' };
}
