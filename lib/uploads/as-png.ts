// Re-encodes a stored plan image as PNG (sharp), for consumers that read PNG and JPEG only,
// such as the PDF renderer of the treatment schedule.
import sharp from 'sharp';

export async function imageAsPng(bytes: Uint8Array): Promise<Buffer> {
  return sharp(bytes).png().toBuffer();
}
