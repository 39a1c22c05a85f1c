// The analysis answer's size and speed: POST /api/v1/analyze with the 100-segment run
// (hundred-segment-run.ts) at concurrency 8 for a fixed time, with the default answer and with
// include=envelopes, against a running production build (scripts/bench.sh starts one), next to a bare
// Node HTTP handler doing the same parse, engine run, envelope choice, rounding and serialisation on one
// thread (bare-analyze-server.ts). Each target's time is taken in alternating rounds, so that the
// machine's other load falls on all of them alike. Reports each answer's size (plain and gzipped),
// requests/s and latency percentiles, and the route's time per request against the bare handler's.
import { spawn } from 'node:child_process';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { Membership } from '@/models';
import { median, percentile } from '../editor/stats';
import { hundredSegmentRun } from './hundred-segment-run';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://127.0.0.1:3200';
const BARE_PORT = Number(process.env.ANTINODE_BENCH_BARE_PORT ?? 3201);
const DURATION_S = Number(process.env.ANTINODE_LOAD_SECONDS ?? 15);
const CONNECTIONS = 8;
const WARM_UP_REQUESTS = 16;
/** Each target's DURATION_S is split into this many rounds, taken in turn. */
const ROUNDS = 3;

interface Target { label: string; url: string; headers: Record<string, string> }
interface Tally { target: Target; bytes: number; gzipBytes: number; resonances: number; envelopes: number; latencies: number[]; answered: number; failed: number }
interface Figures { label: string; bytes: number; gzipBytes: number; resonances: number; envelopes: number; perSecond: number; p50: number; p95: number; failed: number }

const body = JSON.stringify(hundredSegmentRun());

async function bareServer(): Promise<{ stop: () => void }> {
  const child = spawn(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'bench/load/bare-analyze-server.ts', String(BARE_PORT)], { stdio: ['ignore', 'pipe', 'inherit'] });
  await new Promise<void>((resolve, reject) => {
    child.stdout.on('data', (chunk: Buffer) => { if (chunk.toString().includes('listening')) resolve(); });
    child.on('exit', (code) => reject(new Error(`the bare handler exited (${code}) before listening`)));
  });
  return { stop: () => child.kill() };
}

/** The first answer (its size and content), then a warm-up, so that every thread has compiled the engine. */
async function prepare(target: Target): Promise<Tally> {
  const first = await fetch(target.url, { method: 'POST', headers: target.headers, body });
  const text = await first.text();
  if (!first.ok) throw new Error(`${target.label} answered ${first.status}: ${text.slice(0, 300)}`);
  const answer = JSON.parse(text) as { resonances: { pressureEnvelope?: unknown[] }[] };
  for (let round = 0; round < WARM_UP_REQUESTS / CONNECTIONS; round++) {
    await Promise.all(Array.from({ length: CONNECTIONS }, () => fetch(target.url, { method: 'POST', headers: target.headers, body }).then((response) => response.arrayBuffer())));
  }
  return {
    target, bytes: Buffer.byteLength(text), gzipBytes: gzipSync(text).length, resonances: answer.resonances.length,
    envelopes: answer.resonances.filter((resonance) => resonance.pressureEnvelope).length, latencies: [], answered: 0, failed: 0,
  };
}

/** One round of load on one target, added to its tally. */
async function load(tally: Tally, seconds: number): Promise<void> {
  const { url, headers } = tally.target;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url, method: 'POST', headers, body, connections: CONNECTIONS, duration: seconds }, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on('response', (_client: unknown, statusCode: number, _bytes: number, responseTimeMs: number) => {
      tally.latencies.push(responseTimeMs);
      if (statusCode === 200) tally.answered += 1;
      else tally.failed += 1;
    });
  });
  tally.failed += result.errors + result.timeouts;
}

function figures(tally: Tally): Figures {
  return {
    label: tally.target.label, bytes: tally.bytes, gzipBytes: tally.gzipBytes, resonances: tally.resonances, envelopes: tally.envelopes,
    perSecond: tally.answered / DURATION_S, p50: median(tally.latencies), p95: percentile(tally.latencies, 0.95), failed: tally.failed,
  };
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

async function main(): Promise<void> {
  const stamp = Date.now().toString(36);
  const { user, team } = await createUserWithTeam({ name: 'Answer engineer', email: `answers-${stamp}@example.test`, password: 'answers password 1234', teamName: 'Answers' });
  await Membership.update({ role: 'engineer' }, { where: { userId: user.id, teamId: team.id } });
  const cookie = await startSession(user.id, team.id);
  const signedIn = { cookie: `${cookie.name}=${cookie.value}`, 'content-type': 'application/json' };
  const bare = await bareServer();
  const bareUrl = `http://127.0.0.1:${BARE_PORT}/`;
  const targets: Target[] = [
    { label: 'route, default answer', url: `${BASE_URL}/api/v1/analyze`, headers: signedIn },
    { label: 'bare handler, default answer', url: bareUrl, headers: { 'content-type': 'application/json' } },
    { label: 'route, include=envelopes', url: `${BASE_URL}/api/v1/analyze?include=envelopes`, headers: signedIn },
    { label: 'bare handler, include=envelopes', url: `${bareUrl}?include=envelopes`, headers: { 'content-type': 'application/json' } },
  ];
  let rows: Figures[];
  try {
    const tallies: Tally[] = [];
    for (const target of targets) tallies.push(await prepare(target));
    // Each target's time in alternating rounds, so that the machine's other load falls on all of them alike.
    for (let round = 0; round < ROUNDS; round++) for (const tally of tallies) await load(tally, DURATION_S / ROUNDS);
    rows = tallies.map(figures);
  } finally {
    bare.stop();
  }
  console.log(`\nanalysis answers: POST /api/v1/analyze, 100-segment run, ${CONNECTIONS} connections for ${DURATION_S} s each (${ROUNDS} alternating rounds)`);
  console.log(`  ${'answer'.padEnd(34)} ${'size'.padStart(10)} ${'gzipped'.padStart(10)} ${'envelopes'.padStart(10)} ${'req/s'.padStart(7)} ${'p50 ms'.padStart(8)} ${'p95 ms'.padStart(8)} ${'failed'.padStart(7)}`);
  for (const row of rows) {
    console.log(`  ${row.label.padEnd(34)} ${kb(row.bytes).padStart(10)} ${kb(row.gzipBytes).padStart(10)} ${`${row.envelopes}/${row.resonances}`.padStart(10)} ${row.perSecond.toFixed(1).padStart(7)} ${row.p50.toFixed(0).padStart(8)} ${row.p95.toFixed(0).padStart(8)} ${String(row.failed).padStart(7)}`);
  }
  const ratio = (route: Figures, bareFigures: Figures) => (bareFigures.perSecond / route.perSecond).toFixed(2);
  console.log(`  route's time per request against the bare handler's: default ${ratio(rows[0], rows[1])}×, include=envelopes ${ratio(rows[2], rows[3])}×`);
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => { console.error(error); await sequelize.close(); process.exit(1); });
