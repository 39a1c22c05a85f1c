// A plan drawing decoded under the pixel cap and re-encoded no larger than MAX_STORED_SIDE_PX on its
// longest side, in its own format. What is stored is always this re-encoded image: it is known to
// decode, carries no metadata (sharp drops it), has its orientation applied, and its recorded pixel
// size is the real one, on which the person then sets the plan's scale.
import sharp from 'sharp';
import { AppError } from '@/lib/errors';
import { MAX_DECODED_PIXELS, MAX_STORED_SIDE_PX } from './pixel-limits';
import type { PlanImageType } from './sniff';

export interface BoundedImage { bytes: Uint8Array; contentType: PlanImageType; widthPx: number; heightPx: number }

/** JPEG and WebP drawings are re-encoded at this quality (libvips' scale, 1 to 100). */
const LOSSY_QUALITY = 90;

type Pipeline = ReturnType<typeof sharp>;

function encoder(pipeline: Pipeline, contentType: PlanImageType): Pipeline {
  if (contentType === 'image/jpeg') return pipeline.jpeg({ quality: LOSSY_QUALITY });
  if (contentType === 'image/webp') return pipeline.webp({ quality: LOSSY_QUALITY });
  return pipeline.png();
}

export async function boundedPlanImage(bytes: Uint8Array, contentType: PlanImageType, fileName: string): Promise<BoundedImage> {
  const pipeline = sharp(bytes, { limitInputPixels: MAX_DECODED_PIXELS })
    .rotate()
    .resize({ width: MAX_STORED_SIDE_PX, height: MAX_STORED_SIDE_PX, fit: 'inside', withoutEnlargement: true });
  try {
    const { data, info } = await encoder(pipeline, contentType).toBuffer({ resolveWithObject: true });
    return { bytes: new Uint8Array(data), contentType, widthPx: info.width, heightPx: info.height };
  } catch {
    // libvips' own words name its internals, not the file: the person gets what to do instead.
    throw new AppError('bad_input', `The image in “${fileName}” could not be read: its data is damaged or cut short. Export the plan again and upload that.`, { field: 'file' });
  }
}
