import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as getRisks } from '@/app/api/v1/plans/[planId]/risks/route';
import { POST as evaluate } from '@/app/api/v1/plans/[planId]/treatments/evaluate/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import type { PlanRisks } from '@/lib/plans/risks';
import type { TreatmentOptions } from '@/lib/plans/treatment-options';
import { createProject } from '@/lib/projects/data';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../../unit/plan/room-plan-fixture';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
let other: TestTeam;
let planId: string;

beforeAll(async () => {
  team = await createTestTeam('risks');
  other = await createTestTeam('risks-other');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Risk project', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Recital supply')).id;
  const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, {
    cookie: await team.cookieFor('acoustician'), params: { planId }, body: { version: 1, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, document: roomPlanDocument() },
  });
  expect(saved.status).toBe(200);
});
afterAll(async () => { await sequelize.close(); });

async function risks(role: 'viewer' | 'acoustician' = 'viewer'): Promise<PlanRisks & { version: number }> {
  const answer = await call(getRisks, 'GET', `/api/v1/plans/${planId}/risks`, { cookie: await team.cookieFor(role), params: { planId } });
  expect(answer.status).toBe(200);
  return answer.body as PlanRisks & { version: number };
}

describe('GET /api/v1/plans/[planId]/risks', () => {
  it('lists the tone flag of the run feeding the room, and the room results, to any member', async () => {
    const body = await risks('viewer');
    expect(body.version).toBe(2);
    const tone = body.flags.find((flag) => flag.subject === 'tone:h1');
    expect(tone).toMatchObject({ kind: 'resonance-near-tone', roomId: 'recital', runName: 'Supply to recital room' });
    // graded by the dB the run adds at the tone over the envelope (product rule: low from 3, medium from 6, high from 10)
    const gainDb = tone?.quantity.gainDb ?? 0;
    expect(tone?.severity).toBe(gainDb >= 10 ? 'high' : gainDb >= 6 ? 'medium' : 'low');
    expect(body.rooms[0]).toMatchObject({ roomId: 'recital', problem: null });
  });

  it("is not found for another team's member", async () => {
    const answer = await call(getRisks, 'GET', `/api/v1/plans/${planId}/risks`, { cookie: await other.cookieFor('admin'), params: { planId } });
    expect(answer.status).toBe(404);
  });
});

describe('POST /api/v1/plans/[planId]/treatments/evaluate', () => {
  it('returns candidate treatments with before and after for an engineer (evaluating changes nothing)', async () => {
    const tone = (await risks()).flags.find((flag) => flag.subject === 'tone:h1')!;
    const answer = await call(evaluate, 'POST', `/api/v1/plans/${planId}/treatments/evaluate`, {
      cookie: await team.cookieFor('engineer'), params: { planId }, body: { roomId: 'recital', flagId: tone.id },
    });
    expect(answer.status).toBe(200);
    const body = answer.body as TreatmentOptions & { version: number };
    expect(body.flag.id).toBe(tone.id);
    const retune = body.options.find((option) => option.treatment.kind === 'retune-length')!;
    expect(retune).toMatchObject({ clears: true, planChange: { kind: 'length-override', segmentId: 'main' } });
    // before: the resonance's band meets the tone's interval; after: a clear gap, and the run adds under 3 dB there
    expect(retune.before.distanceHz).toBeLessThanOrEqual(retune.before.windowHz ?? 0);
    expect(retune.after.distanceHz).toBeGreaterThan(retune.after.windowHz ?? Infinity);
    expect(retune.after.gainDb ?? Infinity).toBeLessThan(3);
    expect(retune.effect.clearanceHz ?? 0).toBeGreaterThan(0);
    expect((await risks()).version).toBe(2);
  });

  it('refuses a viewer, a stale flag (409) and a body without a target (400 naming it)', async () => {
    const viewer = await call(evaluate, 'POST', `/api/v1/plans/${planId}/treatments/evaluate`, { cookie: await team.cookieFor('viewer'), params: { planId }, body: { roomId: 'recital', flagId: 'x' } });
    expect(viewer.status).toBe(403);
    const cookie = await team.cookieFor('acoustician');
    const stale = await call(evaluate, 'POST', `/api/v1/plans/${planId}/treatments/evaluate`, { cookie, params: { planId }, body: { roomId: 'recital', flagId: 'resonance-near-tone:h1:1.0' } });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: { code: 'conflict', field: 'flagId' } });
    const noTarget = await call(evaluate, 'POST', `/api/v1/plans/${planId}/treatments/evaluate`, { cookie, params: { planId }, body: { flagId: 'x' } });
    expect(noTarget.status).toBe(400);
    expect(noTarget.body).toMatchObject({ error: { code: 'bad_input', field: 'roomId' } });
    const noRoom = await call(evaluate, 'POST', `/api/v1/plans/${planId}/treatments/evaluate`, { cookie, params: { planId }, body: { roomId: 'nowhere', flagId: 'x' } });
    expect(noRoom.status).toBe(400);
  });
});
