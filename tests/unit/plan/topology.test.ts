import { describe, expect, it } from 'vitest';
import { nodeDegree, pathBetween, performCommand, runLeaves, runOfNode, runSegments, sequentialIds, validateRunTree, type PlanDocument } from '@/lib/plan';
import { drawChain, nodeAt } from './fixtures';

// A tee: S(0,0) - A(100,0) - E(200,0), branch A - C(100,100).
function teeDoc(): { doc: PlanDocument; runId: string } {
  const newId = sequentialIds('t');
  const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }], newId);
  const { doc } = performCommand('draw-segment', chain.doc, chain.state, { from: { nodeId: chain.nodeIds[1] }, to: { point: { x: 100, y: 100 } } }, newId);
  return { doc, runId: doc.runs[0].id };
}

describe('topology', () => {
  it('finds the run of a node, its segments, degrees and leaves', () => {
    const { doc, runId } = teeDoc();
    expect(runOfNode(doc, nodeAt(doc, 100, 100))?.id).toBe(runId);
    expect(runSegments(doc, runId)).toHaveLength(3);
    expect(nodeDegree(doc, nodeAt(doc, 100, 0))).toBe(3);
    expect(runLeaves(doc, runId)).toEqual([nodeAt(doc, 0, 0), nodeAt(doc, 200, 0), nodeAt(doc, 100, 100)]);
  });

  it('gives the tree path with each segment oriented from the first node', () => {
    const { doc } = teeDoc();
    const path = pathBetween(doc, nodeAt(doc, 200, 0), nodeAt(doc, 100, 100));
    expect(path?.map((step) => [step.fromNodeId, step.toNodeId])).toEqual([
      [nodeAt(doc, 200, 0), nodeAt(doc, 100, 0)],
      [nodeAt(doc, 100, 0), nodeAt(doc, 100, 100)],
    ]);
    expect(pathBetween(doc, nodeAt(doc, 0, 0), nodeAt(doc, 0, 0))).toEqual([]);
    expect(pathBetween(doc, nodeAt(doc, 0, 0), 'nowhere')).toBeNull();
  });

  it('a valid tree has no problems', () => {
    const { doc, runId } = teeDoc();
    expect(validateRunTree(doc, runId)).toEqual([]);
  });

  it('reports a loop, a start with a tee at it, a chosen end that is not a leaf and a missing termination', () => {
    const { doc, runId } = teeDoc();
    const [run] = doc.runs;
    const start = run.startNodeId;
    const broken: PlanDocument = {
      ...doc,
      segments: [
        ...doc.segments,
        { id: 'loop', from: nodeAt(doc, 200, 0), to: nodeAt(doc, 100, 100), section: { shape: 'round', diameterM: 0.2 } },
        { id: 'spur', from: start, to: nodeAt(doc, 100, 100), section: { shape: 'round', diameterM: 0.2 } },
      ],
      runs: [{ ...run, endNodeId: nodeAt(doc, 100, 0), terminations: {} }],
    };
    const codes = validateRunTree(broken, runId).map((problem) => problem.code);
    expect(codes).toEqual(expect.arrayContaining(['cycle', 'start-not-leaf', 'end-not-leaf', 'missing-termination']));
    expect(validateRunTree(broken, runId).find((problem) => problem.code === 'cycle')?.message).toBe('Run 1 closes a loop; a duct run must branch like a tree, so delete one segment of the loop.');
  });

  it('reports a chosen end in another tree and an unknown run', () => {
    const { doc, runId } = teeDoc();
    const other = drawChain([{ x: 0, y: 500 }, { x: 100, y: 500 }], sequentialIds('o'));
    const combined: PlanDocument = { ...doc, nodes: [...doc.nodes, ...other.doc.nodes], segments: [...doc.segments, ...other.doc.segments], runs: [{ ...doc.runs[0], endNodeId: other.nodeIds[1] }] };
    expect(validateRunTree(combined, runId).map((problem) => problem.code)).toEqual(['disconnected']);
    expect(validateRunTree(doc, 'nope')[0].code).toBe('no-run');
  });
});
