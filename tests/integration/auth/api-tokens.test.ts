// Personal API tokens: created on the account page's route, used as Authorization: Bearer by a script
// on the same routes with the same permission checks, refused with a 401 that says why once revoked or
// expired, never able to do more than their person (product behaviour, no outside source).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as analyze } from '@/app/api/v1/analyze/route';
import { GET as listTokens, POST as createToken } from '@/app/api/v1/me/tokens/route';
import { DELETE as revokeToken } from '@/app/api/v1/me/tokens/[tokenId]/route';
import { GET as getResults } from '@/app/api/v1/plans/[planId]/results/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { ApiToken, AuditEvent } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../../unit/plan/room-plan-fixture';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let team: TestTeam;
let planId: string;

const run = { segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }], start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxHz: 300 };
const bearer = (token: string) => ({ authorization: `Bearer ${token}` });

async function newToken(role: string, cookieOf: 'acoustician' | 'viewer' = 'acoustician', expiresInDays = 30): Promise<{ token: string; id: string }> {
  const answer = await call(createToken, 'POST', '/api/v1/me/tokens', { cookie: await team.cookieFor(cookieOf), body: { name: `script ${role}`, teamId: team.team.id, role, expiresInDays } });
  expect(answer.status).toBe(201);
  const body = answer.body as { token: string; record: { id: string } };
  return { token: body.token, id: body.record.id };
}

beforeAll(async () => {
  team = await createTestTeam('tokens');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Token project', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Scripted plan')).id;
  const saved = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, {
    cookie: await team.cookieFor('acoustician'), params: { planId }, body: { version: 1, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, document: roomPlanDocument() },
  });
  expect(saved.status).toBe(200);
});
afterAll(async () => { await sequelize.close(); });

describe('API tokens', () => {
  it('a token analyses a run and reads a plan\'s results as its person; only its hash is stored; the list never shows it', async () => {
    const { token, id } = await newToken('acoustician');
    expect(token).toMatch(/^ant_/);
    const stored = await ApiToken.findByPk(id);
    expect(stored?.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored?.tokenHash).not.toContain(token);
    const analysed = await call(analyze, 'POST', '/api/v1/analyze', { headers: bearer(token), body: run });
    expect(analysed.status).toBe(200);
    expect((analysed.body as { resonances: unknown[] }).resonances.length).toBeGreaterThan(0);
    const results = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { headers: bearer(token), params: { planId } });
    expect(results.status).toBe(200);
    const listed = await call(listTokens, 'GET', '/api/v1/me/tokens', { cookie: await team.cookieFor('acoustician') });
    expect(JSON.stringify(listed.body)).not.toContain(token);
    expect((await ApiToken.findByPk(id))?.lastUsedAt).not.toBeNull();
    expect(await AuditEvent.count({ where: { teamId: team.team.id, action: 'token.created' } })).toBeGreaterThan(0);
  });

  it('is refused with a 401 that says so once revoked, and when expired', async () => {
    const { token, id } = await newToken('viewer');
    const revoked = await call(revokeToken, 'DELETE', `/api/v1/me/tokens/${id}`, { cookie: await team.cookieFor('acoustician'), params: { tokenId: id } });
    expect(revoked.status).toBe(200);
    const after = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { headers: bearer(token), params: { planId } });
    expect(after.status).toBe(401);
    expect((after.body as { error: { message: string } }).error.message).toMatch(/was revoked on \d{4}-\d{2}-\d{2}/);
    const { token: old, id: oldId } = await newToken('viewer');
    await ApiToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: oldId } });
    const expired = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { headers: bearer(old), params: { planId } });
    expect(expired.status).toBe(401);
    expect((expired.body as { error: { message: string } }).error.message).toMatch(/expired on/);
    const unknown = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { headers: bearer('ant_nothing'), params: { planId } });
    expect(unknown.status).toBe(401);
  });

  it('cannot exceed its role nor its person\'s: a viewer token may read but not edit; a viewer may not create an editing token', async () => {
    const { token } = await newToken('viewer');
    const edit = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { headers: bearer(token), params: { planId }, body: { version: 2, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, document: roomPlanDocument() } });
    expect(edit.status).toBe(403);
    const above = await call(createToken, 'POST', '/api/v1/me/tokens', { cookie: await team.cookieFor('viewer'), body: { name: 'too much', teamId: team.team.id, role: 'acoustician', expiresInDays: 30 } });
    expect(above.status).toBe(400);
    expect((above.body as { error: { message: string; field: string } }).error).toMatchObject({ field: 'role' });
    // an engineer's review rights are not an acoustician's: an acoustician may not hand them to a token
    const sideways = await call(createToken, 'POST', '/api/v1/me/tokens', { cookie: await team.cookieFor('acoustician'), body: { name: 'review', teamId: team.team.id, role: 'engineer', expiresInDays: 30 } });
    expect(sideways.status).toBe(400);
  });

  it('tokens cannot manage tokens, and a malformed header says how to send one', async () => {
    const { token } = await newToken('acoustician');
    const managing = await call(listTokens, 'GET', '/api/v1/me/tokens', { headers: bearer(token) });
    expect(managing.status).toBe(403);
    const malformed = await call(getResults, 'GET', `/api/v1/plans/${planId}/results`, { headers: { authorization: token }, params: { planId } });
    expect(malformed.status).toBe(401);
    expect((malformed.body as { error: { message: string } }).error.message).toContain('Authorization: Bearer');
  });
});
