// How long the account doors take to answer for an address that has an account and for one
// that has none, against a running production build (scripts/bench.sh starts one, behind a
// "proxy" at 127.0.0.1 so each request can come from its own client address and no per-address
// budget is met). A difference would tell an outsider which addresses have accounts; the aim is
// a median difference under 5 ms. Rounds alternate which goes first, with a pause after each
// request so the mail work done after the answer is not charged to the next one.
import { randomUUID } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { createUserWithTeam } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { median, percentile } from '../editor/stats';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://127.0.0.1:3200';
const ROUNDS = Number(process.env.ANTINODE_ACCOUNT_ROUNDS ?? 100);
const PAUSE_MS = 150;

let client = 0;
function nextClient(): string {
  client += 1;
  return `198.18.${Math.floor(client / 250) % 250}.${(client % 250) + 1}`;
}

async function timed(path: string, body: unknown): Promise<number> {
  const started = performance.now();
  const response = await fetch(`${BASE_URL}${path}`, {
    method: 'POST', headers: { 'content-type': 'application/json', 'x-forwarded-for': nextClient() }, body: JSON.stringify(body),
  });
  await response.arrayBuffer();
  const elapsedMs = performance.now() - started;
  if (response.status !== 202) throw new Error(`${path} answered ${response.status}`);
  await new Promise((resolve) => setTimeout(resolve, PAUSE_MS));
  return elapsedMs;
}

async function compare(label: string, path: string, bodyFor: (email: string) => unknown, knownEmail: string): Promise<void> {
  for (let warm = 0; warm < 5; warm += 1) await timed(path, bodyFor(`warm-${randomUUID()}@example.test`));
  const known: number[] = [];
  const unknown: number[] = [];
  const differences: number[] = [];
  for (let round = 0; round < ROUNDS; round += 1) {
    const unknownEmail = `nobody-${randomUUID()}@example.test`;
    let knownMs: number;
    let unknownMs: number;
    if (round % 2 === 0) {
      knownMs = await timed(path, bodyFor(knownEmail));
      unknownMs = await timed(path, bodyFor(unknownEmail));
    } else {
      unknownMs = await timed(path, bodyFor(unknownEmail));
      knownMs = await timed(path, bodyFor(knownEmail));
    }
    known.push(knownMs);
    unknown.push(unknownMs);
    differences.push(knownMs - unknownMs);
  }
  const ms = (value: number) => `${value.toFixed(2)} ms`;
  console.log(`  ${label} (${ROUNDS} rounds): known address median ${ms(median(known))} (p90 ${ms(percentile(known, 0.9))}), `
    + `unknown median ${ms(median(unknown))} (p90 ${ms(percentile(unknown, 0.9))}); median of the paired differences ${ms(median(differences))}`);
}

async function main(): Promise<void> {
  const email = `bench-account-${randomUUID().slice(0, 8)}@example.test`;
  await createUserWithTeam({ name: 'Bench Account', email, password: 'bench password 1234', teamName: 'Bench team' });
  await compare('password reset request', '/api/v1/password-resets', (to) => ({ email: to }), email);
  await compare('sign-up request', '/api/v1/sign-ups', (to) => ({ name: 'Bench Person', email: to, password: 'a long enough password', teamName: 'Bench practice' }), email);
  await sequelize.close();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
