// Background jobs against a running production build and one job worker (scripts/bench.sh starts
// both): how long from "Issue schedule" to the downloaded PDF for a 20-run plan, how many schedule
// requests a minute one worker sustains, and the web instance's p95 for GET results idle and
// while the worker renders (aim: not worse than 1.5× idle). The machine's load is printed beside
// the figures, since other work on it falls on them.
import os from 'node:os';
import autocannon from 'autocannon';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { Membership, Plan, Project } from '@/models';
import { median, percentile } from '../editor/stats';
import { benchDocument } from '../schedule/plan';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://127.0.0.1:3200';
const RUNS = 20;
const SINGLE_ROUNDS = 3;
const BATCH = Number(process.env.ANTINODE_BENCH_SCHEDULES ?? 8);
const IDLE_S = 10;
const CONNECTIONS = 4;

const line = (label: string, value: string) => console.log(`  ${label.padEnd(52)} ${value}`);
const load = () => os.loadavg().map((value) => value.toFixed(2)).join(' / ');

interface Summary { id: string; status: string; failure: string | null }

async function main(): Promise<void> {
  const stamp = Date.now().toString(36);
  const { user, team } = await createUserWithTeam({ name: 'Jobs bench acoustician', email: `jobs-${stamp}@example.test`, password: 'jobs bench password 1', teamName: 'Jobs bench' });
  await Membership.update({ role: 'acoustician' }, { where: { userId: user.id, teamId: team.id } });
  const project = await Project.create({ teamId: team.id, name: 'Jobs bench project', site: '', createdById: user.id });
  const scheduled = await Plan.create({ projectId: project.id, name: `${RUNS}-run plan`, document: benchDocument(RUNS, 4), metresPerPixel: 0.005, updatedById: user.id });
  const read = await Plan.create({ projectId: project.id, name: 'Results plan', document: demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }), metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
  const cookie = await startSession(user.id, team.id);
  const headers = { cookie: `${cookie.name}=${cookie.value}`, 'content-type': 'application/json' };
  const call = async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    const answer = await fetch(`${BASE_URL}${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    if (!answer.ok) throw new Error(`${method} ${path} answered ${answer.status}: ${await answer.text()}`);
    return answer.headers.get('content-type')?.includes('json') ? ((await answer.json()) as T) : (Buffer.from(await answer.arrayBuffer()) as T);
  };
  const { revision } = await call<{ revision: { id: string } }>('POST', `/api/v1/plans/${scheduled.id}/revisions`, { note: 'Bench' });
  await call('GET', `/api/v1/plans/${read.id}/results`); // stored once, as after any save

  const schedules = async () => (await call<{ schedules: Summary[] }>('GET', `/api/v1/revisions/${revision.id}/schedules`)).schedules;
  const ask = async () => (await call<{ schedule: Summary }>('POST', `/api/v1/revisions/${revision.id}/schedules`)).schedule.id;
  const waitIssued = async (ids: string[]) => {
    for (;;) {
      const rows = (await schedules()).filter((row) => ids.includes(row.id));
      const failed = rows.find((row) => row.status === 'failed');
      if (failed) throw new Error(`schedule ${failed.id} failed: ${failed.failure}`);
      if (rows.length === ids.length && rows.every((row) => row.status === 'issued')) return;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  };

  // GET results under steady load, for `seconds` or until `until` resolves: latencies, ms.
  const resultsLoad = async (seconds: number, until?: Promise<unknown>) => {
    const latencies: number[] = [];
    let finished: () => void = () => undefined;
    const done = new Promise<void>((resolve) => { finished = resolve; });
    const instance = autocannon({ url: BASE_URL, connections: CONNECTIONS, duration: seconds, headers, requests: [{ method: 'GET', path: `/api/v1/plans/${read.id}/results` }] }, (error) => { if (error) throw error; finished(); });
    instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => { latencies.push(ms); });
    if (until) void until.then(() => instance.stop());
    await done;
    return latencies;
  };

  console.log(`\nbackground jobs: one worker, ${os.cpus().length} cores; load average (1/5/15 min) at start ${load()}`);
  const issueToDownload: number[] = [];
  for (let round = 0; round < SINGLE_ROUNDS; round += 1) {
    const started = performance.now();
    const id = await ask();
    await waitIssued([id]);
    const pdf = await call<Buffer>('GET', `/api/v1/schedules/${id}`);
    if (pdf.subarray(0, 5).toString('latin1') !== '%PDF-') throw new Error('the download is not a PDF');
    issueToDownload.push(performance.now() - started);
  }
  line(`"Issue schedule" to downloaded PDF, ${RUNS}-run plan`, `median ${(median(issueToDownload) / 1000).toFixed(2)} s (${issueToDownload.map((ms) => (ms / 1000).toFixed(2)).join(', ')} s; the first includes the worker's warm-up)`);

  const idle = await resultsLoad(IDLE_S);
  const batchStarted = performance.now();
  const ids = await Promise.all(Array.from({ length: BATCH }, () => ask()));
  const batchDone = waitIssued(ids);
  const busy = await resultsLoad(600, batchDone);
  await batchDone;
  const batchS = (performance.now() - batchStarted) / 1000;
  line(`schedule requests one worker sustains (${BATCH} asked at once)`, `${((BATCH / batchS) * 60).toFixed(1)} a minute (${batchS.toFixed(1)} s for ${BATCH})`);
  const idleP95 = percentile(idle, 0.95);
  const busyP95 = percentile(busy, 0.95);
  line(`GET results p95, ${CONNECTIONS} connections: idle / while rendering`, `${idleP95.toFixed(1)} / ${busyP95.toFixed(1)} ms (×${(busyP95 / idleP95).toFixed(2)}; aim: at most ×1.5)`);
  line('GET results requests: idle / while rendering', `${idle.length} in ${IDLE_S} s / ${busy.length} in ${batchS.toFixed(1)} s`);
  line('load average (1/5/15 min) at the end', load());
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => { console.error(error); await sequelize.close(); process.exit(1); });
