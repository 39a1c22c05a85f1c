// How large a plan drawing may be, in pixels. A drawing is checked by its declared size before any
// decoding (a small file can declare an enormous image), decoded under the same cap, and stored with
// its longest side at most MAX_STORED_SIDE_PX; a PDF page is drawn at that size at most.
import { AppError } from '@/lib/errors';

/** Declared size accepted for decoding: 100 megapixels (an A0 sheet scanned at 300 dpi is about 140; at 200 dpi, 62). */
export const MAX_DECODED_PIXELS = 100_000_000;

/**
 * Longest side of a stored drawing, px: an A1 sheet at about 180 dpi or an A0 sheet at 128 dpi, so 2 mm
 * lettering stays legible; the browser holds it in about 100 MB, and a PDF page this large takes a few seconds to draw.
 */
export const MAX_STORED_SIDE_PX = 6000;

/** Longest side of the drawing printed in a treatment schedule, px: about 340 dpi across the 7 in figure. */
export const MAX_PRINTED_SIDE_PX = 2400;

/** Refuses a drawing whose declared size is over the cap, before it is decoded. */
export function assertDeclaredPixels(widthPx: number, heightPx: number, fileName: string): void {
  const pixels = widthPx * heightPx;
  if (pixels <= MAX_DECODED_PIXELS) return;
  throw new AppError(
    'bad_input',
    `“${fileName}” is ${widthPx} × ${heightPx} pixels (${Math.round(pixels / 1e6)} megapixels); drawings of up to ${MAX_DECODED_PIXELS / 1e6} megapixels are accepted. Export the plan at a lower resolution.`,
    { field: 'file' },
  );
}
