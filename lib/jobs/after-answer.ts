// Work that runs after the answer has gone out: mails whose sending (or whose not being sent)
// must not show in how long a request takes, e.g. a reset link for an address that has an
// account and nothing for one that has none. Jobs run one at a time in this process; a job's
// failure is logged and never reaches the person. A job still waiting when the server stops is
// lost: the person asks again (the answer told them a mail may take a moment).
type Job = { label: string; work: () => Promise<void> };

interface Queue { jobs: Job[]; running: boolean; paused: boolean; idle: (() => void)[] }

const holder = globalThis as typeof globalThis & { antinodeAfterAnswer?: Queue };

function queue(): Queue {
  holder.antinodeAfterAnswer ??= { jobs: [], running: false, paused: false, idle: [] };
  return holder.antinodeAfterAnswer;
}

function settleIdle(state: Queue): void {
  if (state.jobs.length > 0 || state.running) return;
  for (const resolve of state.idle.splice(0)) resolve();
}

function runNext(): void {
  const state = queue();
  if (state.running || state.paused) return;
  const job = state.jobs.shift();
  if (!job) { settleIdle(state); return; }
  state.running = true;
  job.work()
    .catch((error: unknown) => console.error(`[after answer] ${job.label} failed`, error))
    .finally(() => {
      state.running = false;
      setImmediate(runNext);
    });
}

/** Runs `work` after the current request has answered (never before this call returns). */
export function afterAnswer(label: string, work: () => Promise<void>): void {
  queue().jobs.push({ label, work });
  setImmediate(runNext);
}

/** Jobs waiting or running. */
export function jobsAfterAnswer(): number {
  const state = queue();
  return state.jobs.length + (state.running ? 1 : 0);
}

/** Resolves once every job has run (tests, and a server stopping in good order). */
export function allAnswered(): Promise<void> {
  const state = queue();
  if (state.jobs.length === 0 && !state.running) return Promise.resolve();
  if (state.paused) throw new Error('The after-answer queue is paused: resume it before waiting for it.');
  return new Promise((resolve) => state.idle.push(resolve));
}

/** Holds the queue (tests: to show that an answer came before its mail), or lets it run again. */
export function pauseAfterAnswer(paused: boolean): void {
  queue().paused = paused;
  if (!paused) setImmediate(runNext);
}
