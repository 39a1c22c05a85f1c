// Checks for the health (is this process answering?) and readiness (can it serve: database and
// file store reachable?) routes. Each says how long it took and, when it fails, why.
import { HeadBucketCommand } from '@aws-sdk/client-s3';
import { sequelize } from './db';
import { storeClient, storeSettings } from './storage/object-store';

export interface Check { ok: boolean; latencyMs: number; message?: string }

/** Longest a readiness check waits for one dependency, ms. */
const CHECK_TIMEOUT_MS = 2000;

async function timed(work: () => Promise<unknown>): Promise<Check> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([work(), new Promise((_, reject) => { timer = setTimeout(() => reject(new Error(`no answer within ${CHECK_TIMEOUT_MS} ms`)), CHECK_TIMEOUT_MS); })]);
    return { ok: true, latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    return { ok: false, latencyMs: Math.round(performance.now() - started), message: error instanceof Error ? error.message || error.name : 'unreachable' };
  } finally {
    clearTimeout(timer);
  }
}

export function checkDatabase(): Promise<Check> {
  return timed(() => sequelize.query('select 1'));
}

export function checkStore(): Promise<Check> {
  return timed(() => storeClient().send(new HeadBucketCommand({ Bucket: storeSettings().bucket })));
}
