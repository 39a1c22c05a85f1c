// move-room: a room dragged on the canvas. Expected values follow from the fixture's numbers
// (common practice, no source).
import { describe, expect, it } from 'vitest';
import { initialEditorState, parsePlanDocument, performCommand, tryCommand, type Point } from '@/lib/plan';
import { editorReducer, initialModel, runCommand, type EditorAction, type EditorModel } from '@/components/editor/editor-model';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../room-plan-fixture';

const state = initialEditorState();

function refusal(to: Point, roomId = 'recital'): string {
  const result = tryCommand('move-room', roomPlanDocument(), state, { roomId, to, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL });
  if (result.ok) throw new Error('the move was not refused');
  return result.error.message;
}

describe('move-room', () => {
  it('moves the corner and keeps size, finishes and listener; the outlet stays at its duct end, or the nearest point inside', () => {
    const before = roomPlanDocument();
    // Room from (300, 125) to (900, 525) px; the duct end at (250, 300) is 50 px (1 m) left of it.
    const { doc } = performCommand('move-room', before, state, { roomId: 'recital', to: { x: 300, y: 125 }, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL });
    const room = doc.rooms[0];
    expect({ ...room, outlet: before.rooms[0].outlet }).toEqual({ ...before.rooms[0], x: 300, y: 125 });
    expect(room.outlet.nodeId).toBe('outlet');
    expect(room.outlet.xM).toBe(0);
    expect(room.outlet.yM).toBeCloseTo((300 - 125) * ROOM_PLAN_METRES_PER_PIXEL, 9);
    expect(room.outlet.zM).toBe(before.rooms[0].outlet.zM);
    expect(doc.nodes).toEqual(before.nodes);
    expect(parsePlanDocument(doc).ok).toBe(true);
  });

  it('is one undo step in the editor model, and undo restores the room where it was', () => {
    let model: EditorModel = initialModel(roomPlanDocument(), 1, ROOM_PLAN_METRES_PER_PIXEL, true);
    const dispatch = (action: EditorAction) => { model = editorReducer(model, action); };
    runCommand(model, dispatch, 'move-room', { roomId: 'recital', to: { x: 400, y: 50 }, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL });
    expect(model.history.present.rooms[0]).toMatchObject({ x: 400, y: 50 });
    expect(model.history.past).toHaveLength(1);
    expect(model.saveStatus).toBe('unsaved');
    dispatch({ type: 'undo' });
    expect(model.history.present.rooms[0]).toMatchObject({ x: 50, y: 250 });
    expect(model.history.present).toEqual(roomPlanDocument());
    expect(model.saveStatus).toBe('saved');
  });

  it('refuses a non-finite or missing coordinate naming the field, and an unknown room naming its id', () => {
    expect(refusal({ x: Number.NaN, y: 10 })).toMatch(/^Room \(x\): x must be a finite number/);
    expect(refusal({ x: 10, y: Number.POSITIVE_INFINITY })).toMatch(/^Room \(y\): y must be a finite number/);
    expect(refusal({ x: 10 } as Point)).toMatch(/^Room \(y\): y must be a finite number/);
    expect(refusal({ x: 10, y: 10 }, 'gone')).toBe('There is no room with id "gone".');
  });

  it('a refused move in the editor changes nothing and says why', () => {
    let model: EditorModel = initialModel(roomPlanDocument(), 1, ROOM_PLAN_METRES_PER_PIXEL, true);
    const dispatch = (action: EditorAction) => { model = editorReducer(model, action); };
    expect(runCommand(model, dispatch, 'move-room', { roomId: 'recital', to: { x: Number.NaN, y: 0 }, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL })).toBeNull();
    expect(model.history.past).toHaveLength(0);
    expect(model.notice).toMatch(/Room \(x\)/);
  });
});
