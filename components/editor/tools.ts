// The drawing tools of the left strip, each with the key action that chooses it and whether it
// changes the plan. A tool that changes the plan is off (not only hidden) for read-only roles.
import type { EditorAction } from '@/lib/plan';

export type ToolName = 'select' | 'draw' | 'split' | 'tee' | 'room' | 'pan' | 'scale' | 'origin';

export interface Tool {
  readonly name: ToolName;
  readonly label: string;
  readonly keys: string;
  readonly action: EditorAction;
  /** Using the tool edits the document or the scale; the select tool only edits by dragging, which the canvas allows only when editable. */
  readonly changesPlan: boolean;
  readonly hint: string;
}

export const TOOLS: readonly Tool[] = [
  { name: 'select', label: 'Select', keys: 'V', action: 'tool-select', changesPlan: false, hint: 'Click a point, segment or room to edit it; drag points or rooms to move them.' },
  { name: 'draw', label: 'Draw', keys: 'D', action: 'tool-draw', changesPlan: true, hint: 'Click to start at the fan end, click again for each bend; double-click or Escape to stop.' },
  { name: 'split', label: 'Split', keys: 'S', action: 'tool-split', changesPlan: true, hint: 'Click on a segment to split it in two.' },
  { name: 'tee', label: 'Tee', keys: 'T', action: 'tool-tee', changesPlan: true, hint: 'Click on a segment where the tee goes, then click where its branch ends.' },
  { name: 'room', label: 'Room', keys: 'R', action: 'tool-room', changesPlan: true, hint: 'Click one corner of a room, then the opposite corner; its size follows the plan scale.' },
  { name: 'pan', label: 'Pan', keys: 'H', action: 'tool-pan', changesPlan: false, hint: 'Drag to move around the plan; the wheel zooms.' },
  { name: 'scale', label: 'Scale', keys: 'K', action: 'tool-scale', changesPlan: true, hint: 'Click two points whose real distance you know, then type it; the grid starts at the first.' },
  { name: 'origin', label: 'Grid origin', keys: 'G', action: 'tool-origin', changesPlan: true, hint: 'Click where the grid should start, for example a column line on the drawing.' },
];

/** The tool a key action chooses, if it chooses one. */
export function toolOfAction(action: EditorAction): ToolName | null {
  return TOOLS.find((tool) => tool.action === action)?.name ?? null;
}

/** Whether the tool may be used: any tool on a plan the person may change; otherwise only tools listed as not changing it. */
export function mayUseTool(name: ToolName, editable: boolean): boolean {
  return editable || TOOLS.some((tool) => tool.name === name && !tool.changesPlan);
}
