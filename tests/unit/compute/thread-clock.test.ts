// A thread's processor time from /proc against the kernel's own account of the whole process
// (getrusage via process.cpuUsage): the thread can never have used more than the process, and a
// thread spinning alone accounts for nearly all of the process's time meanwhile (Linux proc(5)).
import { describe, expect, it } from 'vitest';
import { currentThreadId, threadCpuMs } from '@/lib/compute/thread-clock';

describe('thread clock', () => {
  it('reads the calling thread’s processor time, in step with the process’s', () => {
    const threadId = currentThreadId();
    expect(threadId).not.toBeNull();
    const threadStartMs = threadCpuMs(threadId!)!;
    const processStart = process.cpuUsage();
    let spin = 0;
    while (threadCpuMs(threadId!)! - threadStartMs < 200) spin += Math.sqrt(spin + 1);
    const threadUsedMs = threadCpuMs(threadId!)! - threadStartMs;
    const processUsed = process.cpuUsage(processStart);
    const processUsedMs = (processUsed.user + processUsed.system) / 1000;
    // /proc counts in 10 ms ticks: allow one tick either way
    expect(threadUsedMs).toBeGreaterThanOrEqual(200);
    expect(threadUsedMs).toBeLessThanOrEqual(processUsedMs + 10);
    expect(spin).toBeGreaterThan(0);
  });

  it('answers null for a thread that does not exist', () => {
    expect(threadCpuMs(2 ** 30)).toBeNull();
  });
});
