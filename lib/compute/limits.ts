// The compute budget: how many worker threads, how long and how much memory one job may take.
import os from 'node:os';

/** Worker threads: one per core but one, and at least two, so one long job never holds every other person's analysis (ANTINODE_COMPUTE_THREADS sets it: the job worker takes one). */
export const COMPUTE_THREADS = process.env.ANTINODE_COMPUTE_THREADS ? Math.max(1, Number(process.env.ANTINODE_COMPUTE_THREADS)) : Math.max(2, os.availableParallelism() - 1);
/** Jobs waiting for a thread beyond this are refused as busy (503) rather than queued without end. */
export const COMPUTE_QUEUE = Number(process.env.ANTINODE_COMPUTE_QUEUE ?? 32);
/** Nice value of the worker threads (0 normal, 19 lowest): engine work gives way to answering requests. */
export const COMPUTE_NICE = Number(process.env.ANTINODE_COMPUTE_NICE ?? 10);
/** Heap of one worker thread, MB: a job that needs more is stopped (its thread is replaced). */
export const COMPUTE_HEAP_MB = Number(process.env.ANTINODE_COMPUTE_HEAP_MB ?? 256);

/** Time limits per kind of job, ms (a job past its limit is stopped and its thread replaced). */
export const COMPUTE_TIME_LIMIT_MS = {
  'analyze-run': Number(process.env.ANTINODE_RUN_TIME_LIMIT_MS ?? 5000),
  'plan-analysis': Number(process.env.ANTINODE_PLAN_TIME_LIMIT_MS ?? 15000),
  'plan-envelopes': Number(process.env.ANTINODE_PLAN_TIME_LIMIT_MS ?? 15000),
  'treatment-options': Number(process.env.ANTINODE_TREATMENT_TIME_LIMIT_MS ?? 10000),
  'dxf-drawing': Number(process.env.ANTINODE_DXF_TIME_LIMIT_MS ?? 20000),
} as const;
