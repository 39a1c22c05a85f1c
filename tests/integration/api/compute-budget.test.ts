// The compute budget: engine work runs in worker threads with a time limit; a job past it is
// stopped with a 422 that says what to reduce while the server's own thread keeps answering, and
// each person's analyses are counted in PostgreSQL against a per-minute limit (product rules,
// common practice, no source).
import { afterAll, describe, expect, it } from 'vitest';
import { GET as health } from '@/app/api/v1/health/route';
import { COMPUTE_THREADS } from '@/lib/compute/limits';
import { compute, closeComputePool } from '@/lib/compute/pool';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { consumeRateLimit } from '@/lib/http/rate-limit';
import { call } from '../helpers/routes';

afterAll(async () => { await closeComputePool(); await sequelize.close(); });

/**
 * Long enough to keep a worker busy for seconds: many short segments of changing size, rigid walls (the
 * sharpest resonances) over a wide band, some 1,800 resonances: about 2 s of one thread here.
 */
const heavyRun = {
  segments: Array.from({ length: 2000 }, (_, index) => ({ lengthM: 0.2, section: { shape: 'round', diameterM: 0.1 + (index % 5) * 0.01 } })),
  walls: { kind: 'rigid' }, start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxHz: 800,
};

describe('compute budget', () => {
  it('stops a job past its time limit with a 422 that says what to reduce, while health checks are answered meanwhile', async () => {
    expect((await call(health, 'GET', '/api/v1/health', {})).status).toBe(200); // the database connection is open
    let settled = false;
    const job = compute({ kind: 'analyze-run', input: heavyRun }, { reduce: "the run's length", timeLimitMs: 300 }).then(
      () => { settled = true; return null as unknown; },
      (error: unknown) => { settled = true; return error; },
    );
    const checked = await call(health, 'GET', '/api/v1/health', {});
    expect(checked.status).toBe(200);
    // answered while the job was still running in its worker thread
    expect(settled).toBe(false);
    const error = await job;
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(422);
    expect((error as AppError).message).toMatch(/stopped\. Reduce the run's length/);
  });

  it('counts a job’s time limit from when it starts running, not while it waits for a thread', async () => {
    // every thread busy with a job that will be stopped after 0.8 s
    const blockers = Array.from({ length: COMPUTE_THREADS }, () => compute({ kind: 'analyze-run', input: heavyRun }, { reduce: 'x', timeLimitMs: 800 }).catch((error: unknown) => error));
    // a small run with a 0.4 s limit waits about 0.8 s for a thread, then runs in milliseconds
    const small = { segments: [{ lengthM: 2, section: { shape: 'round', diameterM: 0.2 } }], start: { kind: 'closed' }, end: { kind: 'closed' }, maxHz: 300 };
    const analysis = JSON.parse(await compute<string>({ kind: 'analyze-run', input: small }, { reduce: 'x', timeLimitMs: 400 })) as { resonances: unknown[] };
    expect(analysis.resonances.length).toBeGreaterThan(0);
    for (const stopped of await Promise.all(blockers)) expect((stopped as AppError).status).toBe(422);
  });

  it('gives back the engine’s own RangeError, naming the field, from the worker thread', async () => {
    await expect(compute({ kind: 'analyze-run', input: { ...heavyRun, segments: [{ lengthM: -1, section: { shape: 'round', diameterM: 0.2 } }] } }, { reduce: 'x' }))
      .rejects.toThrow(RangeError);
    await expect(compute({ kind: 'analyze-run', input: { ...heavyRun, segments: [{ lengthM: -1, section: { shape: 'round', diameterM: 0.2 } }] } }, { reduce: 'x' }))
      .rejects.toThrow('segments[0].lengthM must be > 0');
  });

  it('counts one person’s analyses in the database and refuses the one past the limit with a 429 and when to retry', async () => {
    const personId = `rate-test-${Date.now()}`;
    const limit = Number(process.env.ANTINODE_ANALYSIS_RATE_PER_MINUTE ?? 120);
    for (let count = 0; count < limit; count += 1) await consumeRateLimit('analysis', personId);
    const refused = await consumeRateLimit('analysis', personId).then(() => null, (error: unknown) => error);
    expect(refused).toBeInstanceOf(AppError);
    expect((refused as AppError).status).toBe(429);
    expect((refused as AppError).retryAfterS).toBeGreaterThan(0);
    const [rows] = await sequelize.query('select points from rate_limits where key = :key', { replacements: { key: `analysis:${personId}` } });
    expect((rows as { points: number }[])[0]?.points).toBeGreaterThan(limit);
    // someone else is not affected
    await expect(consumeRateLimit('analysis', `${personId}-other`)).resolves.toBeUndefined();
  });
});
