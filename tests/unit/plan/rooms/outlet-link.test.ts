// Where a room's outlet sits for its duct end, and how a stored outlet stands against its end.
// Expected values follow from the fixture's geometry: the room's corner at (50, 250) px, 12 m × 8 m
// at 20 mm per pixel, so it spans x 50–650 px and y 250–650 px; its duct end "outlet" at (250, 300).
import { describe, expect, it } from 'vitest';
import { checkedScale, moveEndToOutlet, outletLink, outletPlacementAt, placeOutletsAtEnds, PlanError, withOutletAt, type PlanDocument } from '@/lib/plan';
import { ROOM_PLAN_METRES_PER_PIXEL as SCALE, roomPlanDocument } from '../room-plan-fixture';

const TOLERANCE_DIGITS = 9;

function withEndAt(doc: PlanDocument, x: number, y: number): PlanDocument {
  return { ...doc, nodes: doc.nodes.map((node) => (node.id === 'outlet' ? { ...node, x, y } : node)) };
}

describe('outlet placement for a duct end', () => {
  const room = roomPlanDocument().rooms[0];

  it('an end inside the room is the outlet, in metres from the room corner', () => {
    const placement = outletPlacementAt(room, { x: 450, y: 500 }, SCALE);
    expect(placement.xM).toBeCloseTo(8, TOLERANCE_DIGITS);
    expect(placement.yM).toBeCloseTo(5, TOLERANCE_DIGITS);
    expect(placement.outsideByM).toBe(0);
  });

  it('an end outside puts the outlet at the nearest point inside and says how far out the end is', () => {
    // 50 px (1 m) right of the far wall and 50 px (1 m) above the near one: the corner (12, 0), √2 m away.
    const corner = outletPlacementAt(room, { x: 700, y: 200 }, SCALE);
    expect(corner.xM).toBe(12);
    expect(corner.yM).toBe(0);
    expect(corner.outsideByM).toBeCloseTo(Math.SQRT2, TOLERANCE_DIGITS);
    // Straight out through a wall: the outlet on that wall, level with the end.
    const wall = outletPlacementAt(room, { x: 0, y: 400 }, SCALE);
    expect(wall).toEqual({ xM: 0, yM: expect.closeTo(3, TOLERANCE_DIGITS), outsideByM: expect.closeTo(1, TOLERANCE_DIGITS) });
  });

  it('an end on a wall is inside', () => {
    expect(outletPlacementAt(room, { x: 650, y: 650 }, SCALE).outsideByM).toBe(0);
  });

  it('withOutletAt keeps the outlet height and its end', () => {
    const placed = withOutletAt(room, { x: 450, y: 500 }, SCALE);
    expect(placed.outlet).toEqual({ nodeId: 'outlet', xM: expect.closeTo(8, TOLERANCE_DIGITS), yM: expect.closeTo(5, TOLERANCE_DIGITS), zM: room.outlet.zM });
  });

  it('refuses a scale that is not a positive number of metres per pixel', () => {
    for (const bad of [0, -0.02, Number.NaN, Number.POSITIVE_INFINITY]) expect(() => checkedScale(bad)).toThrow(PlanError);
    expect(checkedScale(SCALE)).toBe(SCALE);
  });
});

describe('outlet link', () => {
  it('the fixture outlet sits at its end', () => {
    const doc = roomPlanDocument();
    expect(outletLink(doc, doc.rooms[0], SCALE)).toEqual({ kind: 'at-end', end: { x: 250, y: 300 } });
  });

  it('a room with no end is unlinked', () => {
    const doc = roomPlanDocument();
    const room = { ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, nodeId: null } };
    expect(outletLink(doc, room, SCALE)).toEqual({ kind: 'unlinked' });
  });

  it('an end outside the room with the outlet at the nearest point inside says how far out it is', () => {
    const doc = placeOutletsAtEnds(withEndAt(roomPlanDocument(), 250, 200), SCALE);
    const link = outletLink(doc, doc.rooms[0], SCALE);
    expect(link.kind).toBe('end-outside');
    expect(link.kind === 'end-outside' && link.outsideByM).toBeCloseTo(1, TOLERANCE_DIGITS);
  });

  it('an outlet stored away from its end (an older document) is apart, by the distance between them', () => {
    const doc = roomPlanDocument();
    // Outlet at (6, 1) m: (350, 300) px, 100 px (2 m) from the end at (250, 300).
    const room = { ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, xM: 6 } };
    const link = outletLink(doc, room, SCALE);
    expect(link.kind).toBe('apart');
    expect(link.kind === 'apart' && link.apartM).toBeCloseTo(2, TOLERANCE_DIGITS);
  });
});

describe('keeping rooms with their ends', () => {
  it('placeOutletsAtEnds moves only the rooms fed from the given end, and returns the same document when none is', () => {
    const doc = withEndAt(roomPlanDocument(), 450, 500);
    const other = { ...doc.rooms[0], id: 'other', outlet: { ...doc.rooms[0].outlet, nodeId: 'bend' } };
    const both = { ...doc, rooms: [doc.rooms[0], other] };
    const placed = placeOutletsAtEnds(both, SCALE, 'outlet');
    expect(placed.rooms[0].outlet).toMatchObject({ xM: expect.closeTo(8, TOLERANCE_DIGITS), yM: expect.closeTo(5, TOLERANCE_DIGITS) });
    expect(placed.rooms[1]).toBe(other);
    expect(placeOutletsAtEnds(both, SCALE, 'fan')).toBe(both);
  });

  it('moveEndToOutlet takes the end to an outlet placed by hand, and every room fed from it follows', () => {
    const doc = roomPlanDocument();
    const twin = { ...doc.rooms[0], id: 'twin', x: 0, y: 0 };
    // Outlet typed at (6, 2) m: (350, 350) px.
    const placed = { ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, xM: 6, yM: 2 } };
    const before = { ...doc, rooms: [placed, twin] };
    const moved = moveEndToOutlet(before, placed, SCALE);
    expect(moved.nodes.find((node) => node.id === 'outlet')).toEqual({ id: 'outlet', x: expect.closeTo(350, 6), y: expect.closeTo(350, 6) });
    expect(moved.rooms[1].outlet).toMatchObject({ xM: expect.closeTo(7, TOLERANCE_DIGITS), yM: expect.closeTo(7, TOLERANCE_DIGITS) });
    // An outlet already at its end leaves the document as it is.
    expect(moveEndToOutlet(doc, doc.rooms[0], SCALE)).toBe(doc);
  });
});
