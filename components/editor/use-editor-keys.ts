'use client';

// The editor's keyboard shortcuts (lib/plan KEY_BINDINGS). Each one goes through the same door as
// its button: tools through chooseTool, edits through the model, which refuses them on a plan the
// person may only read.
import { useEffect, useRef, type Dispatch, type MutableRefObject } from 'react';
import { EMPTY_SELECTION, matchKeyBinding } from '@/lib/plan';
import { runCommand, type EditorAction, type EditorModel } from './editor-model';
import { toolOfAction, type ToolName } from './tools';

interface EditorKeys {
  modelRef: MutableRefObject<EditorModel>;
  dispatch: Dispatch<EditorAction>;
  chooseTool: (tool: ToolName) => void;
  /** Escape: stop what the tool was doing. */
  cancelTool: () => void;
  setHelpOpen: (open: boolean | ((open: boolean) => boolean)) => void;
}

const TYPED_INPUT_TYPES = new Set(['text', 'search', 'number', 'email', 'password', 'url', 'tel', 'date', 'time']);

/** Where a key press is typing: a text field, a text area, a list box, editable text. Buttons, radios, checkboxes and tabs are not. */
function isTypingIn(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target.closest('textarea, select, [contenteditable="true"]')) return true;
  return target instanceof HTMLInputElement && TYPED_INPUT_TYPES.has(target.type);
}

export function useEditorKeys(keys: EditorKeys): void {
  const latest = useRef(keys);
  latest.current = keys;

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      // Escape in a text field leaves it, so the next key chooses a tool again.
      if (isTypingIn(event.target)) {
        if (event.key === 'Escape' && event.target instanceof HTMLElement && event.target.closest('aside')) event.target.blur();
        return;
      }
      const { modelRef, dispatch, chooseTool, cancelTool, setHelpOpen } = latest.current;
      if (event.key === '?') { setHelpOpen((open) => !open); return; }
      const action = matchKeyBinding(event);
      if (!action) return;
      event.preventDefault();
      if (action === 'cancel') {
        cancelTool();
        setHelpOpen(false);
        dispatch({ type: 'set-state', state: { ...modelRef.current.state, selection: EMPTY_SELECTION } });
      } else if (action === 'undo' || action === 'redo') {
        dispatch({ type: action });
      } else if (action === 'delete-selection') {
        runCommand(modelRef.current, dispatch, 'delete-selection', {});
      } else {
        const tool = toolOfAction(action);
        if (tool) chooseTool(tool);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
