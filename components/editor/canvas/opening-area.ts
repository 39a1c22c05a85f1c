// What the canvas fits when a plan opens (and again after a resize, until the person pans or zooms):
// the whole drawing when there is one; on the blank grid, the drawn runs and rooms with a margin
// around them, or the whole grid while nothing is drawn.
import { drawnArea, type PlanArea, type PlanDocument } from '@/lib/plan';

/** The blank grid's extent, plan pixels. */
export const GRID_AREA_PX = { widthPx: 4000, heightPx: 3000 };
/** Margin around the drawn parts, as a fraction of their size on each side. */
const MARGIN_FRACTION = 0.15;
/** The smallest area fitted, plan pixels, so a lone short segment does not fill the screen. */
const MIN_AREA_PX = { widthPx: 600, heightPx: 450 };

export function openingArea(document: PlanDocument, metresPerPixel: number, background: { widthPx: number; heightPx: number } | null): PlanArea {
  if (background) return { x: 0, y: 0, widthPx: background.widthPx, heightPx: background.heightPx };
  const drawn = drawnArea(document, metresPerPixel);
  if (!drawn) return { x: 0, y: 0, ...GRID_AREA_PX };
  const widthPx = Math.max(MIN_AREA_PX.widthPx, drawn.widthPx * (1 + 2 * MARGIN_FRACTION));
  const heightPx = Math.max(MIN_AREA_PX.heightPx, drawn.heightPx * (1 + 2 * MARGIN_FRACTION));
  return { x: drawn.x + drawn.widthPx / 2 - widthPx / 2, y: drawn.y + drawn.heightPx / 2 - heightPx / 2, widthPx, heightPx };
}
