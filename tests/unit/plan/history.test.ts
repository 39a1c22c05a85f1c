import { describe, expect, it } from 'vitest';
import { canRedo, canUndo, createHistory, emptyDocument, performCommand, push, redo, undo, type PlanDocument } from '@/lib/plan';
import { drawChain } from './fixtures';

describe('history', () => {
  it('undo and redo round-trip every command of a short session', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    let history = push(createHistory<PlanDocument>(emptyDocument()), chain.doc);
    const steps = [
      performCommand('split-segment', chain.doc, chain.state, { segmentId: chain.doc.segments[0].id, at: { x: 50, y: 0 } }),
    ];
    steps.push(performCommand('move-node', steps[0].doc, steps[0].state, { nodeId: steps[0].state.selection.nodeIds[0], to: { x: 50, y: 40 }, metresPerPixel: 0.01 }));
    steps.push(performCommand('delete-selection', steps[1].doc, steps[1].state, {}));
    for (const step of steps) history = push(history, step.doc);
    const snapshots = [emptyDocument(), chain.doc, ...steps.map((step) => step.doc)];
    for (let index = snapshots.length - 2; index >= 0; index -= 1) {
      history = undo(history);
      expect(history.present).toEqual(snapshots[index]);
    }
    expect(canUndo(history)).toBe(false);
    expect(undo(history)).toBe(history);
    for (let index = 1; index < snapshots.length; index += 1) {
      history = redo(history);
      expect(history.present).toBe(snapshots[index]);
    }
    expect(canRedo(history)).toBe(false);
  });

  it('a new edit after undo clears redo; pushing the present changes nothing', () => {
    let history = push(push(createHistory('a'), 'b'), 'c');
    history = undo(history);
    expect(canRedo(history)).toBe(true);
    history = push(history, 'd');
    expect(canRedo(history)).toBe(false);
    expect(history.past).toEqual(['a', 'b']);
    expect(push(history, history.present)).toBe(history);
  });

  it('keeps at most the limit of undo steps', () => {
    let history = createHistory(0, 3);
    for (let value = 1; value <= 10; value += 1) history = push(history, value);
    expect(history.past).toEqual([7, 8, 9]);
  });
});
