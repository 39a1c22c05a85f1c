// What the canvas fits when a plan opens; expected values worked out by hand (common practice, no source).
import { describe, expect, it } from 'vitest';
import { GRID_AREA_PX, openingArea } from '@/components/editor/canvas/opening-area';
import { emptyDocument } from '@/lib/plan';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../../../plan/room-plan-fixture';

describe('openingArea', () => {
  it('a drawing is shown whole', () => {
    expect(openingArea(roomPlanDocument(), ROOM_PLAN_METRES_PER_PIXEL, { widthPx: 2400, heightPx: 1600 })).toEqual({ x: 0, y: 0, widthPx: 2400, heightPx: 1600 });
  });

  it('an empty blank-grid plan shows the whole grid', () => {
    expect(openingArea(emptyDocument(), 0.02, null)).toEqual({ x: 0, y: 0, ...GRID_AREA_PX });
  });

  it('a blank-grid plan shows its runs and rooms with 15 % to spare on each side, centred on them', () => {
    // drawn area (50, 200) 600 × 450 → 780 × 585 about its centre (350, 425)
    const area = openingArea(roomPlanDocument(), ROOM_PLAN_METRES_PER_PIXEL, null);
    expect(area.widthPx).toBeCloseTo(780, 9);
    expect(area.heightPx).toBeCloseTo(585, 9);
    expect(area.x + area.widthPx / 2).toBeCloseTo(350, 9);
    expect(area.y + area.heightPx / 2).toBeCloseTo(425, 9);
  });

  it('a small drawing is not blown up past 600 × 450 plan px', () => {
    // nodes only: 150 × 100 px → the minimum area, centred on (175, 250)
    const area = openingArea({ ...roomPlanDocument(), rooms: [] }, ROOM_PLAN_METRES_PER_PIXEL, null);
    expect(area).toEqual({ x: 175 - 300, y: 250 - 225, widthPx: 600, heightPx: 450 });
  });
});
