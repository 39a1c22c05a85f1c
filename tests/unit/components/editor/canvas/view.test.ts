// The canvas view after the viewport is resized. Expected values are worked out by hand from
// the view's definition, screen = plan × scale + offset (common practice, no source).
import { describe, expect, it } from 'vitest';
import { fitView, keepCentre, screenToPlan, viewAfterResize, zoomAt, type View } from '@/components/editor/canvas/view';

const content = { widthPx: 4000, heightPx: 3000 };
const wide = { widthPx: 1000, heightPx: 600 };
const narrow = { widthPx: 600, heightPx: 500 };

function centreOf(view: View, viewport: { widthPx: number; heightPx: number }) {
  return screenToPlan(view, { x: viewport.widthPx / 2, y: viewport.heightPx / 2 });
}

describe('keepCentre', () => {
  it('keeps the scale and puts the old centre plan point at the new centre', () => {
    const view = { scale: 2, offsetX: -100, offsetY: 40 };
    // old centre (500, 300) on screen is plan ((500 + 100) / 2, (300 - 40) / 2) = (300, 130)
    const kept = keepCentre(view, wide, narrow);
    expect(kept).toEqual({ scale: 2, offsetX: 300 - 300 * 2, offsetY: 250 - 130 * 2 });
    expect(centreOf(kept, narrow)).toEqual({ x: 300, y: 130 });
  });
});

describe('viewAfterResize', () => {
  it('fits again while the person has not panned or zoomed since the last fit', () => {
    const fitted = fitView(content.widthPx, content.heightPx, wide.widthPx, wide.heightPx);
    const after = viewAfterResize(fitted, { content, from: wide, to: narrow, movedSinceFit: false });
    expect(after).toEqual(fitView(content.widthPx, content.heightPx, narrow.widthPx, narrow.heightPx));
    // (600 − 48) / 4000 = 0.138 is the narrower fit, against (600 − 48) / 3000 for the height
    expect(after.scale).toBeCloseTo(0.138, 12);
  });

  it('after a zoom, keeps the zoom and the plan point at the centre', () => {
    const fitted = fitView(content.widthPx, content.heightPx, wide.widthPx, wide.heightPx);
    const zoomed = zoomAt(fitted, { x: 200, y: 150 }, 3);
    const before = centreOf(zoomed, wide);
    const after = viewAfterResize(zoomed, { content, from: wide, to: narrow, movedSinceFit: true });
    expect(after.scale).toBe(zoomed.scale);
    const centre = centreOf(after, narrow);
    expect(centre.x).toBeCloseTo(before.x, 9);
    expect(centre.y).toBeCloseTo(before.y, 9);
  });

  it('fits when the old viewport had no size, even after a move', () => {
    const view = { scale: 3, offsetX: 10, offsetY: 10 };
    const after = viewAfterResize(view, { content, from: { widthPx: 0, heightPx: 0 }, to: wide, movedSinceFit: true });
    expect(after).toEqual(fitView(content.widthPx, content.heightPx, wide.widthPx, wide.heightPx));
  });
});
