import { describe, expect, it } from 'vitest';
import { analyzeRun, speedOfSound } from '@/lib/acoustic';
import { PlanError, initialEditorState, performCommand, sequentialIds, toRunInput, toRunInputWithMap, type CommandResult, type PlanDocument } from '@/lib/plan';
import { expectClose } from '../acoustic/tolerance';
import { drawChain, nodeAt } from './fixtures';

const METRES_PER_PIXEL = 0.01;

function addBranch(doc: PlanDocument, fromNodeId: string, points: { x: number; y: number }[], newId: () => string): PlanDocument {
  let current: CommandResult = { doc, state: initialEditorState() };
  let from = fromNodeId;
  for (const point of points) {
    current = performCommand('draw-segment', current.doc, current.state, { from: { nodeId: from }, to: { point } }, newId);
    from = nodeAt(current.doc, point.x, point.y);
  }
  return current.doc;
}

describe('toRunInput', () => {
  it('a straight chain becomes its segments in order, start closed and end open unflanged', () => {
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 250 }, { x: 400, y: 250 }]);
    const { input, path } = toRunInputWithMap(doc, doc.runs[0].id, METRES_PER_PIXEL);
    expect(input.segments.map((segment) => segment.lengthM)).toEqual([1, 2.5, 3]);
    expect(input.segments.every((segment) => segment.branches === undefined && segment.lining === undefined)).toBe(true);
    expect(input.start).toEqual({ kind: 'closed' });
    expect(input.end).toEqual({ kind: 'open', flange: 'unflanged' });
    expect(input.temperatureC).toBe(20);
    expect(path.map((piece) => [piece.startM, piece.endM])).toEqual([[0, 1], [1, 3.5], [3.5, 6.5]]);
    expect(path.map((piece) => piece.segmentId)).toEqual(doc.segments.map((segment) => segment.id));
  });

  it('a tee enters as a branch at the far end of the path segment reaching it, with its own length and end', () => {
    const newId = sequentialIds('t');
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 300, y: 0 }, { x: 600, y: 0 }], newId);
    const doc = addBranch(chain.doc, chain.nodeIds[2], [{ x: 300, y: 150 }], newId);
    const input = toRunInput(doc, doc.runs[0].id, METRES_PER_PIXEL);
    expect(input.segments.map((segment) => segment.lengthM)).toEqual([1, 2, 3]);
    expect(input.segments[0].branches).toBeUndefined();
    expect(input.segments[1].branches).toEqual([{ segments: [{ lengthM: 1.5, section: { shape: 'round', diameterM: 0.25 } }], end: { kind: 'open', flange: 'unflanged' } }]);
    expect(input.segments[2].branches).toBeUndefined();
  });

  it('without a chosen end, the farthest leaf is the end; choosing the branch end swaps path and branch', () => {
    const newId = sequentialIds('t');
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 200, y: 0 }], newId);
    const doc = addBranch(chain.doc, chain.nodeIds[1], [{ x: 100, y: 400 }], newId);
    const farthest = toRunInputWithMap(doc, doc.runs[0].id, METRES_PER_PIXEL);
    expect(farthest.path.at(-1)?.toNodeId).toBe(nodeAt(doc, 100, 400));
    expect(farthest.input.segments.map((segment) => segment.lengthM)).toEqual([1, 4]);
    const chosen = performCommand('choose-end', doc, initialEditorState(), { nodeId: chain.nodeIds[2] });
    const input = toRunInput(chosen.doc, doc.runs[0].id, METRES_PER_PIXEL);
    expect(input.segments.map((segment) => segment.lengthM)).toEqual([1, 1]);
    expect(input.segments[0].branches?.[0].segments[0].lengthM).toBe(4);
  });

  it('nested forks: a branch continues along its longest reach; the other child hangs off the segment ending at the fork', () => {
    const newId = sequentialIds('t');
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 900, y: 0 }], newId);
    // Branch from (100,0) down to fork F(100,100); from F a short spur (150,100) and a long arm (100,400).
    let doc = addBranch(chain.doc, chain.nodeIds[1], [{ x: 100, y: 100 }, { x: 150, y: 100 }], newId);
    doc = addBranch(doc, nodeAt(doc, 100, 100), [{ x: 100, y: 400 }], newId);
    const input = toRunInput(doc, doc.runs[0].id, METRES_PER_PIXEL);
    expect(input.segments.map((segment) => segment.lengthM)).toEqual([1, 8]);
    const [branch] = input.segments[0].branches ?? [];
    expect(branch.segments.map((segment) => segment.lengthM)).toEqual([1, 3]);
    expect(branch.segments[0].branches?.map((nested) => nested.segments.map((segment) => segment.lengthM))).toEqual([[0.5]]);
    expect(branch.segments[1].branches).toBeUndefined();
  });

  it('carries lining, section and length overrides', () => {
    const { doc, state } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const segmentIds = [doc.segments[0].id];
    let result = performCommand('set-lining', doc, state, { segmentIds, lining: { thicknessM: 0.025, absorption: 0.7 } });
    result = performCommand('set-section', result.doc, result.state, { segmentIds, section: { shape: 'rect', widthM: 0.4, heightM: 0.2 } });
    result = performCommand('set-length-override', result.doc, result.state, { segmentIds, lengthM: 12 });
    expect(toRunInput(result.doc, doc.runs[0].id, METRES_PER_PIXEL).segments).toEqual([{ lengthM: 12, section: { shape: 'rect', widthM: 0.4, heightM: 0.2 }, lining: { thicknessM: 0.025, absorption: 0.7 } }]);
  });

  it('refuses an invalid tree with a PlanError that says where', () => {
    const newId = sequentialIds('t');
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }], newId);
    const teeAtStart = addBranch(chain.doc, chain.nodeIds[0], [{ x: 0, y: 100 }], newId);
    const runId = chain.doc.runs[0].id;
    expect(() => toRunInput(teeAtStart, runId, METRES_PER_PIXEL)).toThrow(PlanError);
    try {
      toRunInput(teeAtStart, runId, METRES_PER_PIXEL);
    } catch (error) {
      expect(error).toBeInstanceOf(PlanError);
      expect((error as PlanError).message).toBe('Run 1: the start has a tee right at it; the start must be the end of a single segment.');
      expect((error as PlanError).where).toMatchObject({ runId, nodeId: chain.nodeIds[0] });
    }
    expect(() => toRunInput(chain.doc, runId, 0)).toThrow('Set the plan scale first');
    const missing: PlanDocument = { ...chain.doc, runs: [{ ...chain.doc.runs[0], terminations: { [chain.nodeIds[0]]: { kind: 'closed' } } }] };
    expect(() => toRunInput(missing, runId, METRES_PER_PIXEL)).toThrow('one end has no termination');
    const zero: PlanDocument = { ...chain.doc, nodes: chain.doc.nodes.map((node) => ({ ...node, x: 0 })) };
    expect(() => toRunInput(zero, runId, METRES_PER_PIXEL)).toThrow('zero length');
  });
});

describe('toRunInput through the engine', () => {
  it('a straight 3-segment closed–open chain of Ø 250 mm rings first at c / 4(L + 0.6133 a), within 1%', () => {
    // Quarter-wave resonance of a closed–open pipe, f1 = c / 4(L + δ) (Kinsler & Frey, Fundamentals of Acoustics, ch. 10),
    // with the low-frequency unflanged end correction δ = 0.6133 a (Levine & Schwinger 1948).
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 80, y: 0 }, { x: 80, y: 70 }, { x: 130, y: 70 }]);
    const input = toRunInput(doc, doc.runs[0].id, METRES_PER_PIXEL);
    const lengthM = 0.8 + 0.7 + 0.5;
    const radiusM = 0.125;
    const expectedHz = speedOfSound(20) / (4 * (lengthM + 0.6133 * radiusM));
    const analysis = analyzeRun(input);
    expectClose(analysis.lengthM, lengthM, 1e-12, 'path length');
    expectClose(analysis.resonances[0].frequencyHz, expectedHz, 0.01 * expectedHz, 'first resonance');
  });

  it('a run with a tee and nested forks passes the engine', () => {
    const newId = sequentialIds('t');
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 300, y: 0 }], newId);
    let doc = addBranch(chain.doc, chain.nodeIds[1], [{ x: 100, y: 100 }, { x: 150, y: 100 }], newId);
    doc = addBranch(doc, nodeAt(doc, 100, 100), [{ x: 100, y: 200 }], newId);
    const analysis = analyzeRun(toRunInput(doc, doc.runs[0].id, METRES_PER_PIXEL));
    expect(analysis.resonances.length).toBeGreaterThan(0);
    expect(analysis.reflections.some((reflection) => reflection.kind === 'tee')).toBe(true);
  });
});
