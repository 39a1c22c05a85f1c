// The processor time one thread of this process has used, read from Linux's /proc: a compute job's
// time limit counts the time its own thread ran, so a job that waits behind other work (its thread
// runs at a lower priority than the server's) is not stopped for the waiting.
import { readFileSync, readlinkSync } from 'node:fs';

/** Clock ticks per second of /proc's utime and stime (USER_HZ, 100 on every Linux build in use). */
const TICKS_PER_SECOND = 100;

/** The calling thread's id in /proc (its "task" entry), or null where /proc has no such entry. */
export function currentThreadId(): number | null {
  try {
    const link = readlinkSync('/proc/thread-self');
    const id = Number(link.split('/').pop());
    return Number.isInteger(id) && id > 0 ? id : null;
  } catch {
    return null;
  }
}

/** Processor time (user + system) the thread has used, ms, or null when it cannot be read (thread gone, no /proc). */
export function threadCpuMs(threadId: number): number | null {
  try {
    const stat = readFileSync(`/proc/self/task/${threadId}/stat`, 'utf8');
    // Fields after the command name, which is in parentheses and may itself contain spaces.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    // utime and stime are fields 14 and 15 of the whole line: 12th and 13th after the name.
    const ticks = Number(fields[11]) + Number(fields[12]);
    return Number.isFinite(ticks) ? (ticks * 1000) / TICKS_PER_SECOND : null;
  } catch {
    return null;
  }
}

/** What a compute worker writes into its job's clock cell when it cannot read its thread's processor time. */
export const CLOCK_UNKNOWN = -1;
