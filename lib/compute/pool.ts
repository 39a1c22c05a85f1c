// The compute pool: engine work runs in worker threads (piscina), each job with a time limit and
// a heap limit, so no request can hold the server's own thread or memory. A job past a limit is
// stopped and the caller gets an error that says what to reduce.
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { Piscina } from 'piscina';
import { AppError } from '@/lib/errors';
import { PlanError } from '@/lib/plan/errors';
import { COMPUTE_HEAP_MB, COMPUTE_QUEUE, COMPUTE_THREADS, COMPUTE_TIME_LIMIT_MS } from './limits';
import type { ComputeTask, TaskOutcome } from './tasks';
import { threadCpuMs } from './thread-clock';
import type { ComputeMessage } from './worker';

/** Where scripts/build-worker.ts writes the bundled worker. */
export const WORKER_FILE = process.env.ANTINODE_COMPUTE_WORKER ?? path.join(process.cwd(), '.compute', 'worker.mjs');

const holder = globalThis as typeof globalThis & { antinodeComputePool?: Piscina; antinodeComputeSlots?: Slots };

/** Jobs hold a slot while they run, so a job's time limit counts its own running time, never its wait. */
interface Slots { running: number; waiting: (() => void)[] }

function slots(): Slots {
  holder.antinodeComputeSlots ??= { running: 0, waiting: [] };
  return holder.antinodeComputeSlots;
}

/** Longest a job waits for a free thread before the answer is "busy", ms. */
const MAX_WAIT_MS = 20_000;

function busy(): AppError {
  return new AppError('busy', 'The server is busy with other analyses; try again in a few seconds.', { retryAfterS: 5 });
}

async function acquireSlot(): Promise<void> {
  const state = slots();
  if (state.running < COMPUTE_THREADS) {
    state.running += 1;
    return;
  }
  if (state.waiting.length >= COMPUTE_QUEUE) throw busy();
  await new Promise<void>((resolve, reject) => {
    const take = () => { clearTimeout(timer); state.running += 1; resolve(); };
    const timer = setTimeout(() => { state.waiting.splice(state.waiting.indexOf(take), 1); reject(busy()); }, MAX_WAIT_MS);
    state.waiting.push(take);
  });
}

function releaseSlot(): void {
  const state = slots();
  state.running -= 1;
  state.waiting.shift()?.();
}

function pool(): Piscina {
  holder.antinodeComputePool ??= new Piscina({
    filename: pathToFileURL(WORKER_FILE).href,
    minThreads: 1,
    maxThreads: COMPUTE_THREADS,
    maxQueue: COMPUTE_QUEUE,
    idleTimeout: 60_000,
    resourceLimits: { maxOldGenerationSizeMb: COMPUTE_HEAP_MB, maxYoungGenerationSizeMb: 32 },
  });
  return holder.antinodeComputePool;
}

export interface ComputeOptions {
  /** What the person should make smaller when the job is stopped, e.g. "the run's length or its frequency range". */
  reduce: string;
  timeLimitMs?: number;
}

function rebuilt(outcome: Extract<TaskOutcome, { ok: false }>): Error {
  const { name, message, code, field } = outcome.error;
  if (name === 'AppError' && code) return new AppError(code, message, { field });
  if (name === 'PlanError') return new PlanError(message);
  if (name === 'RangeError') return new RangeError(message);
  return new Error(`A computation failed: ${message}`);
}

function isOutOfMemory(error: unknown): boolean {
  const code = (error as { code?: string } | null)?.code;
  return code === 'ERR_WORKER_OUT_OF_MEMORY' || /out of memory|heap limit/i.test(String((error as Error)?.message ?? ''));
}

/** How often the pool reads a running job's processor time, ms. */
const CLOCK_POLL_MS = 100;
/** A job still running after this many times its time limit on the wall clock is stopped as "busy": the machine, not the job, is the problem. */
const WALL_LIMIT_FACTOR = 10;

type Stop = 'time' | 'wall';

/**
 * Stops the job when its own thread has used more processor time than the limit (read from /proc,
 * so waiting behind other work does not count), or after the limit on the wall clock from when the
 * job started in its thread where the thread's time cannot be read. Time before the job starts in
 * its thread (a new thread loading) never counts; in any case the job is stopped after
 * WALL_LIMIT_FACTOR times the limit.
 */
function watchJob(clockCell: Int32Array, timeLimitMs: number, stop: (why: Stop) => void): () => void {
  const askedMs = performance.now();
  let startedMs: number | null = null;
  const timer = setInterval(() => {
    const nowMs = performance.now();
    if (nowMs - askedMs > timeLimitMs * WALL_LIMIT_FACTOR) return stop('wall');
    const threadId = Atomics.load(clockCell, 0);
    if (threadId === 0) return; // not started in its thread yet
    startedMs ??= nowMs;
    const cpuMs = threadId > 0 ? threadCpuMs(threadId) : null;
    const usedMs = cpuMs === null ? nowMs - startedMs : cpuMs - Atomics.load(clockCell, 1);
    if (usedMs > timeLimitMs) stop('time');
  }, CLOCK_POLL_MS);
  return () => clearInterval(timer);
}

/** Runs the task in the pool; its result, or the task's own error (RangeError, PlanError, AppError). */
export async function compute<T>(task: ComputeTask, options: ComputeOptions): Promise<T> {
  const timeLimitMs = options.timeLimitMs ?? COMPUTE_TIME_LIMIT_MS[task.kind];
  await acquireSlot();
  const controller = new AbortController();
  let stopped: Stop | null = null;
  const clockCell = new Int32Array(new SharedArrayBuffer(8));
  const unwatch = watchJob(clockCell, timeLimitMs, (why) => { stopped = why; controller.abort(); });
  let outcome: TaskOutcome;
  try {
    const message: ComputeMessage = { task, clockCell };
    outcome = (await pool().run(message, { signal: controller.signal })) as TaskOutcome;
  } catch (error) {
    if (stopped === 'wall') throw busy();
    if (stopped === 'time') {
      throw new AppError('too_much_work', `This needs more than the ${Math.round(timeLimitMs / 1000)} s one analysis may take, so it was stopped. Reduce ${options.reduce} and try again.`);
    }
    if (isOutOfMemory(error)) {
      throw new AppError('too_much_work', `This needs more than the ${COMPUTE_HEAP_MB} MB one analysis may use, so it was stopped. Reduce ${options.reduce} and try again.`);
    }
    if (/queue is at limit/i.test(String((error as Error)?.message))) throw busy();
    throw error;
  } finally {
    unwatch();
    releaseSlot();
  }
  if (!outcome.ok) throw rebuilt(outcome);
  return outcome.value as T;
}

/** Resolves once a thread is free and no job waits (background work waits for this, so asked-for work goes first). */
export async function whenIdle(pollMs = 50): Promise<void> {
  while (slots().waiting.length > 0 || slots().running >= COMPUTE_THREADS) await new Promise((resolve) => setTimeout(resolve, pollMs));
}

/** Jobs running and waiting now (for the health route). */
export function computeLoad(): { threads: number; queued: number } {
  const current = holder.antinodeComputePool;
  return { threads: current?.threads.length ?? 0, queued: slots().waiting.length };
}

/** Stops the pool's threads (tests and shutdown). */
export async function closeComputePool(): Promise<void> {
  const current = holder.antinodeComputePool;
  holder.antinodeComputePool = undefined;
  if (current) await current.destroy();
}
