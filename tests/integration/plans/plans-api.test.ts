import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as createPlanRoute } from '@/app/api/v1/projects/[projectId]/plans/route';
import { GET as getPlanRoute, PATCH as patchPlan } from '@/app/api/v1/plans/[planId]/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { GET as getResults } from '@/app/api/v1/plans/[planId]/results/route';
import { sequelize } from '@/lib/db';
import { emptyDocument, performCommand, initialEditorState, sequentialIds, type PlanDocument } from '@/lib/plan';
import { createProject } from '@/lib/projects/data';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
let projectId: string;
beforeAll(async () => {
  team = await createTestTeam('plans');
  projectId = (await createProject(team.team.id, team.members.acoustician.id, { name: 'Plans project', site: '' })).id;
});
afterAll(async () => { await sequelize.close(); });

// A straight run of 300 px drawn in one segment: closed start, open unflanged end.
function straightRun(): PlanDocument {
  const newId = sequentialIds('t');
  return performCommand('draw-segment', emptyDocument(), initialEditorState(), { from: { point: { x: 0, y: 0 } }, to: { point: { x: 300, y: 0 } } }, newId).doc;
}

async function newPlan(name: string): Promise<string> {
  const created = await call(createPlanRoute, 'POST', `/api/v1/projects/${projectId}/plans`, { cookie: await team.cookieFor('acoustician'), body: { name }, params: { projectId } });
  expect(created.status).toBe(201);
  return (created.body as { plan: { id: string } }).plan.id;
}

describe('plan names and archive state', () => {
  // Optimistic concurrency: a change carries the version it was made from (common practice, no source).
  it('take a rename made from an older copy as a 409 and keep the newer name; a rename never makes the drawing’s next save a conflict', async () => {
    const planId = await newPlan('Level 4 supply');
    const cookie = await team.cookieFor('acoustician');
    const mine = await call(patchPlan, 'PATCH', `/api/v1/plans/${planId}`, { cookie, params: { planId }, body: { detailsVersion: 1, name: 'Level 4 supply, east' } });
    expect(mine.status).toBe(200);
    expect(mine.body).toMatchObject({ plan: { name: 'Level 4 supply, east', detailsVersion: 2, version: 1 } });
    const theirs = await call(patchPlan, 'PATCH', `/api/v1/plans/${planId}`, { cookie, params: { planId }, body: { detailsVersion: 1, name: 'Level 4 supply, west' } });
    expect(theirs.status).toBe(409);
    expect(theirs.body).toMatchObject({ error: { code: 'conflict', field: 'detailsVersion' } });
    expect((theirs.body as { error: { message: string } }).error.message).toContain('it is now “Level 4 supply, east”');
    const read = await call(getPlanRoute, 'GET', `/api/v1/plans/${planId}`, { cookie, params: { planId } });
    expect(read.body).toMatchObject({ plan: { name: 'Level 4 supply, east', detailsVersion: 2 } });
    // the editor opened at drawing version 1 still saves after the rename
    const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, body: { version: 1, metresPerPixel: 0.01, document: straightRun() } });
    expect(saved.status).toBe(200);
  });
});

describe('plan documents', () => {
  it('saves with the loaded version and refuses a stale one with 409, keeping the newer save', async () => {
    const planId = await newPlan('Versioned');
    const cookie = await team.cookieFor('acoustician');
    const first = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, body: { version: 1, metresPerPixel: 0.01, document: straightRun() } });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ version: 2 });

    const stale = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, body: { version: 1, metresPerPixel: 0.01, document: emptyDocument() } });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: { code: 'conflict', message: expect.stringContaining('version 2') } });

    const loaded = await call(getPlanRoute, 'GET', `/api/v1/plans/${planId}`, { cookie, params: { planId } });
    expect((loaded.body as { plan: { version: number; document: PlanDocument } }).plan.version).toBe(2);
    expect((loaded.body as { plan: { document: PlanDocument } }).plan.document.segments).toHaveLength(1);
  });

  it('names the bad field of a document and stores nothing', async () => {
    const planId = await newPlan('Bad document');
    const cookie = await team.cookieFor('acoustician');
    const document = straightRun();
    const broken = { ...document, segments: [{ ...document.segments[0], section: { shape: 'round', diameterM: 0.002 } }] };
    const answer = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, body: { version: 1, metresPerPixel: 0.01, document: broken } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'document.segments.0.section.diameterM' } });
    const loaded = await call(getPlanRoute, 'GET', `/api/v1/plans/${planId}`, { cookie, params: { planId } });
    expect((loaded.body as { plan: { version: number } }).plan.version).toBe(1);
  });

  it('computes results from the saved document: closed–open resonance within 1 % of c / 4(L + 0.6133 a)', async () => {
    const planId = await newPlan('Results');
    const cookie = await team.cookieFor('acoustician');
    await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, body: { version: 1, metresPerPixel: 0.01, document: straightRun() } });
    const answer = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { cookie: await team.cookieFor('viewer'), params: { planId } });
    expect(answer.status).toBe(200);
    const run = (answer.body as { runs: { problem: string | null; analysis: { resonances: { frequencyHz: number }[] } }[] }).runs[0];
    expect(run.problem).toBeNull();
    // 300 px at 0.01 m/px = 3 m of Ø 250 mm (a = 0.125 m). Kinsler & Frey ch. 10, quarter-wave pipe;
    // Levine & Schwinger (1948) end correction 0.6133 a; c = 343.2 m/s at 20 °C (ISO 9613-1).
    const expectedHz = 343.2 / (4 * (3 + 0.6133 * 0.125));
    expect(Math.abs(run.analysis.resonances[0].frequencyHz - expectedHz) / expectedHz).toBeLessThan(0.01);
  });
});
