// Load on loopback against a running production build (scripts/bench.sh starts one): GET results
// of a saved plan and POST analyze of a small run at concurrency 8 for a fixed time, while one
// oversized analysis after another is in flight, and the health route polled throughout. Reports
// requests/s, latency percentiles, answers by status, the oversized jobs' outcome, the health
// route's latency and the server's peak memory (its VmHWM, when its process id is given).
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { Membership, Plan, Project } from '@/models';
import { median, percentile } from '../editor/stats';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://localhost:3200';
const DURATION_S = Number(process.env.ANTINODE_LOAD_SECONDS ?? 15);
const CONNECTIONS = 8;
const HEALTH_EVERY_MS = 50;

/** A typical run: 12 segments with changing sections, closed to open. */
const SMALL_RUN = {
  segments: Array.from({ length: 12 }, (_, index) => ({ lengthM: 1.5 + (index % 3) * 0.4, section: { shape: 'round', diameterM: 0.2 + (index % 4) * 0.05 } })),
  start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' },
};

/** The largest run the limits allow, sections changing at every joint, over the widest band: work the time limit must stop. */
const OVERSIZED_RUN = {
  segments: Array.from({ length: 2000 }, (_, index) => ({ lengthM: 0.25, section: { shape: 'round', diameterM: 0.1 + (index % 7) * 0.01 } })),
  start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxHz: 600,
};

const line = (label: string, value: string) => console.log(`  ${label.padEnd(48)} ${value}`);

function peakMemoryMb(pid: string | undefined): number | null {
  if (!pid) return null;
  try {
    const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) / 1024 : null;
  } catch {
    return null;
  }
}

async function main(): Promise<void> {
  const stamp = Date.now().toString(36);
  const { user, team } = await createUserWithTeam({ name: 'Load acoustician', email: `load-${stamp}@example.test`, password: 'load password 1234', teamName: 'Load' });
  await Membership.update({ role: 'acoustician' }, { where: { userId: user.id, teamId: team.id } });
  const project = await Project.create({ teamId: team.id, name: 'Load project', site: '', createdById: user.id });
  const plan = await Plan.create({ projectId: project.id, name: 'Load plan', document: demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }), metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
  const cookie = await startSession(user.id, team.id);
  const headers = { cookie: `${cookie.name}=${cookie.value}`, 'content-type': 'application/json' };
  const warm = await fetch(`${BASE_URL}/api/v1/plans/${plan.id}/results`, { headers });
  if (!warm.ok) throw new Error(`results answered ${warm.status}: ${await warm.text()}`);

  let running = true;
  const health: number[] = [];
  const healthErrors: number[] = [];
  const pollHealth = (async () => {
    while (running) {
      const started = performance.now();
      const answer = await fetch(`${BASE_URL}/api/v1/health`).catch(() => null);
      health.push(performance.now() - started);
      if (!answer?.ok) healthErrors.push(answer?.status ?? 0);
      await new Promise((resolve) => setTimeout(resolve, HEALTH_EVERY_MS));
    }
  })();
  const oversized: { status: number; ms: number; message: string }[] = [];
  const sendOversized = (async () => {
    while (running) {
      const started = performance.now();
      const answer = await fetch(`${BASE_URL}/api/v1/analyze`, { method: 'POST', headers, body: JSON.stringify(OVERSIZED_RUN) });
      const body = (await answer.json().catch(() => ({}))) as { error?: { message?: string } };
      oversized.push({ status: answer.status, ms: performance.now() - started, message: body.error?.message ?? '' });
    }
  })();

  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  let finished: (result: autocannon.Result) => void = () => undefined;
  const done = new Promise<autocannon.Result>((resolve) => { finished = resolve; });
  const instance = autocannon({
    url: BASE_URL, connections: CONNECTIONS, duration: DURATION_S, headers,
    requests: [
      { method: 'GET', path: `/api/v1/plans/${plan.id}/results` },
      { method: 'POST', path: '/api/v1/analyze', body: JSON.stringify(SMALL_RUN) },
    ],
  }, (error, result) => { if (error) throw error; finished(result); });
  instance.on('response', (_client: unknown, statusCode: number, _bytes: number, responseTimeMs: number) => {
    latencies.push(responseTimeMs);
    statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
  });
  const result = await done;
  running = false;
  await Promise.all([pollHealth, sendOversized]);

  console.log(`\nload: GET results + POST analyze, ${CONNECTIONS} connections for ${DURATION_S} s, an oversized analysis always in flight`);
  line('requests per second (mean)', result.requests.average.toFixed(1));
  line('latency p50 / p95 / p99', `${median(latencies).toFixed(1)} / ${percentile(latencies, 0.95).toFixed(1)} / ${percentile(latencies, 0.99).toFixed(1)} ms`);
  line('answers by status', [...statuses.entries()].sort(([a], [b]) => a - b).map(([status, count]) => `${status}: ${count}`).join(', '));
  line('errors (connection)', String(result.errors + result.timeouts));
  line('health checks, p50 / p95 / max', `${median(health).toFixed(1)} / ${percentile(health, 0.95).toFixed(1)} / ${Math.max(...health).toFixed(1)} ms (${health.length} checks, ${healthErrors.length} not ok)`);
  const outcomes = new Map<number, number>();
  for (const job of oversized) outcomes.set(job.status, (outcomes.get(job.status) ?? 0) + 1);
  line('oversized analyses, answers by status', [...outcomes.entries()].map(([status, count]) => `${status}: ${count}`).join(', '));
  if (oversized[0]) line('oversized analysis, first answer', `${oversized[0].status} after ${(oversized[0].ms / 1000).toFixed(1)} s: ${oversized[0].message.slice(0, 90)}`);
  const peak = peakMemoryMb(process.env.ANTINODE_BENCH_SERVER_PID);
  if (peak !== null) line('server peak memory (VmHWM)', `${peak.toFixed(0)} MB`);
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => { console.error(error); await sequelize.close(); process.exit(1); });
