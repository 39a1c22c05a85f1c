// Per-person rate limits on the routes that start engine work, counted in PostgreSQL
// (rate-limiter-flexible's store) so every app instance shares them.
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';

export type RateLimitName = 'analysis';

/** Analyses one person may start per minute (each save of a plan asks for one). */
const ANALYSIS_PER_MINUTE = Number(process.env.ANTINODE_ANALYSIS_RATE_PER_MINUTE ?? 120);

const holder = globalThis as typeof globalThis & { antinodeRateLimiters?: Map<RateLimitName, RateLimiterPostgres> };

function limiter(name: RateLimitName): RateLimiterPostgres {
  holder.antinodeRateLimiters ??= new Map();
  let found = holder.antinodeRateLimiters.get(name);
  if (!found) {
    found = new RateLimiterPostgres({
      storeClient: sequelize, storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, clearExpiredByTimeout: false,
      keyPrefix: name, points: ANALYSIS_PER_MINUTE, duration: 60,
    });
    holder.antinodeRateLimiters.set(name, found);
  }
  return found;
}

/** Counts one request of the person; over the limit, a 429 that says when to try again. */
export async function consumeRateLimit(name: RateLimitName, personId: string): Promise<void> {
  try {
    await limiter(name).consume(personId);
  } catch (error) {
    if (error instanceof RateLimiterRes) {
      const retryAfterS = Math.max(1, Math.ceil(error.msBeforeNext / 1000));
      throw new AppError('throttled', `You have started more than ${ANALYSIS_PER_MINUTE} analyses in a minute; try again in ${retryAfterS} s.`, { retryAfterS });
    }
    throw error;
  }
}
