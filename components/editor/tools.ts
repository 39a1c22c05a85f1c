// The drawing tools of the left strip.
export type ToolName = 'select' | 'draw' | 'split' | 'tee' | 'room' | 'pan' | 'scale';

export const TOOLS: readonly { name: ToolName; label: string; keys: string; hint: string }[] = [
  { name: 'select', label: 'Select', keys: 'V', hint: 'Click a point, segment or room to edit it; drag points or rooms to move them.' },
  { name: 'draw', label: 'Draw', keys: 'D', hint: 'Click to start at the fan end, click again for each bend; double-click or Escape to stop.' },
  { name: 'split', label: 'Split', keys: 'S', hint: 'Click on a segment to split it in two.' },
  { name: 'tee', label: 'Tee', keys: 'T', hint: 'Click on a segment where the tee goes, then click where its branch ends.' },
  { name: 'room', label: 'Room', keys: 'R', hint: 'Click one corner of a room, then the opposite corner; its size follows the plan scale.' },
  { name: 'pan', label: 'Pan', keys: 'H', hint: 'Drag to move around the plan; the wheel zooms.' },
  { name: 'scale', label: 'Scale', keys: 'K', hint: 'Click two points whose real distance you know, then type it.' },
];
