import { describe, expect, it } from 'vitest';
import { emptyDocument, initialEditorState, performCommand, sequentialIds, tryCommand, validateRunTree } from '@/lib/plan';
import { drawChain, nodeAt } from '../fixtures';

describe('draw-segment', () => {
  it('from empty space to empty space creates a run: Ø 250 mm, closed start, open unflanged end, 20 °C', () => {
    const { doc, state } = performCommand('draw-segment', emptyDocument(), initialEditorState(), { from: { point: { x: 0, y: 0 } }, to: { point: { x: 50, y: 0 } } }, sequentialIds('n'));
    expect(doc.nodes).toEqual([{ id: 'n1', x: 0, y: 0 }, { id: 'n2', x: 50, y: 0 }]);
    expect(doc.segments).toEqual([{ id: 'n3', from: 'n1', to: 'n2', section: { shape: 'round', diameterM: 0.25 }, number: 1 }]);
    expect(doc.runs).toEqual([{ id: 'n4', name: 'Run 1', letter: 'A', startNodeId: 'n1', endNodeId: null, temperatureC: 20, fan: null, terminations: { n1: { kind: 'closed' }, n2: { kind: 'open', flange: 'unflanged' } } }]);
    expect(state).toEqual({ selection: { nodeIds: [], segmentIds: ['n3'] }, activeRunId: 'n4' });
  });

  it('continuing from the end keeps the section and moves the open end to the new leaf', () => {
    const first = drawChain([{ x: 0, y: 0 }, { x: 50, y: 0 }]);
    const resized = performCommand('set-section', first.doc, first.state, { section: { shape: 'round', diameterM: 0.315 } });
    const { doc } = performCommand('draw-segment', resized.doc, resized.state, { from: { nodeId: first.nodeIds[1] }, to: { point: { x: 50, y: 80 } } }, sequentialIds('m'));
    expect(doc.segments[1].section).toEqual({ shape: 'round', diameterM: 0.315 });
    expect(doc.runs[0].terminations).toEqual({ [first.nodeIds[0]]: { kind: 'closed' }, [nodeAt(doc, 50, 80)]: { kind: 'open', flange: 'unflanged' } });
    expect(validateRunTree(doc, doc.runs[0].id)).toEqual([]);
  });

  it('joining two runs keeps the run drawn from and the other run’s ends', () => {
    const newId = sequentialIds('n');
    const first = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }], newId);
    const second = drawChain([{ x: 300, y: 0 }, { x: 300, y: 100 }], newId, first);
    const lined = performCommand('set-termination', second.doc, second.state, { nodeId: second.nodeIds[1], termination: { kind: 'lined', absorption: 0.6 } });
    const { doc, state } = performCommand('draw-segment', lined.doc, lined.state, { from: { nodeId: first.nodeIds[1] }, to: { nodeId: second.nodeIds[0] } }, newId);
    expect(doc.runs.map((run) => run.id)).toEqual([first.doc.runs[0].id]);
    expect(state.activeRunId).toBe(first.doc.runs[0].id);
    expect(doc.runs[0].terminations[second.nodeIds[1]]).toEqual({ kind: 'lined', absorption: 0.6 });
    expect(validateRunTree(doc, doc.runs[0].id)).toEqual([]);
  });

  it('refuses a loop, a zero-length segment and an unknown node, leaving nothing changed', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 100 }]);
    const loop = tryCommand('draw-segment', chain.doc, chain.state, { from: { nodeId: chain.nodeIds[0] }, to: { nodeId: chain.nodeIds[2] } });
    expect(loop.ok ? 'accepted' : loop.error.message).toBe('That would close a loop; a duct run branches like a tree and never joins itself.');
    const zero = tryCommand('draw-segment', chain.doc, chain.state, { from: { nodeId: chain.nodeIds[2] }, to: { point: { x: 100, y: 100 } } });
    expect(zero.ok ? 'accepted' : zero.error.message).toBe('A segment needs two different points.');
    const unknown = tryCommand('draw-segment', chain.doc, chain.state, { from: { nodeId: 'ghost' }, to: { point: { x: 1, y: 1 } } });
    expect(unknown.ok ? 'accepted' : unknown.error.where).toEqual({ nodeId: 'ghost' });
  });
});
