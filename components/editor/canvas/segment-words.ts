// Where a segment's words go (plan pixels): its label beside the middle on the up-left side, its
// size on the other side, far enough that each box clears the duct whichever way it runs. The
// canvas draws them here and keeps the words at the ends off them (box-clear.ts).
import type { DuctLine } from './box-clear';

export const LABEL_FONT_PX = 12;
export const SIZE_FONT_PX = 11;
const LABEL_OFFSET_PX = 9;
/** Plex Mono is 0.6 em a character. */
export const MONO_EM = 0.6;

export interface WordBox { readonly centreX: number; readonly centreY: number; readonly widthPx: number; readonly heightPx: number }

export interface SegmentWords { readonly label: WordBox | null; readonly size: WordBox | null }

/** The segment's words, or null for one not drawn (the size only on a segment long enough on screen to carry it). */
export function segmentWords(x1: number, y1: number, x2: number, y2: number, widthPx: number, scale: number, label: string | undefined, size: string | undefined): SegmentWords {
  const lengthPx = Math.hypot(x2 - x1, y2 - y1) || 1;
  const normalX = -(y2 - y1) / lengthPx;
  const normalY = (x2 - x1) / lengthPx;
  const flip = normalY > 0 || (normalY === 0 && normalX > 0) ? -1 : 1;
  const labelWidthPx = (label?.length ?? 0) * LABEL_FONT_PX * MONO_EM;
  const offset = (LABEL_OFFSET_PX + widthPx / 2) / scale;
  const labelBox = label ? { centreX: (x1 + x2) / 2 + flip * normalX * offset, centreY: (y1 + y2) / 2 + flip * normalY * offset, widthPx: labelWidthPx, heightPx: LABEL_FONT_PX } : null;
  const sizeWidthPx = (size?.length ?? 0) * SIZE_FONT_PX * MONO_EM;
  const sizeAwayPx = widthPx / 2 + 4 + (Math.abs(normalX) * sizeWidthPx + Math.abs(normalY) * SIZE_FONT_PX) / 2;
  const fits = lengthPx * scale >= sizeWidthPx + 2 * labelWidthPx + 16;
  const sizeBox = size && fits
    ? { centreX: (x1 + x2) / 2 - (flip * normalX * sizeAwayPx) / scale, centreY: (y1 + y2) / 2 - (flip * normalY * sizeAwayPx) / scale, widthPx: sizeWidthPx, heightPx: SIZE_FONT_PX }
    : null;
  return { label: labelBox, size: sizeBox };
}

/** A word's box as an obstacle line: through its middle, as thick as it is high (plan pixels). */
export function wordObstacle(box: WordBox, scale: number): DuctLine {
  const half = Math.max(0, box.widthPx - box.heightPx) / 2 / scale;
  return { x1: box.centreX - half, y1: box.centreY, x2: box.centreX + half, y2: box.centreY, halfWidth: box.heightPx / 2 / scale };
}
