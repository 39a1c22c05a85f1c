// Requests that lie about themselves: an Origin matched against a forged X-Forwarded-Host, JSON
// sent under another content type, keys a schema does not know (or that name the prototype),
// and a rename made from an old copy. Origin checks against the site's own configured origin:
// OWASP Cross-Site Request Forgery Prevention Cheat Sheet ("Verifying Origin With Standard
// Headers": identify the target origin from configuration, not from the request's Host);
// 415 Unsupported Media Type: RFC 9110, section 15.5.16.
import { Op } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as createProjectRoute } from '@/app/api/v1/projects/route';
import { PATCH as patchProject } from '@/app/api/v1/projects/[projectId]/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { sequelize } from '@/lib/db';
import { publicOrigin } from '@/lib/http/same-origin';
import { createPlan, getPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { Project } from '@/models';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan } from '../helpers/revisions';
import { call, type Method } from '../helpers/routes';

let team: TestTeam;
let cookie: string;
beforeAll(async () => {
  team = await createTestTeam('request-checks');
  cookie = await team.cookieFor('admin');
});
afterAll(async () => { await sequelize.close(); });

describe('origin', () => {
  it('a forged X-Forwarded-Host does not make another site’s Origin look like ours', async () => {
    const forged = await call(createProjectRoute, 'POST', '/api/v1/projects', {
      cookie, body: { name: 'Forged host' }, headers: { origin: 'https://attacker.example', host: 'attacker.example', 'x-forwarded-host': 'attacker.example' },
    });
    expect(forged.status).toBe(403);
    expect(forged.body).toMatchObject({ error: { code: 'forbidden', message: expect.stringContaining('another site') } });
    expect(await Project.count({ where: { teamId: team.team.id, name: 'Forged host' } })).toBe(0);
    const ours = await call(createProjectRoute, 'POST', '/api/v1/projects', { cookie, body: { name: 'Our origin' }, headers: { origin: publicOrigin(), host: 'attacker.example' } });
    expect(ours.status).toBe(201);
  });
});

describe('content type', () => {
  it('a JSON route refuses a body sent as anything but JSON, with 415, before reading it', async () => {
    for (const type of ['text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', '']) {
      const request = new Request('http://localhost/api/v1/projects', {
        method: 'POST', headers: { host: 'localhost', cookie, ...(type ? { 'content-type': type } : {}) }, body: JSON.stringify({ name: `Sent as ${type || 'nothing'}` }),
      });
      const response = await createProjectRoute(request, { params: Promise.resolve({}) });
      expect(response.status, type).toBe(415);
      expect(await response.json()).toMatchObject({ error: { code: 'unsupported_media_type', message: expect.stringContaining('Content-Type: application/json') } });
    }
    expect(await Project.count({ where: { teamId: team.team.id, name: { [Op.like]: 'Sent as%' } } })).toBe(0);
    const json = await call(createProjectRoute, 'POST', '/api/v1/projects', { cookie, body: { name: 'Sent as JSON' }, headers: { 'content-type': 'application/json; charset=utf-8' } });
    expect(json.status).toBe(201);
  });
});

describe('keys', () => {
  it('a key the schema does not know is refused naming it, not dropped', async () => {
    const answer = await call(createProjectRoute, 'POST', '/api/v1/projects', { cookie, body: { name: 'Extra key', colour: 'teal' } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'colour', message: 'colour: is not a field this accepts; leave it out.' } });
    expect(await Project.count({ where: { teamId: team.team.id, name: 'Extra key' } })).toBe(0);
  });

  it('a __proto__ key inside a plan document is refused naming where it is, and the saved version kept', async () => {
    const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Proto project', site: '' });
    const planId = await recitalPlan(team, project.id, 'Proto plan');
    const saved = await getPlan(team.team.id, planId);
    const document = JSON.parse(JSON.stringify(saved.document)) as { runs: Record<string, unknown>[] };
    const body = JSON.stringify({ version: saved.version, metresPerPixel: saved.metresPerPixel, document })
      .replace('"runs":[{', '"runs":[{"__proto__":{"kind":"closed"},');
    const answer = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, rawBody: body });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'document.runs.0.__proto__', message: expect.stringContaining('"__proto__" is not allowed as a key') } });
    expect((await getPlan(team.team.id, planId)).version).toBe(saved.version);
  });

  it('an unknown key inside a plan document is refused naming its path', async () => {
    const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Unknown-key project', site: '' });
    const planId = await recitalPlan(team, project.id, 'Unknown-key plan');
    const saved = await getPlan(team.team.id, planId);
    const body = JSON.stringify({ version: saved.version, metresPerPixel: saved.metresPerPixel, document: saved.document })
      .replace('"runs":[{', '"runs":[{"colour":"teal",');
    const answer = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, params: { planId }, rawBody: body });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { field: 'document.runs.0.colour' } });
  });

  it('the document as the editor saves it passes whole (no key of it is unknown)', async () => {
    const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Whole project', site: '' });
    const planId = await recitalPlan(team, project.id, 'Whole plan');
    const saved = await getPlan(team.team.id, planId);
    const answer = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, {
      cookie, params: { planId }, body: { version: saved.version, metresPerPixel: saved.metresPerPixel, document: saved.document },
    });
    expect(answer.status).toBe(200);
    const empty = await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Empty plan');
    const emptySaved = await getPlan(team.team.id, empty.id);
    const emptyAnswer = await call(saveDocument, 'PUT', `/api/v1/plans/${empty.id}/document`, {
      cookie, params: { planId: empty.id }, body: { version: emptySaved.version, metresPerPixel: emptySaved.metresPerPixel, document: emptySaved.document },
    });
    expect(emptyAnswer.status).toBe(200);
  });
});

describe('project renames', () => {
  it('a rename made from an old copy is refused with 409 and the newer name kept', async () => {
    const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Before', site: '' });
    const patch = (body: unknown) => call(patchProject, 'PATCH' as Method, `/api/v1/projects/${project.id}`, { cookie, params: { projectId: project.id }, body });
    const first = await patch({ version: project.version, name: 'Renamed by one' });
    expect(first).toMatchObject({ status: 200, body: { project: { name: 'Renamed by one', version: project.version + 1 } } });
    const stale = await patch({ version: project.version, name: 'Renamed by another' });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: { code: 'conflict', field: 'version', message: expect.stringContaining('Someone changed this project since you opened it') } });
    expect(await Project.findByPk(project.id)).toMatchObject({ name: 'Renamed by one' });
    const missing = await patch({ name: 'No version' });
    expect(missing).toMatchObject({ status: 400, body: { error: { field: 'version' } } });
  });
});
