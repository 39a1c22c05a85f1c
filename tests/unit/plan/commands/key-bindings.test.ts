import { describe, expect, it } from 'vitest';
import { KEY_BINDINGS, matchKeyBinding } from '@/lib/plan';

const press = (key: string, modifiers: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...modifiers });

describe('key bindings', () => {
  it('every binding has keys and a plain description, and no keys repeat', () => {
    expect(KEY_BINDINGS.every((binding) => binding.keys.length > 0 && binding.description.length > 0)).toBe(true);
    expect(new Set(KEY_BINDINGS.map((binding) => binding.keys)).size).toBe(KEY_BINDINGS.length);
  });

  it('maps presses to actions; Cmd counts as Ctrl', () => {
    expect(matchKeyBinding(press('Delete'))).toBe('delete-selection');
    expect(matchKeyBinding(press('Backspace'))).toBe('delete-selection');
    expect(matchKeyBinding(press('z', { ctrlKey: true }))).toBe('undo');
    expect(matchKeyBinding(press('z', { metaKey: true, shiftKey: true }))).toBe('redo');
    expect(matchKeyBinding(press('y', { ctrlKey: true }))).toBe('redo');
    expect(matchKeyBinding(press('s'))).toBe('tool-split');
    expect(matchKeyBinding(press('t'))).toBe('tool-tee');
    expect(matchKeyBinding(press('d'))).toBe('tool-draw');
    expect(matchKeyBinding(press('v'))).toBe('tool-select');
    expect(matchKeyBinding(press('r'))).toBe('tool-room');
    expect(matchKeyBinding(press('h'))).toBe('tool-pan');
    expect(matchKeyBinding(press('k'))).toBe('tool-scale');
    expect(matchKeyBinding(press('Escape'))).toBe('cancel');
    expect(matchKeyBinding(press('q'))).toBeNull();
  });
});
