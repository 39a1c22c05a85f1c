// Request bodies are counted while they stream in and cut at the route's limit, whether or not
// the client sent Content-Length (RFC 9110 §15.5.14: 413 Content Too Large). A refused body is
// not read much past the limit, so a 30 MB chunked body costs the server no more than the limit.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as webhook } from '@/app/api/v1/billing/webhook/route';
import { POST as uploadBackground } from '@/app/api/v1/plans/[planId]/background/route';
import { POST as createProjectRoute } from '@/app/api/v1/projects/route';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { MAX_UPLOAD_BYTES } from '@/lib/uploads/data';
import { BillingEvent, Project, Upload } from '@/models';
import { createTestTeam, TEST_PASSWORD, type TestTeam } from '../helpers/people';
import { chunkedBody, endlessBody, streamedRequest } from '../helpers/streams';
import { signedDelivery, subscriptionEvent } from '../helpers/webhooks';

const THIRTY_MB = 30 * 1024 * 1024;
const SIGN_IN_LIMIT = 4096; // app/api/v1/sessions/route.ts
const DEFAULT_LIMIT = 256 * 1024; // lib/http/route.ts, the webhook's limit

let team: TestTeam;
let planId: string;
beforeAll(async () => {
  team = await createTestTeam('bodies');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Bodies project', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Bodies plan')).id;
});
afterAll(async () => { await sequelize.close(); });

async function answerOf(response: Response): Promise<{ status: number; body: { error?: { code: string; message: string; field?: string } } }> {
  return { status: response.status, body: await response.json() };
}

describe('bodies over the limit, sent chunked with no Content-Length', () => {
  it('the public sign-in route refuses 30 MB after reading about its 4 KB', async () => {
    const chunkBytes = 1024;
    const sent = endlessBody(THIRTY_MB, chunkBytes);
    const request = streamedRequest('http://localhost/api/v1/sessions', sent.body, { 'content-type': 'application/json' });
    expect(request.headers.get('content-length')).toBeNull();
    const answer = await answerOf(await signInRoute(request, { params: Promise.resolve({}) }));
    expect(answer.status).toBe(413);
    expect(answer.body.error).toMatchObject({ code: 'too_large', message: 'The request body is over 4 KB.' });
    expect(sent.pulled()).toBeGreaterThan(SIGN_IN_LIMIT);
    expect(sent.pulled()).toBeLessThanOrEqual(SIGN_IN_LIMIT + 2 * chunkBytes);
  });

  it('the payment webhook refuses 30 MB after reading about its 256 KB, and records nothing', async () => {
    const chunkBytes = 16 * 1024;
    const before = await BillingEvent.count();
    const sent = endlessBody(THIRTY_MB, chunkBytes);
    const request = streamedRequest('http://localhost/api/v1/billing/webhook', sent.body, { 'content-type': 'application/json', 'stripe-signature': 't=1,v1=0' });
    const answer = await answerOf(await webhook(request, { params: Promise.resolve({}) }));
    expect(answer.status).toBe(413);
    expect(answer.body.error?.code).toBe('too_large');
    expect(sent.pulled()).toBeLessThanOrEqual(DEFAULT_LIMIT + 2 * chunkBytes);
    expect(await BillingEvent.count()).toBe(before);
  });

  it('a plan drawing upload refuses a body past 20 MB (plus the form framing) with the file named', async () => {
    const chunkBytes = 256 * 1024;
    const sent = endlessBody(THIRTY_MB, chunkBytes, 0x41);
    const before = await Upload.count({ where: { teamId: team.team.id } });
    const request = streamedRequest(`http://localhost/api/v1/plans/${planId}/background`, sent.body, {
      cookie: await team.cookieFor('acoustician'), 'content-type': 'multipart/form-data; boundary=edge',
    });
    const answer = await answerOf(await uploadBackground(request, { params: Promise.resolve({ planId }) }));
    expect(answer.status).toBe(413);
    expect(answer.body.error).toMatchObject({ code: 'too_large', field: 'file' });
    expect(sent.pulled()).toBeLessThanOrEqual(MAX_UPLOAD_BYTES + 64 * 1024 + 2 * chunkBytes);
    expect(await Upload.count({ where: { teamId: team.team.id } })).toBe(before);
  });

  it('a declared Content-Length over the limit is refused before any of the body is read', async () => {
    const sent = endlessBody(THIRTY_MB, 1024);
    const request = streamedRequest('http://localhost/api/v1/sessions', sent.body, { 'content-type': 'application/json', 'content-length': String(THIRTY_MB) });
    const answer = await answerOf(await signInRoute(request, { params: Promise.resolve({}) }));
    expect(answer.status).toBe(413);
    expect(sent.pulled()).toBe(0);
  });
});

describe('bodies within the limit, sent chunked with no Content-Length', () => {
  it('sign in as usual', async () => {
    const json = JSON.stringify({ email: team.members.viewer.email, password: TEST_PASSWORD });
    const sent = chunkedBody(new TextEncoder().encode(json), 7);
    const response = await signInRoute(streamedRequest('http://localhost/api/v1/sessions', sent.body, { 'content-type': 'application/json' }), { params: Promise.resolve({}) });
    expect(response.status).toBe(201);
    expect(response.headers.get('set-cookie')).toMatch(/^antinode_session=/);
  });

  it('a signed webhook delivery is verified over exactly the bytes received', async () => {
    const { payload, signature } = signedDelivery(subscriptionEvent('customer.subscription.updated', 'cus_bodies_unknown', 2));
    const sent = chunkedBody(new TextEncoder().encode(payload), 100);
    const response = await webhook(streamedRequest('http://localhost/api/v1/billing/webhook', sent.body, { 'content-type': 'application/json', 'stripe-signature': signature }), { params: Promise.resolve({}) });
    expect(response.status).toBe(200);
  });
});

describe('bodies that are not text', () => {
  it('a JSON body that is not valid UTF-8 is a 400, and nothing is created', async () => {
    const before = await Project.count({ where: { teamId: team.team.id } });
    // 0xC3 0x28 is an invalid two-byte sequence (Unicode Standard, Table 3-7: well-formed UTF-8).
    const bytes = new Uint8Array([...new TextEncoder().encode('{"name":"Recital '), 0xc3, 0x28, ...new TextEncoder().encode('"}')]);
    const request = streamedRequest('http://localhost/api/v1/projects', chunkedBody(bytes, 5).body, { cookie: await team.cookieFor('acoustician'), 'content-type': 'application/json' });
    const answer = await answerOf(await createProjectRoute(request, { params: Promise.resolve({}) }));
    expect(answer.status).toBe(400);
    expect(answer.body.error?.message).toBe('The request body is not valid UTF-8 text.');
    expect(await Project.count({ where: { teamId: team.team.id } })).toBe(before);
  });
});
