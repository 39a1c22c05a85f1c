// Budgets counted in PostgreSQL (rate-limiter-flexible's store, table rate_limits) so every app
// instance shares them: analyses per person, and the budgets of the account doors (sign-up,
// password resets, invitations, current-password checks, sign-in failures). Each budget is a
// number of points within a window; the rules and their reasons are in rate-limit-rules.ts.
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { RATE_LIMIT_RULES, type RateLimitName } from './rate-limit-rules';

export { emailKey, waitInWords, type RateLimitName } from './rate-limit-rules';

const holder = globalThis as typeof globalThis & { antinodeRateLimiters?: Map<string, RateLimiterPostgres> };

function store(prefix: string, points: number, durationS: number): RateLimiterPostgres {
  holder.antinodeRateLimiters ??= new Map();
  const id = `${prefix}/${points}/${durationS}`;
  let found = holder.antinodeRateLimiters.get(id);
  if (!found) {
    found = new RateLimiterPostgres({
      storeClient: sequelize, storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, clearExpiredByTimeout: false,
      keyPrefix: prefix, points, duration: durationS,
    });
    holder.antinodeRateLimiters.set(id, found);
  }
  return found;
}

function limiter(name: RateLimitName): RateLimiterPostgres {
  const rule = RATE_LIMIT_RULES[name];
  return store(name, rule.points, rule.durationS);
}

export interface Spent { allowed: boolean; used: number; retryAfterS: number }

/** Counts one point against the key's budget; says whether it was within it (never throws for over). */
export async function spend(name: RateLimitName, key: string): Promise<Spent> {
  try {
    const result = await limiter(name).consume(key);
    return { allowed: true, used: result.consumedPoints, retryAfterS: Math.ceil(result.msBeforeNext / 1000) };
  } catch (error) {
    if (error instanceof RateLimiterRes) {
      return { allowed: false, used: error.consumedPoints, retryAfterS: Math.max(1, Math.ceil(error.msBeforeNext / 1000)) };
    }
    throw error;
  }
}

/** Whether the key's budget is spent, without counting anything. */
export async function isSpent(name: RateLimitName, key: string): Promise<Spent> {
  const result = await limiter(name).get(key);
  const used = result?.consumedPoints ?? 0;
  const allowed = used < RATE_LIMIT_RULES[name].points;
  return { allowed, used, retryAfterS: result ? Math.max(allowed ? 0 : 1, Math.ceil(result.msBeforeNext / 1000)) : 0 };
}

/** Counts one point; over the budget, a 429 with the rule's message and Retry-After. */
export async function consumeRateLimit(name: RateLimitName, key: string): Promise<void> {
  const spent = await spend(name, key);
  if (!spent.allowed) throw throttledError(RATE_LIMIT_RULES[name].refusal(spent.retryAfterS), spent.retryAfterS);
}

export async function forgetRateLimit(name: RateLimitName, key: string): Promise<void> {
  await limiter(name).delete(key);
}

export function throttledError(message: string, retryAfterS: number, field?: string): AppError {
  return new AppError('throttled', message, { retryAfterS, field });
}

// Waits imposed after failures (sign-in): a key is held for a given number of seconds.
const WAIT_PREFIX = 'wait';

/** Holds the key for `seconds`: isHeld answers with the time left until then. */
export async function holdFor(key: string, seconds: number): Promise<void> {
  await store(WAIT_PREFIX, 1, 1).block(key, seconds);
}

/** Seconds the key is still held for, or 0. */
export async function heldFor(key: string): Promise<number> {
  const result = await store(WAIT_PREFIX, 1, 1).get(key);
  if (!result || result.consumedPoints <= 1 || result.msBeforeNext <= 0) return 0;
  return Math.ceil(result.msBeforeNext / 1000);
}

export async function releaseHold(key: string): Promise<void> {
  await store(WAIT_PREFIX, 1, 1).delete(key);
}
