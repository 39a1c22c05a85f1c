// Two web instances and one job worker against one database, as behind a load balancer: nothing
// that matters lives in one process (sessions, plan versions, rate limits, jobs and files are in
// PostgreSQL and the store), so a person may be served by either instance from one request to the
// next. Stateless web tier behind a load balancer, jobs on a shared queue: common practice, no
// source. Optimistic concurrency (a save names the version it was based on; HTTP 409 Conflict
// for a stale one): RFC 9110 §15.5.10.
import { createHash, randomInt } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { createProject } from '@/lib/projects/data';
import { PlanActivity, Schedule } from '@/models';
import { mailsTo } from '../integration/helpers/inbox';
import { createTestTeam, TEST_PASSWORD, uniqueEmail, type TestTeam } from '../integration/helpers/people';
import { recitalPlan, submitted } from '../integration/helpers/revisions';
import { freePort } from '../integration/helpers/throwaway-cluster';
import { startWeb, startWorker, stopProcess, type Instance } from './helpers/instances';
import { until } from '../integration/helpers/until';

let t: TestTeam;
let planId: string;
let revisionId: string;
let first: Instance;
let second: Instance;
let worker: Instance | undefined;

// The instances believe X-Forwarded-For from loopback, as behind a proxy: each test is its own client.
const TRUSTED = { ANTINODE_TRUSTED_PROXIES: '127.0.0.1' };
const client = () => ({ 'x-forwarded-for': `203.0.113.${randomInt(1, 255)}, 198.51.100.${randomInt(1, 255)}` });

beforeAll(async () => {
  t = await createTestTeam('scale');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Two instances', site: '' });
  planId = await recitalPlan(t, project.id, 'Shared plan');
  revisionId = (await submitted(t, planId)).id;
  [first, second] = await Promise.all([startWeb('web-1', await freePort(), TRUSTED), startWeb('web-2', await freePort(), TRUSTED)]);
  worker = await startWorker('worker-1');
}, 180_000);

afterAll(async () => {
  await Promise.all([stopProcess(first), stopProcess(second), stopProcess(worker)]);
  await sequelize.close();
});

async function send(instance: Instance, method: string, path: string, options: { cookie?: string; body?: unknown; headers?: Record<string, string> } = {}) {
  const response = await fetch(`${instance.url}${path}`, {
    method,
    headers: { ...(options.body === undefined ? {} : { 'content-type': 'application/json' }), ...(options.cookie ? { cookie: options.cookie } : {}), ...options.headers },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
  });
  return response;
}

async function signInOn(instance: Instance, email: string): Promise<string> {
  const response = await send(instance, 'POST', '/api/v1/sessions', { body: { email, password: TEST_PASSWORD }, headers: client() });
  expect(response.status).toBe(201);
  return response.headers.getSetCookie().map((cookie) => cookie.split(';')[0]).join('; ');
}

interface PlanBody { plan: { version: number; document: { runs: { name: string }[] }; metresPerPixel: number } }

const renamedFirstRun = (plan: PlanBody['plan'], name: string) => ({
  version: plan.version, metresPerPixel: plan.metresPerPixel,
  document: { ...plan.document, runs: plan.document.runs.map((run, index) => (index === 0 ? { ...run, name } : run)) },
});

describe('two web instances and a job worker on one database', () => {
  it('a person signs in on one instance and keeps working on the other', async () => {
    const cookie = await signInOn(first, t.members.acoustician.email);
    const read = await send(second, 'GET', `/api/v1/plans/${planId}`, { cookie });
    expect(read.status).toBe(200);
    const { plan } = (await read.json()) as PlanBody;
    const saved = await send(second, 'PUT', `/api/v1/plans/${planId}/document`, { cookie, body: renamedFirstRun(plan, 'Supply saved on the second') });
    expect(saved.status).toBe(200);
    const back = (await (await send(first, 'GET', `/api/v1/plans/${planId}`, { cookie })).json()) as PlanBody;
    expect(back.plan.version).toBe(plan.version + 1);
    expect(back.plan.document.runs[0].name).toBe('Supply saved on the second');
  });

  it('two people saving the same version through different instances: one success, one conflict', async () => {
    const [mine, theirs] = await Promise.all([signInOn(first, t.members.acoustician.email), signInOn(second, t.members.admin.email)]);
    const { plan } = (await (await send(first, 'GET', `/api/v1/plans/${planId}`, { cookie: mine })).json()) as PlanBody;
    const answers = await Promise.all([
      send(first, 'PUT', `/api/v1/plans/${planId}/document`, { cookie: mine, body: renamedFirstRun(plan, 'Acoustician’s name') }),
      send(second, 'PUT', `/api/v1/plans/${planId}/document`, { cookie: theirs, body: renamedFirstRun(plan, 'Admin’s name') }),
    ]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([200, 409]);
    const winner = answers[0].status === 200 ? 'Acoustician’s name' : 'Admin’s name';
    const stored = (await (await send(second, 'GET', `/api/v1/plans/${planId}`, { cookie: theirs })).json()) as PlanBody;
    expect(stored.plan.version).toBe(plan.version + 1);
    expect(stored.plan.document.runs[0].name).toBe(winner);
  });

  it('a rate limit counts the requests of both instances together', async () => {
    // sign-ups: 10 an hour from one client address (lib/http/rate-limit-rules.ts)
    const headers = client();
    const form = (index: number) => ({ name: 'Rowan Tessaly', email: uniqueEmail(`both-${index}`), password: 'a long enough password', teamName: 'Tessaly Sound' });
    const statuses: number[] = [];
    for (let index = 0; index < 12; index += 1) {
      statuses.push((await send(index % 2 === 0 ? first : second, 'POST', '/api/v1/sign-ups', { body: form(index), headers })).status);
    }
    expect(statuses).toEqual([...Array<number>(10).fill(202), 429, 429]);
  });

  it('a schedule asked for on one instance is rendered once by the worker and downloads from the other with the same checksum', async () => {
    const cookie = await signInOn(first, t.members.acoustician.email);
    const asked = await send(first, 'POST', `/api/v1/revisions/${revisionId}/schedules`, { cookie });
    expect(asked.status).toBe(202);
    const { schedule } = (await asked.json()) as { schedule: { id: string; status: string } };
    const issued = await until('the schedule being issued', async () => {
      const { schedules } = (await (await send(second, 'GET', `/api/v1/revisions/${revisionId}/schedules`, { cookie })).json()) as { schedules: { id: string; status: string; sha256: string | null }[] };
      const found = schedules.find((row) => row.id === schedule.id);
      return found?.status === 'issued' ? found : null;
    }, 90_000);
    const download = await send(second, 'GET', `/api/v1/schedules/${schedule.id}`, { cookie });
    expect(download.status).toBe(200);
    const bytes = Buffer.from(await download.arrayBuffer());
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(issued.sha256);
    expect(download.headers.get('x-content-sha256')).toBe(issued.sha256);
    // done once: one job for it, completed, and one "issued" line in the plan's activity. The job is marked
    // completed just after its work commits the issued schedule, so the check waits for that mark (or a second job).
    const jobs = await until('the render job marked completed', async () => {
      const [rows] = (await sequelize.query(`select state from pgboss.job where name = 'render-schedule' and data->>'scheduleId' = $1`, { bind: [schedule.id] })) as [{ state: string }[], unknown];
      return rows.length > 1 || rows[0]?.state === 'completed' ? rows : null;
    }, 30_000);
    expect(jobs).toEqual([{ state: 'completed' }]);
    expect(await PlanActivity.count({ where: { teamId: t.team.id, planId, kind: 'schedule.issued' } })).toBe(1);
  });

  it('a worker killed mid-render leaves no half schedule, and the next worker finishes the job and sends a mail queued meanwhile', async () => {
    const cookie = await signInOn(first, t.members.acoustician.email);
    const asked = await send(first, 'POST', `/api/v1/revisions/${revisionId}/schedules`, { cookie });
    const { schedule } = (await asked.json()) as { schedule: { id: string } };
    const jobState = async () => {
      const [rows] = await sequelize.query(`select state from pgboss.job where name = 'render-schedule' and data->>'scheduleId' = $1`, { bind: [schedule.id] });
      return (rows as { state: string }[])[0]?.state;
    };
    await until('the worker taking the render', async () => (await jobState()) === 'active', 30_000);
    await new Promise((resolve) => setTimeout(resolve, 300)); // in the middle of the render
    await stopProcess(worker, 'SIGKILL');
    worker = undefined;

    const left = await Schedule.findByPk(schedule.id);
    expect(left).toMatchObject({ status: 'rendering', storageKey: null, sha256: null });
    const notYet = await send(second, 'GET', `/api/v1/schedules/${schedule.id}`, { cookie });
    expect(notYet.status).toBe(409);
    expect(((await notYet.json()) as { error: { message: string } }).error.message).toMatch(/render/i);

    // A mail asked for while no worker runs, on an instance that then stops: it waits in the queue.
    const resetFor = t.members.architect.email;
    expect((await send(first, 'POST', '/api/v1/password-resets', { body: { email: resetFor }, headers: client() })).status).toBe(202);
    await stopProcess(first);
    expect(await mailsTo(resetFor)).toEqual([]);

    worker = await startWorker('worker-2');
    // the lost job is handed back once it expires (180 s) at the next maintenance (every 15 s)
    const issued = await until('the schedule being issued by the new worker', async () => {
      const row = await Schedule.findByPk(schedule.id);
      return row?.status === 'issued' ? row : null;
    }, 270_000);
    const bytes = Buffer.from(await (await send(second, 'GET', `/api/v1/schedules/${schedule.id}`, { cookie })).arrayBuffer());
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(issued.sha256);
    const mails = await until('the reset mail', async () => { const found = await mailsTo(resetFor); return found.length > 0 ? found : null; }, 30_000);
    expect(mails.map((mail) => mail.subject)).toHaveLength(1);
  }, 360_000);
});
