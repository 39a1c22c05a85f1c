// Plans for the editor benchmarks, built with the editor's own commands.
import { emptyDocument, findSegment, initialEditorState, performCommand, sequentialIds, type PlanDocument } from '@/lib/plan';

// `runs` straight chains of `segmentsPerRun` segments laid out in rows over the 4000 × 3000 px
// grid; the first run's second point sits at the centre (2000, 1500), the point the bench drags.
export function manySegments(runs: number, segmentsPerRun: number): PlanDocument {
  const newId = sequentialIds('b');
  let doc = emptyDocument();
  let state = initialEditorState();
  const stepPx = 3600 / segmentsPerRun;
  for (let run = 0; run < runs; run += 1) {
    const y = run === 0 ? 1500 : 100 + run * (2800 / runs);
    let from: { nodeId: string } | { point: { x: number; y: number } } = { point: { x: run === 0 ? 2000 - stepPx : 200, y } };
    for (let index = 0; index < segmentsPerRun; index += 1) {
      const startX = run === 0 ? 2000 - stepPx : 200;
      ({ doc, state } = performCommand('draw-segment', doc, state, { from, to: { point: { x: startX + (index + 1) * stepPx, y: y + (index % 2) * 6 } } }, newId));
      from = { nodeId: findSegment(doc, state.selection.segmentIds[0])!.to };
    }
  }
  return doc;
}

// A 200-segment run of 60 m (0.3 m segments at 0.01 m/px) with 10 tees, each a two-segment branch.
export function teedRun(): PlanDocument {
  const newId = sequentialIds('r');
  let doc = emptyDocument();
  let state = initialEditorState();
  let from: { nodeId: string } | { point: { x: number; y: number } } = { point: { x: 100, y: 1000 } };
  const segmentIds: string[] = [];
  for (let index = 0; index < 200; index += 1) {
    ({ doc, state } = performCommand('draw-segment', doc, state, { from, to: { point: { x: 100 + (index + 1) * 30, y: 1000 + (index % 2) * 2 } } }, newId));
    const segment = findSegment(doc, state.selection.segmentIds[0])!;
    segmentIds.push(segment.id);
    from = { nodeId: segment.to };
  }
  for (let tee = 0; tee < 10; tee += 1) {
    const segment = findSegment(doc, segmentIds[10 + tee * 18])!;
    const a = doc.nodes.find((node) => node.id === segment.from)!;
    const b = doc.nodes.find((node) => node.id === segment.to)!;
    const at = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    ({ doc, state } = performCommand('add-tee', doc, state, { segmentId: segment.id, at, to: { point: { x: at.x, y: at.y + 60 } } }, newId));
    const branch = findSegment(doc, state.selection.segmentIds[0])!;
    ({ doc, state } = performCommand('draw-segment', doc, state, { from: { nodeId: branch.to }, to: { point: { x: at.x + 40, y: at.y + 120 } } }, newId));
  }
  return doc;
}
