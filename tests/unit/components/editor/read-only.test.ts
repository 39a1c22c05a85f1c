// A plan the person may only read: the editor model refuses every edit, whatever asks for it, and
// only the tools that change nothing may be chosen.
import { describe, expect, it } from 'vitest';
import { editorReducer, initialModel, READ_ONLY_NOTICE, runCommand, type EditorAction, type EditorModel } from '@/components/editor/editor-model';
import { mayUseTool, TOOLS, toolOfAction } from '@/components/editor/tools';
import { COMMANDS, KEY_BINDINGS, type CommandName } from '@/lib/plan';
import { ROOM_PLAN_METRES_PER_PIXEL as SCALE, roomPlanDocument } from '../../plan/room-plan-fixture';

function readOnlyEditor() {
  let model: EditorModel = initialModel(roomPlanDocument(), 7, SCALE, false);
  return { model: () => model, dispatch: (action: EditorAction) => { model = editorReducer(model, action); } };
}

describe('read-only editor model', () => {
  it('refuses every command by name, says why, and keeps the document, history and save state', () => {
    const { model, dispatch } = readOnlyEditor();
    const before = model();
    for (const name of Object.keys(COMMANDS) as CommandName[]) {
      // The refusal comes before the arguments are read, so no command can slip through with valid ones.
      expect(runCommand(model(), dispatch, name, {} as never)).toBeNull();
      expect(model().notice).toBe(READ_ONLY_NOTICE);
    }
    expect(model().history).toBe(before.history);
    expect(model().saveStatus).toBe('saved');
  });

  it('refuses a document applied directly, undo, redo and a new scale', () => {
    const { model, dispatch } = readOnlyEditor();
    const before = model();
    const moved = { ...roomPlanDocument(), nodes: [] };
    for (const action of [{ type: 'apply', document: moved, state: before.state }, { type: 'undo' }, { type: 'redo' }, { type: 'set-scale', metresPerPixel: 0.05 }] as EditorAction[]) {
      dispatch(action);
      expect(model().history).toBe(before.history);
      expect(model().metresPerPixel).toBe(SCALE);
      expect(model().saveStatus).toBe('saved');
      expect(model().notice).toBe(READ_ONLY_NOTICE);
    }
  });

  it('still lets the person select', () => {
    const { model, dispatch } = readOnlyEditor();
    dispatch({ type: 'set-state', state: { ...model().state, selection: { nodeIds: ['outlet'], segmentIds: [] } } });
    expect(model().state.selection.nodeIds).toEqual(['outlet']);
    expect(model().notice).toBeNull();
  });

  it('an editable model takes the same command', () => {
    let model: EditorModel = initialModel(roomPlanDocument(), 7, SCALE, true);
    const dispatch = (action: EditorAction) => { model = editorReducer(model, action); };
    expect(runCommand(model, dispatch, 'delete-room', { roomId: 'recital' })).not.toBeNull();
    expect(model.history.present.rooms).toHaveLength(0);
  });
});

describe('tools on a read-only plan', () => {
  it('only Select and Pan may be used; every other tool changes the plan and is refused', () => {
    expect(TOOLS.filter((tool) => mayUseTool(tool.name, false)).map((tool) => tool.name)).toEqual(['select', 'pan']);
    for (const tool of TOOLS) expect(mayUseTool(tool.name, true)).toBe(true);
  });

  it('every tool has a key binding that chooses it, so keys and the tool strip go through one check', () => {
    for (const tool of TOOLS) {
      const binding = KEY_BINDINGS.find((candidate) => candidate.action === tool.action);
      expect(binding?.keys).toBe(tool.keys);
      expect(toolOfAction(tool.action)).toBe(tool.name);
    }
  });
});
