// Saving a plan refuses the measured abuse cases of the bounded-work issue (a 100 km length override,
// 100 m per pixel, 5000 runs) with a 400 naming the field and the limit, and stores nothing; a plan
// saved before the limits still opens, and its results name the limit its run breaks. Limits:
// lib/plan/schema-parts.ts and lib/acoustic/input-limits.ts (product rules, no source).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as getPlanRoute } from '@/app/api/v1/plans/[planId]/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { GET as getResults } from '@/app/api/v1/plans/[planId]/results/route';
import { sequelize } from '@/lib/db';
import type { PlanDocument } from '@/lib/plan';
import { createPlan } from '@/lib/plans/data';
import type { RunResult } from '@/lib/plans/results';
import { createProject } from '@/lib/projects/data';
import { Plan } from '@/models';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';
import { roomPlanDocument } from '../../unit/plan/room-plan-fixture';

let team: TestTeam;
let projectId: string;
beforeAll(async () => {
  team = await createTestTeam('plan-limits');
  projectId = (await createProject(team.team.id, team.members.acoustician.id, { name: 'Limits project', site: '' })).id;
});
afterAll(async () => { await sequelize.close(); });

/** The room plan's run entered `count` times (ids r0, r1, ...), all on its drawn segments: a document of many runs and little else. */
function manyRuns(count: number): PlanDocument {
  const doc = roomPlanDocument();
  return { ...doc, runs: Array.from({ length: count }, (_, index) => ({ ...doc.runs[0], id: `r${index}` })) };
}

const withOverride = (lengthOverrideM: number): PlanDocument => {
  const doc = roomPlanDocument();
  return { ...doc, segments: [{ ...doc.segments[0], lengthOverrideM }, ...doc.segments.slice(1)] };
};

async function save(planId: string, metresPerPixel: number, document: unknown) {
  return call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie: await team.cookieFor('acoustician'), params: { planId }, body: { version: 1, metresPerPixel, document } });
}

describe('PUT plan document limits', () => {
  it.each([
    ['a 100 km length override', 0.01, withOverride(100000), 'document.segments.0.lengthOverrideM', 'must be at most 500 m'],
    ['100 m per pixel', 100, roomPlanDocument(), 'metresPerPixel', 'must be at most 1 (1 m per pixel); set the scale again'],
    ['5000 runs', 0.01, manyRuns(5000), 'document.runs', 'at most 200 runs'],
  ])('refuses %s with a 400 naming the field and the limit, and stores nothing', async (_case, metresPerPixel, document, field, message) => {
    const plan = await createPlan(team.team.id, team.members.acoustician.id, projectId, 'Refused');
    const answer = await save(plan.id, metresPerPixel, document);
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({ error: { code: 'bad_input', field, message: `${field}: ${message}` } });
    const stored = await Plan.findByPk(plan.id);
    expect([stored?.version, stored?.metresPerPixel, (stored?.document as PlanDocument).runs.length]).toEqual([1, 0.01, 0]);
  });

  it('saves at the limits: a 500 m override, 1 m per pixel', async () => {
    for (const [metresPerPixel, document] of [[0.01, withOverride(500)], [1, roomPlanDocument()]] as const) {
      const plan = await createPlan(team.team.id, team.members.acoustician.id, projectId, 'At the limit');
      expect((await save(plan.id, metresPerPixel, document)).status).toBe(200);
    }
  });

  it('a plan saved before the limits opens as saved; its results name the limit its run breaks', async () => {
    const plan = await createPlan(team.team.id, team.members.acoustician.id, projectId, 'Saved before the limits');
    await Plan.update({ document: withOverride(100000) }, { where: { id: plan.id } });
    const cookie = await team.cookieFor('viewer');
    const opened = await call(getPlanRoute, 'GET', `/api/v1/plans/${plan.id}`, { cookie, params: { planId: plan.id } });
    expect(opened.status).toBe(200);
    expect((opened.body as { plan: { document: PlanDocument } }).plan.document.segments[0].lengthOverrideM).toBe(100000);
    const results = await call(getResults, 'GET', `/api/v1/plans/${plan.id}/results`, { cookie, params: { planId: plan.id } });
    expect(results.status).toBe(200);
    const [run] = (results.body as { runs: RunResult[] }).runs;
    expect(run).toMatchObject({ analysis: null, problem: 'segments[0].lengthM must be <= 500' });
  });
});
