// Stable labels under any sequence of edits (fast-check): a label never moves to another element,
// labels stay unique, undo and redo give back exactly the labels of that step, and removing a
// treatment restores the document it was applied to. Properties of the product's own rules
// (common practice, no source).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  createHistory, emptyDocument, initialEditorState, planLabels, push, redo, sequentialIds, tryCommand, undo,
  type EditorState, type History, type PlanDocument, type PlanTreatment,
} from '@/lib/plan';

type Op =
  | { kind: 'draw-new'; x: number; y: number }
  | { kind: 'extend'; node: number; dx: number; dy: number }
  | { kind: 'split'; segment: number; t: number }
  | { kind: 'tee'; segment: number; t: number; dx: number; dy: number }
  | { kind: 'delete'; segment: number }
  | { kind: 'line'; segment: number }
  | { kind: 'remove-treatment'; treatment: number }
  | { kind: 'renumber'; run: number }
  | { kind: 'undo' }
  | { kind: 'redo' };

const coordinate = fc.integer({ min: 0, max: 2000 });
const offset = fc.integer({ min: -400, max: 400 }).filter((value) => Math.abs(value) > 20);
const index = fc.nat({ max: 50 });
const op: fc.Arbitrary<Op> = fc.oneof(
  fc.record({ kind: fc.constant('draw-new' as const), x: coordinate, y: coordinate }),
  fc.record({ kind: fc.constant('extend' as const), node: index, dx: offset, dy: offset }),
  fc.record({ kind: fc.constant('split' as const), segment: index, t: fc.double({ min: 0.2, max: 0.8, noNaN: true }) }),
  fc.record({ kind: fc.constant('tee' as const), segment: index, t: fc.double({ min: 0.2, max: 0.8, noNaN: true }), dx: offset, dy: offset }),
  fc.record({ kind: fc.constant('delete' as const), segment: index }),
  fc.record({ kind: fc.constant('line' as const), segment: index }),
  fc.record({ kind: fc.constant('remove-treatment' as const), treatment: index }),
  fc.record({ kind: fc.constant('renumber' as const), run: index }),
  fc.constant({ kind: 'undo' as const }),
  fc.constant({ kind: 'redo' as const }),
);

const pick = <T,>(items: readonly T[], at: number): T | undefined => (items.length === 0 ? undefined : items[at % items.length]);

function lineTreatment(doc: PlanDocument, segmentId: string): Omit<PlanTreatment, 'id' | 'previous'> {
  return {
    runId: doc.runs[0].id, roomId: null, flagId: 'resonance-near-tone:h1:100.0', flagKind: 'resonance-near-tone', flagSubject: 'tone:h1', flagReason: 'test',
    treatment: { kind: 'line-segment', segmentIndex: 0, thicknessM: 0.05, absorption: 0.7 }, description: 'Line it', before: {}, after: {}, clears: true,
    planChange: { kind: 'lining', segmentId, lining: { thicknessM: 0.05, absorption: 0.7 } },
  };
}

interface Step { kind: Op['kind']; before: PlanDocument; after: PlanDocument }

function apply(history: History, state: EditorState, step: Op, newId: () => string): { history: History; state: EditorState; applied: boolean } {
  const doc = history.present;
  if (step.kind === 'undo') return { history: undo(history), state, applied: true };
  if (step.kind === 'redo') return { history: redo(history), state, applied: true };
  const run = (result: ReturnType<typeof tryCommand>) => (result.ok ? { history: push(history, result.doc), state: result.state, applied: true } : { history, state, applied: false });
  const segment = 'segment' in step ? pick(doc.segments, step.segment) : undefined;
  const nodes = new Map(doc.nodes.map((node) => [node.id, node]));
  switch (step.kind) {
    case 'draw-new':
      return run(tryCommand('draw-segment', doc, state, { from: { point: { x: step.x, y: step.y } }, to: { point: { x: step.x + 100, y: step.y + 7 } } }, newId));
    case 'extend': {
      const node = pick(doc.nodes, step.node);
      return node ? run(tryCommand('draw-segment', doc, state, { from: { nodeId: node.id }, to: { point: { x: node.x + step.dx, y: node.y + step.dy } } }, newId)) : { history, state, applied: false };
    }
    case 'split':
    case 'tee': {
      if (!segment) return { history, state, applied: false };
      const from = nodes.get(segment.from)!;
      const to = nodes.get(segment.to)!;
      const at = { x: from.x + (to.x - from.x) * step.t, y: from.y + (to.y - from.y) * step.t };
      return step.kind === 'split'
        ? run(tryCommand('split-segment', doc, state, { segmentId: segment.id, at }, newId))
        : run(tryCommand('add-tee', doc, state, { segmentId: segment.id, at, to: { point: { x: at.x + step.dx, y: at.y + step.dy } } }, newId));
    }
    case 'delete':
      return segment ? run(tryCommand('delete-selection', doc, state, { segmentIds: [segment.id], nodeIds: [] }, newId)) : { history, state, applied: false };
    case 'line':
      return segment && !segment.lining ? run(tryCommand('add-treatment', doc, state, { treatment: lineTreatment(doc, segment.id) }, newId)) : { history, state, applied: false };
    case 'remove-treatment': {
      const treatment = pick(doc.treatments ?? [], step.treatment);
      return treatment ? run(tryCommand('remove-treatment', doc, state, { treatmentId: treatment.id }, newId)) : { history, state, applied: false };
    }
    case 'renumber': {
      const target = pick(doc.runs, step.run);
      return target ? run(tryCommand('renumber-run', doc, state, { runId: target.id }, newId)) : { history, state, applied: false };
    }
  }
}

function runOfSegmentLabel(doc: PlanDocument, segmentId: string): string | null {
  const labels = planLabels(doc);
  const runId = Object.entries(labels.runs).find(([, letter]) => labels.segments[segmentId]?.startsWith(letter) && /^\d+$/.test(labels.segments[segmentId].slice(letter.length)))?.[0];
  return runId ?? null;
}

describe('stable labels under random edit sequences', () => {
  it('never moves a label to another element, keeps labels unique, and undo/redo restore exactly', () => {
    fc.assert(
      fc.property(fc.array(op, { minLength: 1, maxLength: 40 }), (ops) => {
        const newId = sequentialIds('x');
        let history = createHistory(emptyDocument());
        let state = initialEditorState();
        const seen: PlanDocument[] = [history.present];
        const steps: Step[] = [];
        for (const step of ops) {
          const before = history.present;
          const next = apply(history, state, step, newId);
          history = next.history;
          state = next.state;
          if (next.applied && history.present !== before) steps.push({ kind: step.kind, before, after: history.present });
          seen.push(history.present);
        }
        for (const doc of seen) {
          const labels = Object.values(planLabels(doc).segments);
          expect(new Set(labels).size).toBe(labels.length);
        }
        for (const { kind, before, after } of steps) {
          if (kind === 'renumber' || kind === 'undo' || kind === 'redo') continue;
          const labelsBefore = planLabels(before);
          const labelsAfter = planLabels(after);
          for (const segment of after.segments) {
            const was = labelsBefore.segments[segment.id];
            if (was === undefined) continue;
            // the same segment in the same run keeps its label
            if (runOfSegmentLabel(before, segment.id) === runOfSegmentLabel(after, segment.id)) expect(labelsAfter.segments[segment.id]).toBe(was);
            // and a label that named one segment never names another that also existed before
            const holder = Object.entries(labelsAfter.segments).find(([, label]) => label === was)?.[0];
            if (holder !== undefined && holder !== segment.id) expect(labelsBefore.segments[holder]).toBeUndefined();
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('removing a treatment right after adding it restores the document it was applied to', () => {
    fc.assert(
      fc.property(fc.array(op, { minLength: 1, maxLength: 25 }), index, (ops, which) => {
        const newId = sequentialIds('y');
        let history = createHistory(emptyDocument());
        let state = initialEditorState();
        for (const step of ops) ({ history, state } = apply(history, state, step, newId));
        const doc = history.present;
        const segment = pick(doc.segments.filter((candidate) => !candidate.lining), which);
        if (!segment) return;
        const added = tryCommand('add-treatment', doc, state, { treatment: lineTreatment(doc, segment.id) }, newId);
        expect(added.ok).toBe(true);
        if (!added.ok) return;
        const treatment = added.doc.treatments!.at(-1)!;
        const removed = tryCommand('remove-treatment', added.doc, added.state, { treatmentId: treatment.id }, newId);
        expect(removed.ok).toBe(true);
        if (removed.ok) expect(removed.doc).toEqual(doc);
      }),
      { numRuns: 300 },
    );
  });
});
