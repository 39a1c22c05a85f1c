// The drawn part of a plan: worked out by hand from the fixture's coordinates (common practice, no source).
import { describe, expect, it } from 'vitest';
import { drawnArea, emptyDocument } from '@/lib/plan';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from './room-plan-fixture';

describe('drawnArea', () => {
  it('is null for an empty plan', () => {
    expect(drawnArea(emptyDocument(), 0.02)).toBeNull();
  });

  it('spans the duct nodes and the room outlines', () => {
    // nodes (100, 200), (250, 200), (250, 300); room corner (50, 250), 12 m × 8 m at 20 mm/px = 600 × 400 px
    expect(drawnArea(roomPlanDocument(), ROOM_PLAN_METRES_PER_PIXEL)).toEqual({ x: 50, y: 200, widthPx: 600, heightPx: 450 });
  });

  it('without rooms, only the nodes', () => {
    expect(drawnArea({ ...roomPlanDocument(), rooms: [] }, ROOM_PLAN_METRES_PER_PIXEL)).toEqual({ x: 100, y: 200, widthPx: 150, heightPx: 100 });
  });
});
