// Malformed ids, dates and text are refused with a 400 that names them, before any query, and
// nothing is stored. (Before, each of these reached PostgreSQL and came back as a 500.)
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as writeComment } from '@/app/api/v1/comments/route';
import { PUT as saveDocument } from '@/app/api/v1/plans/[planId]/document/route';
import { PATCH as patchPlan } from '@/app/api/v1/plans/[planId]/route';
import { PATCH as patchProject } from '@/app/api/v1/projects/[projectId]/route';
import { POST as createProjectRoute } from '@/app/api/v1/projects/route';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { GET as exportAudit } from '@/app/api/v1/team/audit/export/route';
import { GET as listAudit } from '@/app/api/v1/team/audit/route';
import { sequelize } from '@/lib/db';
import { NUL_MESSAGE, SURROGATE_MESSAGE } from '@/lib/text';
import { getPlan } from '@/lib/plans/data';
import { createProject, getProject } from '@/lib/projects/data';
import { Comment, Project } from '@/models';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan } from '../helpers/revisions';
import { call, listRouteFiles, loadHandlers, type Method } from '../helpers/routes';

const NUL = '\u0000';
// A high surrogate with no low surrogate after it: half of a character (Unicode Standard §3.9, D91).
const LONE_HIGH = '\uD834';
// A low surrogate with no high surrogate before it.
const LONE_LOW = '\uDD1E';

let team: TestTeam;
let admin: string;
let projectId: string;
let planId: string;
beforeAll(async () => {
  team = await createTestTeam('malformed');
  admin = await team.cookieFor('admin');
  projectId = (await createProject(team.team.id, team.members.acoustician.id, { name: 'Malformed project', site: 'Quay 4' })).id;
  planId = await recitalPlan(team, projectId, 'Malformed plan');
});
afterAll(async () => { await sequelize.close(); });

describe('ids in the URL', () => {
  const withIds = listRouteFiles().filter((route) => route.params.some((name) => name.endsWith('Id')));

  it('finds the routes with ids', () => {
    expect(withIds.map((route) => route.urlPath)).toEqual(expect.arrayContaining(['/api/v1/plans/[planId]', '/api/v1/uploads/[uploadId]', '/api/v1/schedules/[scheduleId]']));
  });

  for (const route of withIds) {
    for (const bad of ['not-an-id', '12345678-1234-1234-1234-1234567890ab\'--', '------------------------------------']) {
      it(`${route.urlPath} refuses ${JSON.stringify(bad)} with a 400 naming the id`, async () => {
        const handlers = await loadHandlers(route);
        for (const [method, handler] of Object.entries(handlers) as [Method, NonNullable<(typeof handlers)[Method]>][]) {
          const params = Object.fromEntries(route.params.map((name) => [name, bad]));
          const answer = await call(handler, method, route.urlPath, { cookie: admin, params, body: method === 'GET' ? undefined : {} });
          expect(answer.status, `${method} ${route.urlPath}`).toBe(400);
          expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: route.params.find((name) => name.endsWith('Id')) } });
        }
      });
    }
  }
});

describe('dates in the audit log filter', () => {
  for (const [query, field] of [['from=2026-13-45', 'from'], ['to=2026-02-30', 'to'], ['from=2025-02-29', 'from']] as const) {
    it(`?${query} is a 400 naming ${field}, on the log and its export`, async () => {
      for (const handler of [listAudit, exportAudit]) {
        const answer = await call(handler, 'GET', `/api/v1/team/audit?${query}`, { cookie: admin });
        expect(answer.status).toBe(400);
        expect(answer.body).toMatchObject({ error: { code: 'bad_input', field, message: expect.stringContaining('does not exist') } });
      }
    });
  }

  it('a leap day that exists is a filter like any other', async () => {
    // 2028 is divisible by 4 and not by 100: a leap year of the Gregorian calendar.
    const answer = await call(listAudit, 'GET', '/api/v1/team/audit?from=2028-02-29', { cookie: admin });
    expect(answer.status).toBe(200);
  });
});

describe('text with a NUL character or a lone surrogate', () => {
  it('a new project is refused naming name or site, and none is created', async () => {
    const before = await Project.count({ where: { teamId: team.team.id } });
    for (const [body, field, message] of [
      [{ name: `Recital${NUL}room` }, 'name', NUL_MESSAGE],
      [{ name: 'Recital room', site: `Quay ${LONE_HIGH}` }, 'site', SURROGATE_MESSAGE],
      [{ name: `${LONE_LOW}Recital room` }, 'name', SURROGATE_MESSAGE],
    ] as const) {
      const answer = await call(createProjectRoute, 'POST', '/api/v1/projects', { cookie: admin, body });
      expect(answer.status).toBe(400);
      expect(answer.body).toMatchObject({ error: { code: 'bad_input', field, message: `${field}: ${message}` } });
    }
    expect(await Project.count({ where: { teamId: team.team.id } })).toBe(before);
  });

  it('a project or plan rename is refused and the old name kept', async () => {
    const project = await call(patchProject, 'PATCH', `/api/v1/projects/${projectId}`, { cookie: admin, params: { projectId }, body: { version: 1, site: `Quay${NUL}` } });
    expect(project.body).toMatchObject({ error: { field: 'site' } });
    expect((await getProject(team.team.id, projectId))?.site).toBe('Quay 4');
    const plan = await call(patchPlan, 'PATCH', `/api/v1/plans/${planId}`, { cookie: admin, params: { planId }, body: { detailsVersion: 1, name: `Level 1${LONE_HIGH}` } });
    expect(plan.body).toMatchObject({ error: { field: 'name' } });
    expect((await getPlan(team.team.id, planId)).name).toBe('Malformed plan');
  });

  it('a plan document is refused naming the run, room or placeholder, and the saved version kept', async () => {
    const saved = await getPlan(team.team.id, planId);
    const document = saved.document;
    const cases: [unknown, string][] = [
      [{ ...document, runs: document.runs.map((run) => ({ ...run, name: `Supply${NUL}` })) }, 'document.runs.0.name'],
      [{ ...document, rooms: document.rooms.map((room) => ({ ...room, name: `Recital room ${LONE_HIGH}` })) }, 'document.rooms.0.name'],
      [{ ...document, outlets: [{ label: `Grille${NUL}` }] }, 'document.outlets.0.label'],
      [{ ...document, listeners: [{ [`seat${LONE_LOW}`]: 1 }] }, 'document.listeners.0'],
    ];
    for (const [body, field] of cases) {
      const answer = await call(saveDocument, 'PUT', `/api/v1/plans/${planId}/document`, { cookie: admin, params: { planId }, body: { version: saved.version, metresPerPixel: saved.metresPerPixel, document: body } });
      expect(answer.status, field).toBe(400);
      expect(answer.body, field).toMatchObject({ error: { code: 'bad_input', field } });
    }
    const after = await getPlan(team.team.id, planId);
    expect(after.version).toBe(saved.version);
    expect(after.document).toEqual(document);
  });

  it('a comment is refused naming its body, and none is written', async () => {
    const before = await Comment.count({ where: { planId } });
    const answer = await call(writeComment, 'POST', '/api/v1/comments', { cookie: admin, body: { planId, xPx: 1, yPx: 1, body: `Hum at the back ${LONE_HIGH}` } });
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'body' } });
    expect(await Comment.count({ where: { planId } })).toBe(before);
  });

  it('the public sign-in route names the e-mail instead of failing in the database', async () => {
    const answer = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: `someone${NUL}@example.test`, password: 'whatever it is' } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'email' } });
  });
});
