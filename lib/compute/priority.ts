// Lowers the calling thread's CPU priority (on Linux each thread has its own nice value; threads it
// starts later inherit it), so background work gives way to answering requests on a shared machine.
import os from 'node:os';

export function lowerPriority(nice: number): void {
  try {
    os.setPriority(0, nice);
  } catch {
    // Not permitted on this system: the thread runs at the normal priority.
  }
}
