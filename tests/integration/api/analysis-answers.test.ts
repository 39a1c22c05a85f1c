// Analysis answers carry what a caller needs by default and the pressure envelopes on request:
// POST /api/v1/analyze and GET /api/v1/plans/{planId}/results, for the 100-segment run of
// bench/load/hundred-segment-run.ts and the demo plan. Envelopes asked for are compared with the
// engine's own full-precision envelopes (analyzeRun called here directly), to the stated rounding:
// positions within half of 0.1 mm, samples within half a unit of their 4th significant figure,
// frequencies within half of 0.001 Hz. (The precisions and the 150 KB aim are product rules.)
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as analyze } from '@/app/api/v1/analyze/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { GET as getResults } from '@/app/api/v1/plans/[planId]/results/route';
import { analyzeRun, type PressureEnvelopePoint, type Resonance, type RunAnalysis } from '@/lib/acoustic';
import { sequelize } from '@/lib/db';
import type { RouteHandler } from '@/lib/http/route';
import { assignLabels } from '@/lib/plan/labels';
import { toRunInputWithMap } from '@/lib/plan/to-run-input';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { createPlan } from '@/lib/plans/data';
import type { PlanResultsAnswer } from '@/lib/plans/results-answer';
import { createProject } from '@/lib/projects/data';
import { hundredSegmentRun } from '../../../bench/load/hundred-segment-run';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
let engine: RunAnalysis;
beforeAll(async () => {
  team = await createTestTeam('answers');
  engine = analyzeRun(hundredSegmentRun());
});
afterAll(async () => { await sequelize.close(); });

/** The answer as sent: its bytes and its parsed body. */
async function raw(handler: RouteHandler, method: 'GET' | 'POST', url: string, cookie: string, body?: unknown, params: Record<string, string> = {}) {
  const request = new Request(`http://localhost${url}`, { method, headers: { host: 'localhost', cookie, 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
  const response = await handler(request, { params: Promise.resolve(params) });
  const bytes = new Uint8Array(await response.arrayBuffer());
  return { status: response.status, bytes: bytes.length, body: JSON.parse(new TextDecoder().decode(bytes)) as unknown };
}

const halfStep = (step: number, value: number) => step / 2 + 1e-12 * Math.abs(value);
const halfFourthFigure = (value: number) => (value === 0 ? 0 : 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(value))) - 3) * (1 + 1e-9));

function expectSameEnvelope(sent: PressureEnvelopePoint[] | undefined, computed: PressureEnvelopePoint[], what: string): void {
  expect(sent, what).toBeDefined();
  expect(sent!.length, what).toBe(computed.length);
  sent!.forEach((point, index) => {
    const exact = computed[index];
    expect(Math.abs(point.positionM - exact.positionM), `${what} position ${index}`).toBeLessThanOrEqual(halfStep(1e-4, exact.positionM));
    expect(Math.abs(point.relative - exact.relative), `${what} sample ${index}`).toBeLessThanOrEqual(halfFourthFigure(exact.relative));
  });
}

function expectSameResonances(sent: Resonance[], computed: Resonance[]): void {
  expect(sent.map((resonance) => resonance.order)).toEqual(computed.map((resonance) => resonance.order));
  sent.forEach((resonance, index) => {
    expect(Math.abs(resonance.frequencyHz - computed[index].frequencyHz)).toBeLessThanOrEqual(halfStep(1e-3, computed[index].frequencyHz));
    expect(resonance.nodesM).toHaveLength(computed[index].nodesM.length);
    expect(resonance.antinodesM).toHaveLength(computed[index].antinodesM.length);
  });
}

describe('POST /api/v1/analyze, the 100-segment run', () => {
  it('answers under 150 KB by default: every resonance with its nodes and antinodes, no envelope', async () => {
    const answer = await raw(analyze, 'POST', '/api/v1/analyze', await team.cookieFor('engineer'), hundredSegmentRun());
    expect(answer.status).toBe(200);
    const analysis = answer.body as RunAnalysis;
    expect(analysis.resonances.length).toBeGreaterThan(100);
    expect(analysis.resonances.every((resonance) => resonance.pressureEnvelope === undefined)).toBe(true);
    expectSameResonances(analysis.resonances, engine.resonances);
    expect(analysis.reflections).toHaveLength(engine.reflections.length);
    expect(analysis.echoes).toHaveLength(engine.echoes.length);
    expect(answer.bytes).toBeLessThan(150 * 1024);
  });

  it('include=envelopes carries every envelope, the engine’s own to the stated rounding', async () => {
    const answer = await raw(analyze, 'POST', '/api/v1/analyze?include=envelopes', await team.cookieFor('engineer'), hundredSegmentRun());
    expect(answer.status).toBe(200);
    const analysis = answer.body as RunAnalysis;
    expectSameResonances(analysis.resonances, engine.resonances);
    analysis.resonances.forEach((resonance, index) => expectSameEnvelope(resonance.pressureEnvelope, engine.resonances[index].pressureEnvelope!, `order ${resonance.order}`));
  });

  it('envelopes=10,11 carries those two only', async () => {
    const answer = await raw(analyze, 'POST', '/api/v1/analyze?envelopes=10,11', await team.cookieFor('acoustician'), hundredSegmentRun());
    expect(answer.status).toBe(200);
    const resonances = (answer.body as RunAnalysis).resonances;
    expect(resonances.filter((resonance) => resonance.pressureEnvelope).map((resonance) => resonance.order)).toEqual([10, 11]);
    for (const order of [10, 11]) {
      expectSameEnvelope(resonances.find((resonance) => resonance.order === order)!.pressureEnvelope, engine.resonances.find((resonance) => resonance.order === order)!.pressureEnvelope!, `order ${order}`);
    }
  });

  it('refuses a bad query with a 400 naming it, before any work', async () => {
    const cookie = await team.cookieFor('engineer');
    const typo = await call(analyze, 'POST', '/api/v1/analyze?include=envelope', { cookie, body: hundredSegmentRun() });
    expect(typo.status).toBe(400);
    expect(typo.body).toMatchObject({ error: { code: 'bad_input', field: expect.stringMatching(/^include/) } });
    const both = await call(analyze, 'POST', '/api/v1/analyze?include=envelopes&envelopes=2', { cookie, body: hundredSegmentRun() });
    expect(both.body).toMatchObject({ error: { code: 'bad_input', field: 'envelopes', message: expect.stringContaining('not both') } });
    const unknown = await call(analyze, 'POST', '/api/v1/analyze?envelope=2', { cookie, body: hundredSegmentRun() });
    expect(unknown.body).toMatchObject({ error: { code: 'bad_input', message: expect.stringContaining('unknown query parameter envelope') } });
  });
});

describe('GET /api/v1/plans/{planId}/results', () => {
  let planId: string;
  let runId: string;
  let engineRuns: Map<string, RunAnalysis>;

  beforeAll(async () => {
    const projectId = (await createProject(team.team.id, team.members.acoustician.id, { name: 'Answers', site: '' })).id;
    const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    planId = (await createPlan(team.team.id, team.members.acoustician.id, projectId, 'Answers plan')).id;
    const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie: await team.cookieFor('acoustician'), params: { planId }, body: { version: 1, metresPerPixel: DEMO_METRES_PER_PIXEL, document } });
    expect(saved.status).toBe(200);
    const labelled = assignLabels(document);
    engineRuns = new Map(labelled.runs.map((run) => [run.id, analyzeRun(toRunInputWithMap(labelled, run.id, DEMO_METRES_PER_PIXEL).input)]));
    runId = labelled.runs[0].id;
  });

  const results = async (query: string) => raw(getResults, 'GET', `/api/v1/plans/${planId}/results${query}`, await team.cookieFor('viewer'), undefined, { planId });

  it('carries no envelope by default, the same resonances as the engine to 0.001 Hz', async () => {
    const answer = await results('');
    expect(answer.status).toBe(200);
    const { runs } = answer.body as PlanResultsAnswer;
    expect(runs.length).toBe(engineRuns.size);
    for (const run of runs) {
      expect(run.analysis!.resonances.every((resonance) => resonance.pressureEnvelope === undefined)).toBe(true);
      expectSameResonances(run.analysis!.resonances, engineRuns.get(run.runId)!.resonances);
    }
  });

  it('runId with envelopes=<order> carries that resonance’s envelope of that run only, as the engine computes it', async () => {
    const order = engineRuns.get(runId)!.resonances[2].order;
    const answer = await results(`?runId=${encodeURIComponent(runId)}&envelopes=${order}`);
    expect(answer.status).toBe(200);
    const { runs } = answer.body as PlanResultsAnswer;
    const carrying = runs.flatMap((run) => (run.analysis?.resonances ?? []).filter((resonance) => resonance.pressureEnvelope).map((resonance) => `${run.runId}:${resonance.order}`));
    expect(carrying).toEqual([`${runId}:${order}`]);
    const sent = runs.find((run) => run.runId === runId)!.analysis!.resonances.find((resonance) => resonance.order === order)!;
    expectSameEnvelope(sent.pressureEnvelope, engineRuns.get(runId)!.resonances.find((resonance) => resonance.order === order)!.pressureEnvelope!, `order ${order}`);
  });

  it('include=envelopes carries every envelope of every run', async () => {
    const answer = await results('?include=envelopes');
    expect(answer.status).toBe(200);
    for (const run of (answer.body as PlanResultsAnswer).runs) {
      const computed = engineRuns.get(run.runId)!;
      run.analysis!.resonances.forEach((resonance, index) => expectSameEnvelope(resonance.pressureEnvelope, computed.resonances[index].pressureEnvelope!, `${run.runId} order ${resonance.order}`));
    }
  });

  it('refuses a run the plan does not have, naming runId', async () => {
    const answer = await results('?runId=no-such-run&envelopes=1');
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'runId' } });
  });
});
