// Real app processes for the tests under tests/processes: web instances (scripts/serve.mjs on the
// test build, .next-test) and job workers (.compute/jobs-worker.mjs), each with its output in
// .data/processes-<name>.log. They share the test's database, file store and mail fake.
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, existsSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../../..');
const DIST_DIR = process.env.ANTINODE_DIST_DIR ?? '.next-test';

/** The public address every instance is told it is served at (behind one load balancer). */
export const PUBLIC_URL = 'http://antinode.test';

export interface Instance { name: string; child: ChildProcess; url: string; output: () => string }

function launch(name: string, args: string[], env: Record<string, string>): Instance & { url: '' } {
  const log = createWriteStream(path.join(ROOT, '.data', `processes-${name}.log`));
  let output = '';
  const child = spawn(process.execPath, args, {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: 'production', ANTINODE_DIST_DIR: DIST_DIR, ANTINODE_BASE_URL: PUBLIC_URL, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  for (const stream of [child.stdout!, child.stderr!]) {
    stream.on('data', (chunk: Buffer) => { output += chunk.toString(); log.write(chunk); });
  }
  child.on('exit', () => log.end());
  return { name, child, url: '', output: () => output };
}

async function until(what: string, check: () => Promise<boolean> | boolean, timeoutMs: number, child: ChildProcess, output: () => string): Promise<void> {
  const started = Date.now();
  while (!(await check())) {
    if (child.exitCode !== null) throw new Error(`${what}: the process exited (${child.exitCode}). Its output:\n${output().slice(-3000)}`);
    if (Date.now() - started > timeoutMs) throw new Error(`${what}: not within ${timeoutMs / 1000} s. Output:\n${output().slice(-3000)}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** A web instance on 127.0.0.1:`port`, answering its health check. */
export async function startWeb(name: string, port: number, env: Record<string, string> = {}): Promise<Instance> {
  if (!existsSync(path.join(ROOT, DIST_DIR, 'BUILD_ID'))) {
    throw new Error(`No build in ${DIST_DIR}: npm test builds it before these tests (or run scripts/lib.sh build_app with ANTINODE_DIST_DIR=${DIST_DIR}).`);
  }
  const instance = launch(name, ['scripts/serve.mjs', '--port', String(port), '--host', '127.0.0.1'], env);
  const url = `http://127.0.0.1:${port}`;
  await until(`web instance ${name} starting`, async () => {
    try { return (await fetch(`${url}/api/v1/health`)).ok; } catch { return false; }
  }, 60_000, instance.child, instance.output);
  return { ...instance, url };
}

/** A job worker, ready once it says so. */
export async function startWorker(name: string, env: Record<string, string> = {}): Promise<Instance> {
  const instance = launch(name, ['.compute/jobs-worker.mjs'], { ANTINODE_COMPUTE_THREADS: '1', ...env });
  await until(`job worker ${name} starting`, () => instance.output().includes('job worker ready'), 60_000, instance.child, instance.output);
  return instance;
}

/** Sends the signal and waits for the process to end. */
export async function stopProcess(instance: Instance | undefined, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  const child = instance?.child;
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const ended = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  child.kill(signal);
  await ended;
}
