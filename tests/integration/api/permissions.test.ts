// Walks every route handler under app/api with no session, with each role, and with each
// role of another team, and checks each answer against the one permission map in
// lib/permissions.ts. Nothing of one team may show in another team's answers.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { can, ROLES, type Action } from '@/lib/permissions';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { storePlanBackground } from '@/lib/uploads/data';
import { tinyPng } from '../helpers/files';
import { publicOrigin } from '@/lib/http/same-origin';
import { newLinkToken } from '@/lib/tokens';
import { randomUUID } from 'node:crypto';
import { ApiToken, Invitation, Membership } from '@/models';
import { addMember, createTestTeam, type TestTeam } from '../helpers/people';
import { reviewFixtures } from '../helpers/revisions';
import { call, listRouteFiles, loadHandlers, type Method } from '../helpers/routes';

// What each route handler must require. A new handler fails the walk until it is listed here.
const EXPECTED_ACCESS: Record<string, string> = {
  'POST /api/v1/analyze': 'analysis.run',
  'GET /api/v1/health': 'public',
  'GET /api/v1/ready': 'public',
  'GET /api/v1/openapi.json': 'public',
  'GET /api/v1/me': 'signed-in',
  'PUT /api/v1/me/preferences': 'signed-in',
  'GET /api/v1/me/tokens': 'signed-in',
  'POST /api/v1/me/tokens': 'signed-in',
  'DELETE /api/v1/me/tokens/[tokenId]': 'signed-in',
  'GET /api/v1/projects': 'project.read',
  'POST /api/v1/projects': 'project.create',
  'POST /api/v1/sessions': 'public',
  'PUT /api/v1/sessions/current': 'signed-in',
  'DELETE /api/v1/sessions/current': 'signed-in',
  'POST /api/v1/billing/webhook': 'public',
  'POST /api/v1/invitations/accept': 'public',
  'POST /api/v1/password-resets': 'public',
  'POST /api/v1/password-resets/complete': 'public',
  'POST /api/v1/sign-ups': 'public',
  'POST /api/v1/sign-ups/confirm': 'public',
  'GET /api/v1/team/audit': 'audit.read',
  'GET /api/v1/team/audit/export': 'audit.read',
  'GET /api/v1/team/billing': 'billing.manage',
  'PUT /api/v1/team/billing/seats': 'billing.manage',
  'DELETE /api/v1/team/billing/subscription': 'billing.manage',
  'GET /api/v1/team/invitations': 'members.manage',
  'POST /api/v1/team/invitations': 'members.manage',
  'DELETE /api/v1/team/invitations/[invitationId]': 'members.manage',
  'POST /api/v1/team/invitations/[invitationId]/resend': 'members.manage',
  'GET /api/v1/team/members': 'team.read',
  'PATCH /api/v1/team/members/[memberId]': 'members.manage',
  'POST /api/v1/team/practice/logo': 'members.manage',
  'DELETE /api/v1/team/practice/logo': 'members.manage',
  'GET /api/v1/projects/[projectId]': 'project.read',
  'PATCH /api/v1/projects/[projectId]': 'project.update',
  'GET /api/v1/projects/[projectId]/plans': 'plan.read',
  'POST /api/v1/projects/[projectId]/plans': 'plan.edit',
  'GET /api/v1/plans/[planId]': 'plan.read',
  'PATCH /api/v1/plans/[planId]': 'plan.edit',
  'PUT /api/v1/plans/[planId]/document': 'plan.edit',
  'GET /api/v1/plans/[planId]/results': 'plan.read',
  'GET /api/v1/plans/[planId]/risks': 'plan.read',
  'POST /api/v1/plans/[planId]/treatments/evaluate': 'analysis.run',
  'POST /api/v1/plans/[planId]/background': 'plan.edit',
  'DELETE /api/v1/plans/[planId]/background': 'plan.edit',
  'PUT /api/v1/plans/[planId]/background': 'plan.edit',
  'GET /api/v1/uploads/[uploadId]': 'plan.read',
  'DELETE /api/v1/team/members/[memberId]': 'members.manage',
  'GET /api/v1/plans/[planId]/revisions': 'plan.read',
  'POST /api/v1/plans/[planId]/revisions': 'plan.edit',
  'GET /api/v1/revisions/[revisionId]': 'plan.read',
  'PUT /api/v1/revisions/[revisionId]/decisions': 'review.write',
  'POST /api/v1/revisions/[revisionId]/review': 'review.write',
  'POST /api/v1/revisions/[revisionId]/clear-rows': 'review.write',
  'GET /api/v1/revisions/[revisionId]/schedules': 'schedule.read',
  'POST /api/v1/revisions/[revisionId]/schedules': 'schedule.issue',
  'GET /api/v1/revisions/[revisionId]/schedule-preview': 'schedule.read',
  'GET /api/v1/schedules/[scheduleId]': 'schedule.read',
  'GET /api/v1/comments': 'plan.read',
  'POST /api/v1/comments': 'comment.write',
  'PATCH /api/v1/comments/[commentId]': 'comment.write',
};

const WRITE_METHODS = new Set<Method>(['POST', 'PUT', 'PATCH', 'DELETE']);
let testTeam: TestTeam;
let otherTeam: TestTeam;
let fixtureParams: Record<string, string>;
let thisTeamIds: RegExp;

beforeAll(async () => {
  testTeam = await createTestTeam('walk');
  otherTeam = await createTestTeam('walk-other');
  const project = await createProject(testTeam.team.id, testTeam.members.acoustician.id, { name: 'Walk project', site: '' });
  const extra = await addMember(testTeam.team.id, 'viewer', 'walk-extra');
  const extraMembership = await Membership.findOne({ where: { userId: extra.id, teamId: testTeam.team.id } });
  const invitation = await Invitation.create({
    teamId: testTeam.team.id, email: 'walk-invitee@example.test', role: 'viewer', tokenHash: newLinkToken().tokenHash,
    invitedById: testTeam.members.admin.id, expiresAt: new Date(Date.now() + 86_400_000),
  });
  // Every dynamic segment a route may use needs a value from this team.
  const plan = await createPlan(testTeam.team.id, testTeam.members.acoustician.id, project.id, 'Walk plan');
  const upload = await storePlanBackground(testTeam.team.id, testTeam.members.acoustician.id, 'walk.png', tinyPng());
  const reviewed = await reviewFixtures(testTeam, project.id);
  const token = await ApiToken.create({
    id: randomUUID(), userId: testTeam.members.viewer.id, teamId: testTeam.team.id, name: 'walk token', role: 'viewer', tokenHash: newLinkToken().tokenHash,
    prefix: 'ant_walk', expiresAt: new Date(Date.now() + 86_400_000), lastUsedAt: null, revokedAt: null,
  });
  fixtureParams = { projectId: project.id, memberId: extraMembership!.id, invitationId: invitation.id, planId: plan.id, uploadId: upload.id, tokenId: token.id, ...reviewed };
  const ids = [testTeam.team.id, extra.id, ...Object.values(fixtureParams), ...Object.values(testTeam.members).map((user) => user.id)];
  thisTeamIds = new RegExp(ids.join('|'));
});
afterAll(async () => { await sequelize.close(); });

function expectErrorShape(body: unknown, code: string) {
  expect(body).toMatchObject({ error: { code, message: expect.any(String) } });
}

describe('every route handler', () => {
  const routes = listRouteFiles();

  it('finds the route handlers', () => {
    expect(routes.map((route) => route.urlPath)).toEqual(expect.arrayContaining(['/api/v1/health', '/api/v1/me', '/api/v1/projects', '/api/v1/sessions']));
  });

  for (const route of routes) {
    it(`${route.urlPath}: every method declares its access and honours the permission map`, async () => {
      const handlers = await loadHandlers(route);
      expect(Object.keys(handlers).length, `${route.file} exports no handler`).toBeGreaterThan(0);
      const params: Record<string, string> = {};
      for (const name of route.params) {
        expect(fixtureParams[name], `add a fixture value for [${name}] in ${__filename}`).toBeDefined();
        params[name] = fixtureParams[name];
      }
      const urlPath = route.urlPath.replace(/\[+\.*(\w+)\]+/g, (_, name: string) => params[name]);
      for (const [method, handler] of Object.entries(handlers) as [Method, NonNullable<(typeof handlers)[Method]>][]) {
        expect(handler.access, `${method} ${route.urlPath} must be listed in EXPECTED_ACCESS`).toBe(EXPECTED_ACCESS[`${method} ${route.urlPath}`]);
        const body = WRITE_METHODS.has(method) ? {} : undefined;
        if (handler.access === 'public') continue;

        const anonymous = await call(handler, method, urlPath, { body, params });
        expect(anonymous.status, `${method} ${urlPath} without a session`).toBe(401);
        expectErrorShape(anonymous.body, 'not_signed_in');

        // Another team's people, before this team's own calls may change anything.
        for (const role of ROLES) {
          const answer = await call(handler, method, urlPath, { body, params, cookie: await otherTeam.cookieFor(role) });
          const label = `${method} ${urlPath} as ${role} of another team`;
          expect(JSON.stringify(answer.body) ?? '', `${label} shows nothing of this team`).not.toMatch(thisTeamIds);
          const allowed = handler.access === 'signed-in' || can(role, handler.access as Action);
          if (!allowed) expect(answer.status, label).toBe(403);
          else if (route.params.length > 0 && !WRITE_METHODS.has(method)) expect(answer.status, `${label} is not found`).toBe(404);
          else if (route.params.length > 0) expect([400, 404], `${label} is refused (got ${answer.status})`).toContain(answer.status);
        }

        for (const role of ROLES) {
          const answer = await call(handler, method, urlPath, { body, params, cookie: await testTeam.cookieFor(role) });
          const allowed = handler.access === 'signed-in' || can(role, handler.access as Action);
          if (allowed) {
            expect([401, 403], `${method} ${urlPath} as ${role} should be allowed (got ${answer.status})`).not.toContain(answer.status);
          } else {
            expect(answer.status, `${method} ${urlPath} as ${role} should be refused`).toBe(403);
            expectErrorShape(answer.body, 'forbidden');
          }
        }
      }
    });
  }
});

describe('cross-site writes', () => {
  it('refuses a write whose Origin is another site', async () => {
    const { POST } = await import('@/app/api/v1/projects/route');
    const answer = await call(POST, 'POST', '/api/v1/projects', {
      cookie: await testTeam.cookieFor('acoustician'),
      body: { name: 'From elsewhere' },
      headers: { origin: 'https://elsewhere.example' },
    });
    expect(answer.status).toBe(403);
    expectErrorShape(answer.body, 'forbidden');
  });

  it('accepts the same write from its own origin', async () => {
    const { POST } = await import('@/app/api/v1/projects/route');
    const answer = await call(POST, 'POST', '/api/v1/projects', {
      cookie: await testTeam.cookieFor('acoustician'),
      body: { name: 'Same origin' },
      headers: { origin: publicOrigin() },
    });
    expect(answer.status).toBe(201);
  });
});
