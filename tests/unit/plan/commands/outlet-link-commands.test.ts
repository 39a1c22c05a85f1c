// The outlet belongs to the duct end that feeds it, through the commands that move either one, each
// one undo step in the editor. Fixture geometry: the room spans x 50–650 px and y 250–650 px at 20 mm
// per pixel; its duct end "outlet" is at (250, 300) px, the outlet at (4, 1) m.
import { describe, expect, it } from 'vitest';
import { editorReducer, initialModel, runCommand, type EditorAction, type EditorModel } from '@/components/editor/editor-model';
import { findNode, initialEditorState, outletLink, parsePlanDocument, performCommand, tryCommand, type PlanDocument } from '@/lib/plan';
import { ROOM_PLAN_METRES_PER_PIXEL as SCALE, roomPlanDocument } from '../room-plan-fixture';

const state = initialEditorState();
const DIGITS = 9;
const end = (doc: PlanDocument) => findNode(doc, 'outlet');

function editor(): { model: () => EditorModel; dispatch: (action: EditorAction) => void } {
  let model = initialModel(roomPlanDocument(), 1, SCALE, true);
  return { model: () => model, dispatch: (action) => { model = editorReducer(model, action); } };
}

describe('moving the duct end moves the outlet', () => {
  it('move-node inside the room: the outlet follows, its height stays', () => {
    const { doc } = performCommand('move-node', roomPlanDocument(), state, { nodeId: 'outlet', to: { x: 450, y: 500 }, metresPerPixel: SCALE });
    expect(doc.rooms[0].outlet).toEqual({ nodeId: 'outlet', xM: expect.closeTo(8, DIGITS), yM: expect.closeTo(5, DIGITS), zM: 4.7 });
    expect(outletLink(doc, doc.rooms[0], SCALE).kind).toBe('at-end');
    expect(parsePlanDocument(doc).ok).toBe(true);
  });

  it('move-node out of the room: the outlet stays at the nearest point inside and the link says the end is outside', () => {
    // 100 px (2 m) above the room's near wall.
    const { doc } = performCommand('move-node', roomPlanDocument(), state, { nodeId: 'outlet', to: { x: 250, y: 150 }, metresPerPixel: SCALE });
    expect(doc.rooms[0].outlet).toMatchObject({ xM: expect.closeTo(4, DIGITS), yM: 0 });
    const link = outletLink(doc, doc.rooms[0], SCALE);
    expect(link.kind === 'end-outside' && link.outsideByM).toBeCloseTo(2, DIGITS);
  });

  it('move-node of a point that feeds no room leaves the rooms alone', () => {
    const before = roomPlanDocument();
    const { doc } = performCommand('move-node', before, state, { nodeId: 'bend', to: { x: 300, y: 200 }, metresPerPixel: SCALE });
    expect(doc.rooms).toEqual(before.rooms);
  });

  it('move-node without a usable scale is refused', () => {
    const result = tryCommand('move-node', roomPlanDocument(), state, { nodeId: 'outlet', to: { x: 450, y: 500 }, metresPerPixel: 0 });
    expect(result.ok === false && result.error.message).toMatch(/plan scale/);
  });

  it('in the editor a drag of the end is one undo step that restores end and outlet together', () => {
    const { model, dispatch } = editor();
    runCommand(model(), dispatch, 'move-node', { nodeId: 'outlet', to: { x: 450, y: 500 }, metresPerPixel: SCALE });
    expect(model().history.past).toHaveLength(1);
    expect(model().history.present.rooms[0].outlet.xM).toBeCloseTo(8, DIGITS);
    dispatch({ type: 'undo' });
    expect(model().history.present).toEqual(roomPlanDocument());
    dispatch({ type: 'redo' });
    expect(end(model().history.present)).toEqual({ id: 'outlet', x: 450, y: 500 });
    expect(model().history.present.rooms[0].outlet.yM).toBeCloseTo(5, DIGITS);
  });
});

describe('placing the outlet in the room form moves the duct end', () => {
  it('update-room with a new outlet place takes the end there, one undo step', () => {
    const { model, dispatch } = editor();
    const outlet = { ...roomPlanDocument().rooms[0].outlet, xM: 6, yM: 2 };
    runCommand(model(), dispatch, 'update-room', { roomId: 'recital', changes: { outlet }, metresPerPixel: SCALE });
    const doc = model().history.present;
    // (6, 2) m from the corner (50, 250) px: (350, 350) px.
    expect(end(doc)).toEqual({ id: 'outlet', x: expect.closeTo(350, 6), y: expect.closeTo(350, 6) });
    expect(doc.rooms[0].outlet).toEqual(outlet);
    expect(model().history.past).toHaveLength(1);
    dispatch({ type: 'undo' });
    expect(model().history.present).toEqual(roomPlanDocument());
  });

  it('an outlet placed outside the room is refused and nothing moves', () => {
    const outlet = { ...roomPlanDocument().rooms[0].outlet, xM: 13 };
    const result = tryCommand('update-room', roomPlanDocument(), state, { roomId: 'recital', changes: { outlet }, metresPerPixel: SCALE });
    expect(result.ok === false && result.error.message).toMatch(/outlet x: must be inside the room/);
  });

  it('choosing the end that feeds the room puts the outlet at that end', () => {
    const doc = roomPlanDocument();
    const unlinked = performCommand('update-room', doc, state, { roomId: 'recital', changes: { outlet: { nodeId: null, xM: 6, yM: 6, zM: 4.7 } }, metresPerPixel: SCALE }).doc;
    expect(unlinked.rooms[0].outlet).toEqual({ nodeId: null, xM: 6, yM: 6, zM: 4.7 });
    expect(end(unlinked)).toEqual(end(doc));
    const linked = performCommand('update-room', unlinked, state, { roomId: 'recital', changes: { outlet: { ...unlinked.rooms[0].outlet, nodeId: 'outlet' } }, metresPerPixel: SCALE }).doc;
    expect(linked.rooms[0].outlet).toEqual({ nodeId: 'outlet', xM: expect.closeTo(4, DIGITS), yM: expect.closeTo(1, DIGITS), zM: 4.7 });
    expect(end(linked)).toEqual(end(doc));
  });

  it('a room made smaller than the place of its end keeps the outlet on its wall, nearest the end', () => {
    // 3 m long: the room ends at x = 200 px, 50 px (1 m) short of the end (the listener moved in with it).
    const changes = { lengthM: 3, listener: { xM: 1.5, yM: 4, zM: 1.2 } };
    const { doc } = performCommand('update-room', roomPlanDocument(), state, { roomId: 'recital', changes, metresPerPixel: SCALE });
    expect(doc.rooms[0].outlet).toMatchObject({ xM: 3, yM: expect.closeTo(1, DIGITS) });
    expect(outletLink(doc, doc.rooms[0], SCALE).kind).toBe('end-outside');
  });

  it('any room change joins an outlet stored away from its end (an older document) back to it', () => {
    const doc = roomPlanDocument();
    const apart = { ...doc, rooms: [{ ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, xM: 6 } }] };
    expect(outletLink(apart, apart.rooms[0], SCALE).kind).toBe('apart');
    const joined = performCommand('update-room', apart, state, { roomId: 'recital', changes: {}, metresPerPixel: SCALE }).doc;
    expect(outletLink(joined, joined.rooms[0], SCALE).kind).toBe('at-end');
    expect(end(joined)).toEqual(end(doc));
  });
});

describe('a new plan scale', () => {
  it('keeps drawn points and places each linked outlet again at its end', () => {
    const { model, dispatch } = editor();
    dispatch({ type: 'set-scale', metresPerPixel: 0.01 });
    const doc = model().history.present;
    expect(doc.nodes).toEqual(roomPlanDocument().nodes);
    // The end is 200 px and 50 px from the corner: 2 m and 0.5 m at 10 mm per pixel.
    expect(doc.rooms[0].outlet).toMatchObject({ xM: expect.closeTo(2, DIGITS), yM: expect.closeTo(0.5, DIGITS) });
    expect(model().metresPerPixel).toBe(0.01);
    expect(model().saveStatus).toBe('unsaved');
  });
});
