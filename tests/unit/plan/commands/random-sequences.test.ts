import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { PlanError, emptyDocument, initialEditorState, parsePlanDocument, sequentialIds, toRunInput, tryCommand, validateRunTree, type CommandResult, type PlanDocument } from '@/lib/plan';

// Commands are generated against indices; each step resolves them to the ids present at that moment.
const coordinate = fc.integer({ min: 0, max: 40 }).map((value) => value * 10);
const point = fc.record({ x: coordinate, y: coordinate });
const pick = fc.nat();
const step = fc.oneof(
  fc.record({ kind: fc.constant('draw-new' as const), from: point, to: point }),
  fc.record({ kind: fc.constant('draw-from' as const), node: pick, to: point }),
  fc.record({ kind: fc.constant('draw-join' as const), node: pick, other: pick }),
  fc.record({ kind: fc.constant('move' as const), node: pick, to: point }),
  fc.record({ kind: fc.constant('split' as const), segment: pick, t: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('tee' as const), segment: pick, t: fc.double({ min: 0, max: 1, noNaN: true }), to: point }),
  fc.record({ kind: fc.constant('delete-node' as const), node: pick }),
  fc.record({ kind: fc.constant('delete-segment' as const), segment: pick }),
  fc.record({ kind: fc.constant('lining' as const), segment: pick, absorption: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('override' as const), segment: pick, lengthM: fc.option(fc.double({ min: 0.1, max: 50, noNaN: true })) }),
  fc.record({ kind: fc.constant('termination' as const), node: pick }),
  fc.record({ kind: fc.constant('choose-end' as const), node: pick }),
);
type Step = typeof step extends fc.Arbitrary<infer T> ? T : never;

function apply(current: CommandResult, action: Step, newId: () => string): CommandResult {
  const { doc, state } = current;
  const nodeId = (index: number) => doc.nodes[index % Math.max(1, doc.nodes.length)]?.id ?? 'none';
  const segment = (index: number) => doc.segments[index % Math.max(1, doc.segments.length)];
  const along = (index: number, t: number) => {
    const chosen = segment(index);
    const from = doc.nodes.find((node) => node.id === chosen?.from);
    const to = doc.nodes.find((node) => node.id === chosen?.to);
    return from && to ? { x: from.x + (to.x - from.x) * t, y: from.y + (to.y - from.y) * t } : { x: 0, y: 0 };
  };
  const result = (() => {
    switch (action.kind) {
      case 'draw-new': return tryCommand('draw-segment', doc, state, { from: { point: action.from }, to: { point: action.to } }, newId);
      case 'draw-from': return tryCommand('draw-segment', doc, state, { from: { nodeId: nodeId(action.node) }, to: { point: action.to } }, newId);
      case 'draw-join': return tryCommand('draw-segment', doc, state, { from: { nodeId: nodeId(action.node) }, to: { nodeId: nodeId(action.other) } }, newId);
      case 'move': return tryCommand('move-node', doc, state, { nodeId: nodeId(action.node), to: action.to, metresPerPixel: 0.02 }, newId);
      case 'split': return tryCommand('split-segment', doc, state, { segmentId: segment(action.segment)?.id ?? 'none', at: along(action.segment, action.t) }, newId);
      case 'tee': return tryCommand('add-tee', doc, state, { segmentId: segment(action.segment)?.id ?? 'none', at: along(action.segment, action.t), to: { point: action.to } }, newId);
      case 'delete-node': return tryCommand('delete-selection', doc, state, { nodeIds: [nodeId(action.node)] }, newId);
      case 'delete-segment': return tryCommand('delete-selection', doc, state, { segmentIds: [segment(action.segment)?.id ?? 'none'] }, newId);
      case 'lining': return tryCommand('set-lining', doc, state, { segmentIds: [segment(action.segment)?.id ?? 'none'], lining: { thicknessM: 0.025, absorption: action.absorption } }, newId);
      case 'override': return tryCommand('set-length-override', doc, state, { segmentIds: [segment(action.segment)?.id ?? 'none'], lengthM: action.lengthM }, newId);
      case 'termination': return tryCommand('set-termination', doc, state, { nodeId: nodeId(action.node), termination: { kind: 'lined', absorption: 0.5 } }, newId);
      case 'choose-end': return tryCommand('choose-end', doc, state, { nodeId: nodeId(action.node) }, newId);
    }
  })();
  return result.ok ? { doc: result.doc, state: result.state } : current;
}

function checkDocument(doc: PlanDocument): void {
  const parsed = parsePlanDocument(doc);
  expect(parsed.ok ? [] : parsed.errors).toEqual([]);
  for (const run of doc.runs) {
    const problems = validateRunTree(doc, run.id);
    expect(problems.every((problem) => ['cycle', 'start-not-leaf'].includes(problem.code) && problem.message.length > 0)).toBe(true);
    try {
      toRunInput(doc, run.id, 0.01);
    } catch (error) {
      expect(error).toBeInstanceOf(PlanError);
    }
  }
}

describe('random command sequences', () => {
  it('always leave a document that passes the schema, with every run valid or its problems reported in words', () => {
    fc.assert(
      fc.property(fc.array(step, { maxLength: 40 }), (steps) => {
        const newId = sequentialIds('p');
        let current: CommandResult = { doc: emptyDocument(), state: initialEditorState() };
        for (const action of steps) {
          current = apply(current, action, newId);
          checkDocument(current.doc);
        }
      }),
      { numRuns: 150 },
    );
  });
});
