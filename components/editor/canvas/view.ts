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

// A view that fits a plan area of the given size, whose top-left corner is (originX, originY) in
// plan pixels, into the viewport with a margin, centred.
export function fitView(contentWidthPx: number, contentHeightPx: number, viewportWidthPx: number, viewportHeightPx: number, originX = 0, originY = 0): View {
  const margin = 24;
  const scale = Math.min((viewportWidthPx - 2 * margin) / contentWidthPx, (viewportHeightPx - 2 * margin) / contentHeightPx, 4);
  const safeScale = Number.isFinite(scale) && scale > 0 ? scale : 1;
  return {
    scale: safeScale,
    offsetX: (viewportWidthPx - contentWidthPx * safeScale) / 2 - originX * safeScale,
    offsetY: (viewportHeightPx - contentHeightPx * safeScale) / 2 - originY * safeScale,
  };
}

// A width and height in pixels: of the viewport (screen) or of the plan area (plan pixels).
export interface SizePx { widthPx: number; heightPx: number }

// The same scale, moved so that the plan point at the centre of the old viewport sits at the
// centre of the new one.
export function keepCentre(view: View, from: SizePx, to: SizePx): View {
  const centre = screenToPlan(view, { x: from.widthPx / 2, y: from.heightPx / 2 });
  return { scale: view.scale, offsetX: to.widthPx / 2 - centre.x * view.scale, offsetY: to.heightPx / 2 - centre.y * view.scale };
}

// The view after the viewport changes size: fitted again while the person has not panned or
// zoomed since the last fit (or the old viewport was empty), otherwise the centre is kept.
export interface Resize {
  /** The plan area that a fit shows whole, plan pixels (top-left corner at x, y; 0, 0 when absent). */
  content: SizePx & { x?: number; y?: number };
  from: SizePx;
  to: SizePx;
  movedSinceFit: boolean;
}

export function viewAfterResize(view: View, { content, from, to, movedSinceFit }: Resize): View {
  const wasEmpty = from.widthPx <= 0 || from.heightPx <= 0;
  if (!movedSinceFit || wasEmpty) return fitView(content.widthPx, content.heightPx, to.widthPx, to.heightPx, content.x, content.y);
  return keepCentre(view, from, to);
}
