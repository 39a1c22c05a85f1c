// PostgreSQL going down under a running web instance while a person edits: every request answers
// 503 with a message that says the database is away (the editor keeps its edit and saves again),
// and once PostgreSQL is back the instance serves again by itself, with no saved edit lost.
// Fast shutdown ends every session (PostgreSQL documentation, "Shutting Down the Server"); 503
// Service Unavailable for a temporary condition, with Retry-After (RFC 9110 §15.6.4, §10.2.3).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DATABASE_UNREACHABLE } from '@/lib/http/route';
import { freePort } from '../integration/helpers/throwaway-cluster';
import { seededInstallation, signInDemo, type Installation } from './helpers/installation';
import { startWeb, stopProcess, type Instance } from './helpers/instances';

let installation: Installation;
let web: Instance | undefined;
let planId: string;

beforeAll(async () => {
  installation = await seededInstallation('db-restart');
  planId = (await installation.query<{ id: string }>('select id from plans order by created_at limit 1'))[0]!.id;
  web = await startWeb('web-db-restart', await freePort(), installation.env);
}, 180_000);

afterAll(async () => {
  await stopProcess(web);
  installation?.cluster.remove();
});

interface PlanBody { plan: { version: number; document: { runs: { name: string }[] }; metresPerPixel: number } }

const call = (method: string, path: string, cookie: string, body?: unknown) => fetch(`${web!.url}${path}`, {
  method, headers: { cookie, ...(body === undefined ? {} : { 'content-type': 'application/json' }) }, body: body === undefined ? undefined : JSON.stringify(body),
});

const withRunName = (plan: PlanBody['plan'], version: number, name: string) => ({
  version, metresPerPixel: plan.metresPerPixel,
  document: { ...plan.document, runs: plan.document.runs.map((run, index) => (index === 0 ? { ...run, name } : run)) },
});

describe('PostgreSQL down and back under a running app', () => {
  it('answers 503 saying the database is away, recovers by itself, and loses no saved edit', async () => {
    const cookie = await signInDemo(web!.url, 'acoustician@antinode.test');
    const { plan } = (await (await call('GET', `/api/v1/plans/${planId}`, cookie)).json()) as PlanBody;
    const before = await call('PUT', `/api/v1/plans/${planId}/document`, cookie, withRunName(plan, plan.version, 'Saved before the outage'));
    expect(before.status).toBe(200);

    installation.cluster.pgCtl('stop');
    const whileDown = withRunName(plan, plan.version + 1, 'Edited during the outage');
    const refused = await call('PUT', `/api/v1/plans/${planId}/document`, cookie, whileDown);
    expect(refused.status).toBe(503);
    expect(refused.headers.get('retry-after')).toMatch(/^\d+$/);
    expect(await refused.json()).toEqual({ error: { code: 'busy', message: DATABASE_UNREACHABLE, retryAfterS: expect.any(Number) } });
    const reading = await call('GET', `/api/v1/plans/${planId}`, cookie);
    expect(reading.status).toBe(503);
    expect(((await reading.json()) as { error: { message: string } }).error.message).toBe(DATABASE_UNREACHABLE);
    expect((await fetch(`${web!.url}/api/v1/ready`)).status).toBe(503);

    installation.cluster.pgCtl('start');
    // the editor saves the same edit again; the instance was not restarted
    let saved: Response | undefined;
    for (let attempt = 0; attempt < 20 && saved?.status !== 200; attempt += 1) {
      saved = await call('PUT', `/api/v1/plans/${planId}/document`, cookie, whileDown);
      if (saved.status !== 200) await new Promise((resolve) => setTimeout(resolve, 500));
    }
    expect(saved?.status).toBe(200);
    const after = (await (await call('GET', `/api/v1/plans/${planId}`, cookie)).json()) as PlanBody;
    expect(after.plan.version).toBe(plan.version + 2);
    expect(after.plan.document.runs[0].name).toBe('Edited during the outage');
    expect((await fetch(`${web!.url}/api/v1/ready`)).status).toBe(200);
  }, 180_000);
});
