import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET, POST } from '@/app/api/v1/projects/route';
import { sequelize } from '@/lib/db';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

let teamA: TestTeam;
let teamB: TestTeam;
beforeAll(async () => { teamA = await createTestTeam('a'); teamB = await createTestTeam('b'); });
afterAll(async () => { await sequelize.close(); });

describe('projects API', () => {
  it('creates a project for the acoustician and lists it only within that team', async () => {
    const created = await call(POST, 'POST', '/api/v1/projects', { cookie: await teamA.cookieFor('acoustician'), body: { name: 'Harbour Hall', site: 'Level 2' } });
    expect(created.status).toBe(201);
    const listA = await call(GET, 'GET', '/api/v1/projects', { cookie: await teamA.cookieFor('viewer') });
    const listB = await call(GET, 'GET', '/api/v1/projects', { cookie: await teamB.cookieFor('admin') });
    expect((listA.body as { projects: { name: string }[] }).projects.map((p) => p.name)).toContain('Harbour Hall');
    expect((listB.body as { projects: { name: string }[] }).projects.map((p) => p.name)).not.toContain('Harbour Hall');
  });

  it('names the field that is wrong and stores nothing', async () => {
    const cookie = await teamA.cookieFor('acoustician');
    const before = await call(GET, 'GET', '/api/v1/projects', { cookie });
    const bad = await call(POST, 'POST', '/api/v1/projects', { cookie, body: { name: '   ' } });
    expect(bad.status).toBe(400);
    expect(bad.body).toMatchObject({ error: { code: 'bad_input', field: 'name', message: 'name: Give the project a name.' } });
    const after = await call(GET, 'GET', '/api/v1/projects', { cookie });
    expect((after.body as { projects: unknown[] }).projects).toHaveLength((before.body as { projects: unknown[] }).projects.length);
  });

  it('refuses a body that is not JSON or is too large', async () => {
    const cookie = await teamA.cookieFor('acoustician');
    const request = new Request('http://localhost/api/v1/projects', { method: 'POST', headers: { cookie, host: 'localhost', 'content-type': 'application/json' }, body: '{name:' });
    const notJson = await POST(request, { params: Promise.resolve({}) });
    expect(notJson.status).toBe(400);
    const huge = await call(POST, 'POST', '/api/v1/projects', { cookie, body: { name: 'x', site: 'y'.repeat(20_000) } });
    expect(huge.status).toBe(413);
  });
});
