import { describe, expect, it } from 'vitest';
import { performCommand, sequentialIds, toRunInput, tryCommand, validateRunTree } from '@/lib/plan';
import { drawChain, nodeAt } from '../fixtures';

describe('move-node', () => {
  it('moves one node and the lengths follow', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const { doc } = performCommand('move-node', chain.doc, chain.state, { nodeId: chain.nodeIds[1], to: { x: 300, y: 400 }, metresPerPixel: 0.01 });
    expect(doc.nodes[1]).toEqual({ id: chain.nodeIds[1], x: 300, y: 400 });
    expect(toRunInput(doc, doc.runs[0].id, 0.01).segments[0].lengthM).toBe(5);
    expect(tryCommand('move-node', chain.doc, chain.state, { nodeId: chain.nodeIds[1], to: { x: Number.NaN, y: 0 }, metresPerPixel: 0.01 }).ok).toBe(false);
  });
});

describe('split-segment', () => {
  it('adds a node on the segment and two segments with the same section and lining, override split in proportion', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const segmentId = chain.doc.segments[0].id;
    let result = performCommand('set-lining', chain.doc, chain.state, { lining: { thicknessM: 0.05, absorption: 0.8 } });
    result = performCommand('set-length-override', result.doc, result.state, { lengthM: 10 });
    const { doc, state } = performCommand('split-segment', result.doc, result.state, { segmentId, at: { x: 25, y: 6 } }, sequentialIds('s'));
    expect(doc.nodes.at(-1)).toEqual({ id: 's1', x: 25, y: 0 });
    expect(doc.segments).toEqual([
      { id: segmentId, from: chain.nodeIds[0], to: 's1', section: { shape: 'round', diameterM: 0.25 }, lining: { thicknessM: 0.05, absorption: 0.8 }, lengthOverrideM: 2.5, number: 1 },
      { id: 's2', from: 's1', to: chain.nodeIds[1], section: { shape: 'round', diameterM: 0.25 }, lining: { thicknessM: 0.05, absorption: 0.8 }, lengthOverrideM: 7.5, number: 2 },
    ]);
    expect(state.selection).toEqual({ nodeIds: ['s1'], segmentIds: [] });
    expect(validateRunTree(doc, doc.runs[0].id)).toEqual([]);
  });

  it('refuses a split at an end', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const result = tryCommand('split-segment', chain.doc, chain.state, { segmentId: chain.doc.segments[0].id, at: { x: 120, y: 0 } });
    expect(result.ok ? 'accepted' : result.error.message).toBe('Split inside the segment, away from its ends.');
  });
});

describe('add-tee', () => {
  it('splits the segment and draws the branch from the new node, which gets an open end (the longer arm stays the main path)', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 200, y: 0 }]);
    const { doc, state } = performCommand('add-tee', chain.doc, chain.state, { segmentId: chain.doc.segments[0].id, at: { x: 120, y: 3 }, to: { point: { x: 120, y: 50 } } }, sequentialIds('t'));
    const tee = nodeAt(doc, 120, 0);
    const branchEnd = nodeAt(doc, 120, 50);
    expect(doc.segments).toHaveLength(3);
    expect(doc.segments.filter((segment) => segment.from === tee || segment.to === tee)).toHaveLength(3);
    expect(doc.runs[0].terminations[branchEnd]).toEqual({ kind: 'open', flange: 'unflanged' });
    expect(state.selection.segmentIds).toHaveLength(1);
    const input = toRunInput(doc, doc.runs[0].id, 0.01);
    expect(input.segments.map((segment) => segment.lengthM)).toEqual([1.2, 0.8]);
    expect(input.segments[0].branches?.[0].segments[0].lengthM).toBeCloseTo(0.5, 12);
  });
});

describe('delete-selection', () => {
  it('deleting a middle segment leaves two runs, each with consistent terminations', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }, { x: 300, y: 0 }]);
    const middle = chain.doc.segments[1].id;
    const { doc, state } = performCommand('delete-selection', chain.doc, { ...chain.state, selection: { nodeIds: [], segmentIds: [middle] } }, {}, sequentialIds('d'));
    expect(doc.segments).toHaveLength(2);
    expect(doc.runs).toHaveLength(2);
    expect(doc.runs[1]).toMatchObject({ id: 'd1', name: 'Run 2', startNodeId: chain.nodeIds[2] });
    expect(doc.runs[0].terminations).toEqual({ [chain.nodeIds[0]]: { kind: 'closed' }, [chain.nodeIds[1]]: { kind: 'open', flange: 'unflanged' } });
    expect(doc.runs[1].terminations).toEqual({ [chain.nodeIds[2]]: { kind: 'closed' }, [chain.nodeIds[3]]: { kind: 'open', flange: 'unflanged' } });
    doc.runs.forEach((run) => expect(validateRunTree(doc, run.id)).toEqual([]));
    expect(state.selection).toEqual({ nodeIds: [], segmentIds: [] });
  });

  it('deleting a node takes its segments, removes orphan nodes, and a run without segments goes', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }]);
    const { doc } = performCommand('delete-selection', chain.doc, chain.state, { nodeIds: [chain.nodeIds[1]] });
    expect(doc.nodes).toEqual([]);
    expect(doc.segments).toEqual([]);
    expect(doc.runs).toEqual([]);
  });

  it('deleting the far segment makes the remaining end a leaf with the default open end, and forgets a chosen end that is gone', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }]);
    const chosen = performCommand('choose-end', chain.doc, chain.state, { nodeId: chain.nodeIds[2] });
    const { doc } = performCommand('delete-selection', chosen.doc, chosen.state, { segmentIds: [chain.doc.segments[1].id] });
    expect(doc.runs[0].endNodeId).toBeNull();
    expect(doc.runs[0].terminations).toEqual({ [chain.nodeIds[0]]: { kind: 'closed' }, [chain.nodeIds[1]]: { kind: 'open', flange: 'unflanged' } });
  });
});
