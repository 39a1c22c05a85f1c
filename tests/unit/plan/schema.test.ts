import { describe, expect, it } from 'vitest';
import { emptyDocument, parsePlanDocument, planDocumentSchema, MAX_PLAN_NODES } from '@/lib/plan';
import { drawChain } from './fixtures';

describe('planDocumentSchema', () => {
  it('accepts the empty document and a drawn run', () => {
    expect(planDocumentSchema.safeParse(emptyDocument()).success).toBe(true);
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    expect(parsePlanDocument(doc)).toEqual({ ok: true, value: doc });
  });

  it('names the path of a section under 10 mm', () => {
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const bad = { ...doc, segments: [{ ...doc.segments[0], section: { shape: 'round', diameterM: 0.005 } }] };
    const result = parsePlanDocument(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toEqual(['segments[0].section.diameterM: must be at least 0.01 m (10 mm)']);
  });

  it('refuses infinite coordinates, absorption above 1, a cold run and unknown terminations, each by path', () => {
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const [run] = doc.runs;
    const bad = {
      ...doc,
      nodes: [{ ...doc.nodes[0], x: Infinity }, doc.nodes[1]],
      segments: [{ ...doc.segments[0], lining: { thicknessM: 0.025, absorption: 1.5 } }],
      runs: [{ ...run, temperatureC: -50, terminations: { ...run.terminations, [run.startNodeId]: { kind: 'soft' } } }],
    };
    const result = parsePlanDocument(bad);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const paths = result.errors.map((message) => message.split(':')[0]);
    expect(paths).toEqual(expect.arrayContaining(['nodes[0].x', 'segments[0].lining.absorption', 'runs[0].temperatureC', `runs[0].terminations.${run.startNodeId}.kind`]));
  });

  it('a shared fan names another run that has a fan of its own: not itself, not a run that shares one', () => {
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const run = doc.runs[0];
    const runs = [run, { ...run, id: 'b', fanOfRunId: run.id }, { ...run, id: 'c', fanOfRunId: 'b' }, { ...run, id: 'd', fanOfRunId: 'd' }];
    const result = parsePlanDocument({ ...doc, runs });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.some((message) => message.startsWith('runs[1]'))).toBe(false);
    expect(result.errors.some((message) => message.startsWith('runs[2].fanOfRunId:') && message.includes('itself shares'))).toBe(true);
    expect(result.errors.some((message) => message.startsWith('runs[3].fanOfRunId:') && message.includes('not another run'))).toBe(true);
  });

  it('refuses repeated ids, dangling references and ids over 40 characters', () => {
    const { doc } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    const bad = {
      ...doc,
      nodes: [doc.nodes[0], { ...doc.nodes[1], id: doc.nodes[0].id }],
      runs: [{ ...doc.runs[0], id: 'r'.repeat(41) }],
    };
    const result = parsePlanDocument(bad);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toContain(`nodes[1].id: repeats the id "${doc.nodes[0].id}"`);
    expect(result.errors.some((message) => message.startsWith('segments[0].to: names node'))).toBe(true);
    expect(result.errors).toContain('runs[0].id: must be at most 40 characters');
  });

  it(`refuses more than ${MAX_PLAN_NODES} nodes`, () => {
    const nodes = Array.from({ length: MAX_PLAN_NODES + 1 }, (_, index) => ({ id: `n${index}`, x: index, y: 0 }));
    const result = parsePlanDocument({ ...emptyDocument(), nodes });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toContain(`nodes: at most ${MAX_PLAN_NODES} points`);
  });
});
