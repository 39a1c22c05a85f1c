// The part of the plan that holds something: every duct node and every room outline, plan pixels.
import type { PlanDocument } from './document';
import { roomRectPx } from './rooms/room-input';

export interface PlanArea { x: number; y: number; widthPx: number; heightPx: number }

/** The bounding box of the drawn runs and rooms; null for an empty plan. */
export function drawnArea(document: PlanDocument, metresPerPixel: number): PlanArea | null {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  const include = (x: number, y: number) => {
    minX = Math.min(minX, x); minY = Math.min(minY, y);
    maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
  };
  for (const node of document.nodes) include(node.x, node.y);
  for (const room of document.rooms) {
    const rect = roomRectPx(room, metresPerPixel);
    include(rect.x, rect.y);
    include(rect.x + rect.width, rect.y + rect.height);
  }
  if (!Number.isFinite(minX)) return null;
  return { x: minX, y: minY, widthPx: maxX - minX, heightPx: maxY - minY };
}
