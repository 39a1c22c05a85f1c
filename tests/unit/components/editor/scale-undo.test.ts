// A new scale and a moved grid origin are edits like any other: one undo step each, undone and
// redone with the document, and saved with it.
import { describe, expect, it } from 'vitest';
import { editorReducer, initialModel, runCommand, type EditorAction, type EditorModel } from '@/components/editor/editor-model';
import { ROOM_PLAN_METRES_PER_PIXEL as SCALE, roomPlanDocument } from '../../plan/room-plan-fixture';

function editor() {
  let model: EditorModel = initialModel(roomPlanDocument(), 1, SCALE, true);
  return { model: () => model, dispatch: (action: EditorAction) => { model = editorReducer(model, action); } };
}

describe('undoing the scale and the grid origin', () => {
  it('a new scale is one undo step; undo gives back the old scale and document, redo the new', () => {
    const { model, dispatch } = editor();
    dispatch({ type: 'set-scale', metresPerPixel: 0.02, gridOrigin: { x: 120, y: 40 } });
    expect(model().metresPerPixel).toBe(0.02);
    expect(model().history.present.gridOrigin).toEqual({ x: 120, y: 40 });
    expect(model().saveStatus).toBe('unsaved');
    dispatch({ type: 'undo' });
    expect(model().metresPerPixel).toBe(SCALE);
    expect(model().history.present.gridOrigin).toBeUndefined();
    expect(model().saveStatus).toBe('saved');
    dispatch({ type: 'redo' });
    expect(model().metresPerPixel).toBe(0.02);
    expect(model().history.present.gridOrigin).toEqual({ x: 120, y: 40 });
  });

  it('edits after a new scale keep it; undoing them steps back through the scale in order', () => {
    const { model, dispatch } = editor();
    dispatch({ type: 'set-scale', metresPerPixel: 0.02 });
    runCommand(model(), dispatch, 'set-grid-origin', { origin: { x: 10, y: 20 } });
    expect(model().metresPerPixel).toBe(0.02);
    dispatch({ type: 'undo' });
    expect(model().metresPerPixel).toBe(0.02);
    expect(model().history.present.gridOrigin).toBeUndefined();
    dispatch({ type: 'undo' });
    expect(model().metresPerPixel).toBe(SCALE);
    expect(model().history.past).toHaveLength(0);
    expect(model().scales.past).toHaveLength(0);
  });

  it('the grid origin goes back to the drawing corner when cleared, and refuses a point off the plan', () => {
    const { model, dispatch } = editor();
    runCommand(model(), dispatch, 'set-grid-origin', { origin: { x: 10, y: 20 } });
    runCommand(model(), dispatch, 'set-grid-origin', { origin: null });
    expect('gridOrigin' in model().history.present).toBe(false);
    expect(runCommand(model(), dispatch, 'set-grid-origin', { origin: { x: Number.NaN, y: 0 } })).toBeNull();
    expect(model().notice).toMatch(/^Grid origin/);
  });
});
