// The change summary of a revision covers the plan document, not only the analysis: a fan going
// from 10 to 11 blades (and a new speed) is listed, named by its run, beside the resonances it
// moves. Blade-pass frequency = blades × rpm / 60 (any fan handbook, from memory): 10 × 605 / 60 =
// 100.8 Hz, 11 × 550 / 60 = 100.8 Hz, so the resonance table alone would not show the change.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { getPlan, savePlanDocument } from '@/lib/plans/data';
import { planLabels } from '@/lib/plan/labels';
import { createProject } from '@/lib/projects/data';
import { call } from '../helpers/routes';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan, submitted } from '../helpers/revisions';
import { GET as read } from '@/app/api/v1/revisions/[revisionId]/route';

let t: TestTeam;
let planId: string;

beforeAll(async () => {
  t = await createTestTeam('changes');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Changes project', site: '' });
  planId = await recitalPlan(t, project.id, 'Recital supply');
});
afterAll(async () => { await sequelize.close(); });

describe('what changed since the previous revision', () => {
  it('lists a fan change from 10 to 11 blades and 605 to 550 rpm, and a new criterion, by name', async () => {
    const first = await submitted(t, planId);
    const plan = await getPlan(t.team.id, planId);
    const edited = {
      ...plan.document,
      runs: plan.document.runs.map((run) => ({ ...run, fan: { ...run.fan!, blades: 11, rpm: 550 } })),
      rooms: plan.document.rooms.map((room) => ({ ...room, criterionNc: 25 })),
    };
    await savePlanDocument(t.team.id, t.members.acoustician.id, planId, { version: plan.version, metresPerPixel: plan.metresPerPixel, document: edited });
    const second = await submitted(t, planId);

    const firstRead = await call(read, 'GET', '/x', { cookie: await t.cookieFor('engineer'), params: { revisionId: first.id } });
    expect(firstRead.body).toMatchObject({ changes: { plan: null, runs: { previousNumber: null } } });

    const answer = await call(read, 'GET', '/x', { cookie: await t.cookieFor('engineer'), params: { revisionId: second.id } });
    expect(answer.status).toBe(200);
    const run = `Run ${planLabels(plan.document).runs[plan.document.runs[0].id]} (${plan.document.runs[0].name})`;
    const changes = (answer.body as { changes: { runs: { previousNumber: number }; plan: unknown[] } }).changes;
    expect(changes.runs.previousNumber).toBe(1);
    expect(changes.plan).toEqual([
      { area: 'fan', subject: run, what: 'Fan blades', before: '10', after: '11' },
      { area: 'fan', subject: run, what: 'Fan speed', before: '605 rpm', after: '550 rpm' },
      { area: 'room', subject: 'Recital room', what: 'Criterion', before: 'NC 20', after: 'NC 25' },
    ]);
  });
});
