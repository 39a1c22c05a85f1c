// Keyboard shortcuts, listed in the help overlay. "Ctrl" means Cmd on macOS.
import type { CommandName } from './define';

export type EditorAction =
  | Extract<CommandName, 'delete-selection'>
  | 'undo'
  | 'redo'
  | 'tool-select'
  | 'tool-draw'
  | 'tool-split'
  | 'tool-tee'
  | 'tool-room'
  | 'tool-pan'
  | 'tool-scale'
  | 'tool-origin'
  | 'cancel';

export interface KeyBinding {
  /** As shown to people, e.g. "Ctrl+Shift+Z". */
  readonly keys: string;
  readonly action: EditorAction;
  readonly description: string;
}

export const KEY_BINDINGS: readonly KeyBinding[] = [
  { keys: 'V', action: 'tool-select', description: 'Select and move points and segments' },
  { keys: 'D', action: 'tool-draw', description: 'Draw segments: click to add points, Escape to stop' },
  { keys: 'S', action: 'tool-split', description: 'Split a segment where you click' },
  { keys: 'T', action: 'tool-tee', description: 'Add a tee on a segment and draw its branch' },
  { keys: 'R', action: 'tool-room', description: 'Draw a room from two opposite corners' },
  { keys: 'H', action: 'tool-pan', description: 'Pan: drag to move around the plan' },
  { keys: 'K', action: 'tool-scale', description: 'Set the scale from two points and their real distance' },
  { keys: 'G', action: 'tool-origin', description: 'Start the grid at a point you click' },
  { keys: 'Delete', action: 'delete-selection', description: 'Delete the selection' },
  { keys: 'Backspace', action: 'delete-selection', description: 'Delete the selection' },
  { keys: 'Ctrl+Z', action: 'undo', description: 'Undo' },
  { keys: 'Ctrl+Shift+Z', action: 'redo', description: 'Redo' },
  { keys: 'Ctrl+Y', action: 'redo', description: 'Redo' },
  { keys: 'Escape', action: 'cancel', description: 'Stop drawing, or clear the selection' },
];

export interface KeyPress {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

function describePress(press: KeyPress): string {
  const key = press.key.length === 1 ? press.key.toUpperCase() : press.key;
  return [press.ctrlKey || press.metaKey ? 'Ctrl' : null, press.shiftKey ? 'Shift' : null, press.altKey ? 'Alt' : null, key].filter((part) => part !== null).join('+');
}

/** The action bound to a key press (Cmd counts as Ctrl), or null. */
export function matchKeyBinding(press: KeyPress): EditorAction | null {
  const pressed = describePress(press);
  return KEY_BINDINGS.find((binding) => binding.keys === pressed)?.action ?? null;
}
