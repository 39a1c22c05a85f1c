// The canvas view: plan coordinates (pixels of the plan) ↔ screen pixels.
import type { Point } from '@/lib/plan/geometry';

export interface View { scale: number; offsetX: number; offsetY: number }

export const MIN_SCALE = 0.05;
export const MAX_SCALE = 20;

export function screenToPlan(view: View, screen: Point): Point {
  return { x: (screen.x - view.offsetX) / view.scale, y: (screen.y - view.offsetY) / view.scale };
}

// Zoom by `factor` keeping the plan point under the pointer still.
export function zoomAt(view: View, screen: Point, factor: number): View {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, view.scale * factor));
  const anchor = screenToPlan(view, screen);
  return { scale, offsetX: screen.x - anchor.x * scale, offsetY: screen.y - anchor.y * scale };
}

// A view that fits a plan area of the given size into the viewport with a margin.
export function fitView(contentWidthPx: number, contentHeightPx: number, viewportWidthPx: number, viewportHeightPx: number): View {
  const margin = 24;
  const scale = Math.min((viewportWidthPx - 2 * margin) / contentWidthPx, (viewportHeightPx - 2 * margin) / contentHeightPx, 4);
  const safeScale = Number.isFinite(scale) && scale > 0 ? scale : 1;
  return {
    scale: safeScale,
    offsetX: (viewportWidthPx - contentWidthPx * safeScale) / 2,
    offsetY: (viewportHeightPx - contentHeightPx * safeScale) / 2,
  };
}
