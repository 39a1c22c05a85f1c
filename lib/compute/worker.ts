// The entry of each worker thread in the compute pool (bundled by scripts/build-worker.ts).
import { COMPUTE_NICE } from './limits';
import { lowerPriority } from './priority';
import { runComputeTask, type ComputeTask, type TaskOutcome } from './tasks';
import { CLOCK_UNKNOWN, currentThreadId, threadCpuMs } from './thread-clock';

// On Linux each thread has its own nice value: the compute threads yield the processor to the
// server's own thread (requests, health checks) and to the database whenever both want it.
lowerPriority(COMPUTE_NICE);

const THREAD_ID = currentThreadId();

/** A job as the pool sends it: the task, and a shared cell where the thread says who runs it. */
export interface ComputeMessage {
  task: ComputeTask;
  /** [thread id (0 until the job starts, -1 when unknown), the thread's processor time in ms when the job started]; the pool reads it to time the job. */
  clockCell?: Int32Array;
}

export default function work({ task, clockCell }: ComputeMessage): TaskOutcome {
  if (clockCell) {
    // the pool counts from here: the thread's own processor time where /proc has it, else the wall clock
    Atomics.store(clockCell, 1, THREAD_ID === null ? 0 : Math.round(threadCpuMs(THREAD_ID) ?? 0));
    Atomics.store(clockCell, 0, THREAD_ID ?? CLOCK_UNKNOWN);
  }
  return runComputeTask(task);
}
