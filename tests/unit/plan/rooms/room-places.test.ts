// A room's further outlets and listeners in the plan document: checked where they are saved and edited,
// kept with their duct ends, unlinked when the end is deleted; a saved plan without them reads as before.
import { describe, expect, it } from 'vitest';
import { initialEditorState, parsePlanDocument, performCommand, roomListeners, roomOutlets, tryCommand, type PlanDocument, type PlanRoom } from '@/lib/plan';
import { demoRecitalPlan, DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL } from '@/lib/plans/demo/recital-plan';

const state = initialEditorState();
const mpp = DEMO_METRES_PER_PIXEL;
const demo = () => demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
const errorsOf = (doc: unknown) => { const parsed = parsePlanDocument(doc); return parsed.ok ? [] : parsed.errors; };

describe('outlets and listeners of a room', () => {
  it('lists the first and the further ones; a room saved before there could be more has one of each and is furnished', () => {
    const doc = demo();
    const room = doc.rooms[0];
    expect(roomOutlets(room).map((outlet) => [outlet.id, outlet.nodeId])).toEqual([['outlet', 'recital-outlet'], ['recital-second-outlet', 'recital-outlet-2']]);
    expect(roomListeners(room).map((listener) => listener.name)).toEqual(['L1', 'L2']);
    const { extraOutlets: _o, extraListeners: _l, roomCorrection: _c, ...older } = room;
    const saved = { ...doc, rooms: [older] };
    expect(parsePlanDocument(saved).ok).toBe(true);
    expect(roomOutlets(older)).toHaveLength(1);
    expect((older as PlanRoom).roomCorrection ?? 'furnished').toBe('furnished');
  });

  it('the document schema names a second use of one end, an outlet outside the box, a missing point, a repeated listener name and an unknown correction', () => {
    const doc = demo();
    const room = doc.rooms[0];
    const bad = (change: object): PlanDocument => ({ ...doc, rooms: [{ ...room, ...change }] });
    expect(errorsOf(bad({ extraOutlets: [{ id: 'twice', nodeId: 'recital-outlet', xM: 2.8, yM: 1, zM: 5 }] })))
      .toEqual(['rooms[0].extraOutlets[0].nodeId: feeds the room already as its first outlet; one run end is one outlet']);
    expect(errorsOf(bad({ extraOutlets: [{ id: 'high', nodeId: null, xM: 1, yM: 1, zM: 7 }] }))).toEqual(['rooms[0].extraOutlets[0].zM: must be inside the room (at most its height, 6 m)']);
    expect(errorsOf(bad({ extraOutlets: [{ id: 'lost', nodeId: 'nowhere', xM: 1, yM: 1, zM: 5 }] }))).toEqual(['rooms[0].extraOutlets[0].nodeId: there is no point with id "nowhere" on the plan']);
    expect(errorsOf(bad({ extraListeners: [{ id: 'a', name: 'L1', xM: 1, yM: 1, zM: 1 }] }))).toEqual(['rooms[0].extraListeners[0].name: "L1" names another listener of this room already']);
    expect(errorsOf(bad({ roomCorrection: 'damp' }))).toEqual(["rooms[0].roomCorrection: must be 'furnished' (Schultz) or 'bare' (the room equation)"]);
  });

  it('the fan\'s speed range: the lowest may not exceed the highest', () => {
    const doc = demo();
    const run = doc.runs[0];
    expect(errorsOf({ ...doc, runs: [{ ...run, fan: { ...run.fan!, minRpm: 700, maxRpm: 605 } }] })).toEqual(['runs[0].fan.maxRpm: must be at least the lowest speed (700 rpm)']);
    expect(tryCommand('set-run-properties', doc, state, { runId: run.id, fan: { blades: 10, rpm: 605, minRpm: 0 } }).ok).toBe(false);
  });

  it('a further outlet follows its duct end when the end moves, and is unlinked when the end is deleted', () => {
    const doc = demo();
    const moved = performCommand('move-node', doc, state, { nodeId: 'recital-outlet-2', to: { x: 1000, y: 470 }, metresPerPixel: mpp }).doc;
    // the room's corner is at (380, 420) px: the end at x 1000 px is 12.4 m along [calc]
    expect(moved.rooms[0].extraOutlets?.[0]).toMatchObject({ xM: expect.closeTo(12.4, 9), yM: expect.closeTo(1, 9) });
    const chosen = performCommand('update-room', doc, state, { roomId: 'recital-room', changes: { extraOutlets: [{ id: 'x', nodeId: 'recital-outlet-2', xM: 0, yM: 0, zM: 5 }] }, metresPerPixel: mpp }).doc;
    expect(chosen.rooms[0].extraOutlets?.[0]).toMatchObject({ xM: expect.closeTo(11.8, 9), yM: expect.closeTo(1, 9), zM: 5 });
    const twice = tryCommand('update-room', doc, state, { roomId: 'recital-room', changes: { extraOutlets: [{ id: 'x', nodeId: 'recital-outlet', xM: 0, yM: 0, zM: 5 }] }, metresPerPixel: mpp });
    expect(twice.ok === false && twice.error.message).toBe('Room outlet 2 end: feeds the room already as its first outlet; one run end is one outlet.');
    const withoutEnd = performCommand('delete-selection', doc, { ...state, selection: { nodeIds: ['recital-outlet-2'], segmentIds: [] } }, {}).doc;
    expect(withoutEnd.rooms[0].extraOutlets?.[0].nodeId).toBeNull();
    expect(parsePlanDocument(withoutEnd).ok).toBe(true);
  });
});
