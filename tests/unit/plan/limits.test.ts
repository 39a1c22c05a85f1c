// The plan document's physical limits, at their bound and just past it. The limits are product rules
// (lib/plan/schema-parts.ts, lib/acoustic/input-limits.ts): common practice, no source.
import { describe, expect, it } from 'vitest';
import {
  MAX_METRES_PER_PIXEL, MAX_PLAN_COORDINATE_PX, MAX_PLAN_RUNS, MAX_SEGMENT_LENGTH_M, MIN_METRES_PER_PIXEL,
  parsePlanDocument, planDocumentSchema, readSavedDocument, tryCommand, type PlanDocument,
} from '@/lib/plan';
import { MAX_FAN_RPM, MAX_ROOM_HEIGHT_M } from '@/lib/acoustic';
import { savePlanSchema } from '@/lib/plans/schemas';
import { drawChain } from './fixtures';
import { roomPlanDocument } from './room-plan-fixture';

function errorsOf(doc: unknown): string[] {
  const result = parsePlanDocument(doc);
  return result.ok ? [] : result.errors;
}

/** The room plan with `count` runs, each a one-segment run of its own (ids r0, r1, ...). */
function planWithRuns(count: number): PlanDocument {
  const base = roomPlanDocument();
  const nodes = Array.from({ length: count }, (_, index) => [{ id: `a${index}`, x: 0, y: index }, { id: `b${index}`, x: 10, y: index }]).flat();
  const segments = Array.from({ length: count }, (_, index) => ({ id: `s${index}`, from: `a${index}`, to: `b${index}`, section: { shape: 'round' as const, diameterM: 0.2 } }));
  const runs = Array.from({ length: count }, (_, index) => ({
    ...base.runs[0], id: `r${index}`, name: `Run ${index}`, startNodeId: `a${index}`, endNodeId: null,
    terminations: { [`a${index}`]: { kind: 'closed' as const }, [`b${index}`]: { kind: 'closed' as const } },
  }));
  return { ...base, nodes, segments, runs, rooms: [] };
}

describe('plan document limits', () => {
  it('a length override up to one segment’s limit (500 m); 100 km is refused naming the field and the limit', () => {
    const doc = roomPlanDocument();
    const withOverride = (lengthOverrideM: number) => ({ ...doc, segments: [{ ...doc.segments[0], lengthOverrideM }, doc.segments[1]] });
    expect(errorsOf(withOverride(MAX_SEGMENT_LENGTH_M))).toEqual([]);
    expect(errorsOf(withOverride(100000))).toEqual([`segments[0].lengthOverrideM: must be at most ${MAX_SEGMENT_LENGTH_M} m`]);
  });

  it('coordinates of points and rooms within 100 000 px of the origin', () => {
    const doc = roomPlanDocument();
    expect(errorsOf({ ...doc, nodes: [{ ...doc.nodes[0], x: -MAX_PLAN_COORDINATE_PX }, ...doc.nodes.slice(1)] })).toEqual([]);
    expect(errorsOf({ ...doc, nodes: [{ ...doc.nodes[0], y: MAX_PLAN_COORDINATE_PX + 1 }, ...doc.nodes.slice(1)] }))
      .toEqual([`nodes[0].y: must be within ${MAX_PLAN_COORDINATE_PX} px of the plan's origin`]);
    expect(errorsOf({ ...doc, rooms: [{ ...doc.rooms[0], x: 1e9 }] })).toEqual([`rooms[0].x: must be within ${MAX_PLAN_COORDINATE_PX} px of the plan's origin`]);
  });

  it(`at most ${MAX_PLAN_RUNS} runs per plan; 5000 are refused`, () => {
    expect(errorsOf(planWithRuns(MAX_PLAN_RUNS))).toEqual([]);
    expect(errorsOf(planWithRuns(5000))).toContain(`runs: at most ${MAX_PLAN_RUNS} runs`);
  });

  it('a fan up to 10 000 rpm, a room up to 50 m high', () => {
    const doc = roomPlanDocument();
    expect(errorsOf({ ...doc, runs: [{ ...doc.runs[0], fan: { blades: 8, rpm: MAX_FAN_RPM } }] })).toEqual([]);
    expect(errorsOf({ ...doc, runs: [{ ...doc.runs[0], fan: { blades: 8, rpm: 20000 } }] })).toEqual([`runs[0].fan.rpm: must be at most ${MAX_FAN_RPM} rpm`]);
    expect(errorsOf({ ...doc, rooms: [{ ...doc.rooms[0], heightM: 60 }] })).toEqual([`rooms[0].heightM: must be at most ${MAX_ROOM_HEIGHT_M} m`]);
  });

  it('a chosen treatment’s length change within one segment’s limit', () => {
    const doc = roomPlanDocument();
    const treatment = {
      id: 't1', runId: 'supply', roomId: 'recital', flagId: 'f', flagKind: 'resonance-near-tone' as const, flagSubject: 'tone:h1', flagReason: '',
      treatment: { kind: 'retune-length' as const, segmentIndex: 0, deltaLengthM: 0.4 }, description: '', before: {}, after: {}, clears: true,
      planChange: { kind: 'length-override' as const, segmentId: 'main', lengthM: 100000 },
    };
    expect(errorsOf({ ...doc, treatments: [treatment] })).toEqual([`treatments[0].planChange.lengthM: must be at most ${MAX_SEGMENT_LENGTH_M} m`]);
  });

  it('a document saved before the limits still reads back, with what it holds; a save of it is refused', () => {
    const doc = planWithRuns(MAX_PLAN_RUNS + 1);
    const saved = { ...doc, segments: [{ ...doc.segments[0], lengthOverrideM: 600 }, ...doc.segments.slice(1)] };
    const read = readSavedDocument(() => planDocumentSchema.parse(saved));
    expect(read.runs).toHaveLength(MAX_PLAN_RUNS + 1);
    expect(read.segments[0].lengthOverrideM).toBe(600);
    expect(errorsOf(saved)).toEqual([`segments[0].lengthOverrideM: must be at most ${MAX_SEGMENT_LENGTH_M} m`, `runs: at most ${MAX_PLAN_RUNS} runs`]);
    // reading relaxes only the limits: a broken document is still refused
    expect(() => readSavedDocument(() => planDocumentSchema.parse({ ...saved, nodes: [{ id: 'a0', x: Infinity, y: 0 }] }))).toThrow();
  });

  it('the scale of a saved plan between 0.1 mm and 1 m per pixel; 100 m per pixel is refused', () => {
    const save = (metresPerPixel: number) => savePlanSchema.safeParse({ version: 1, metresPerPixel, document: roomPlanDocument() });
    expect(save(MAX_METRES_PER_PIXEL).success).toBe(true);
    expect(save(MIN_METRES_PER_PIXEL).success).toBe(true);
    expect(save(100).error?.issues.map((issue) => [issue.path.join('.'), issue.message])).toEqual([['metresPerPixel', 'must be at most 1 (1 m per pixel); set the scale again']]);
    expect(save(0.00001).error?.issues[0].message).toBe('must be at least 0.0001 (0.1 mm per pixel); set the scale again');
  });
});

describe('editor commands at the plan limits', () => {
  it('refuses a point drawn or dragged off the plan', () => {
    const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const far = tryCommand('draw-segment', chain.doc, chain.state, { from: { nodeId: chain.nodeIds[1] }, to: { point: { x: 2 * MAX_PLAN_COORDINATE_PX, y: 0 } } });
    expect(far.ok ? 'accepted' : far.error.message).toBe(`That point is off the plan (more than ${MAX_PLAN_COORDINATE_PX} px from its origin).`);
    const dragged = tryCommand('move-node', chain.doc, chain.state, { nodeId: chain.nodeIds[0], to: { x: 0, y: -2 * MAX_PLAN_COORDINATE_PX }, metresPerPixel: 0.01 });
    expect(dragged.ok ? 'accepted' : dragged.error.where).toEqual({ nodeId: chain.nodeIds[0] });
  });

  it('refuses a run past the plan’s limit, and still lets a plan over it lose runs', () => {
    const full = planWithRuns(MAX_PLAN_RUNS);
    const state = { ...drawChain([{ x: 0, y: 0 }, { x: 1, y: 0 }]).state, selection: { nodeIds: [], segmentIds: [] } };
    const another = tryCommand('draw-segment', full, state, { from: { point: { x: 500, y: 500 } }, to: { point: { x: 600, y: 500 } } });
    expect(another.ok ? 'accepted' : another.error.message).toBe(`A plan holds at most ${MAX_PLAN_RUNS} runs; split the drawing into several plans.`);
    const over = planWithRuns(MAX_PLAN_RUNS + 2);
    const fewer = tryCommand('delete-selection', over, { ...state, selection: { nodeIds: [], segmentIds: ['s0'] } }, {});
    expect(fewer.ok && fewer.doc.runs.length).toBe(MAX_PLAN_RUNS + 1);
  });
});
