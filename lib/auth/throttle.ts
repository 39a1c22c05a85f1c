// Throttling of failed sign-ins, per account e-mail and per client address.
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { SignInThrottle } from '@/models';

const WINDOW_MS = 15 * 60 * 1000;
const LIMITS = { email: { failures: 5, lockMs: 15 * 60 * 1000 }, ip: { failures: 50, lockMs: 15 * 60 * 1000 } } as const;

export interface ThrottleKeys { email: string; ip: string | null }

function keysOf(keys: ThrottleKeys): { key: string; kind: keyof typeof LIMITS }[] {
  const list: { key: string; kind: keyof typeof LIMITS }[] = [{ key: `email:${keys.email}`, kind: 'email' }];
  if (keys.ip) list.push({ key: `ip:${keys.ip}`, kind: 'ip' });
  return list;
}

function minutesUntil(date: Date, now: Date): number {
  return Math.max(1, Math.ceil((date.getTime() - now.getTime()) / 60_000));
}

export async function assertNotThrottled(keys: ThrottleKeys, now = new Date()): Promise<void> {
  const rows = await SignInThrottle.findAll({ where: { key: keysOf(keys).map((k) => k.key) } });
  const lockedUntil = rows
    .map((row) => row.lockedUntil)
    .filter((date): date is Date => date instanceof Date && date > now)
    .sort((a, b) => b.getTime() - a.getTime())[0];
  if (lockedUntil) {
    const minutes = minutesUntil(lockedUntil, now);
    throw new AppError(
      'throttled',
      `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'} (after ${lockedUntil.toISOString().slice(11, 16)} UTC).`,
      { retryAfterS: Math.ceil((lockedUntil.getTime() - now.getTime()) / 1000) },
    );
  }
}

// Counts one failure; returns true when this failure locked a key.
export async function recordFailure(keys: ThrottleKeys, now = new Date()): Promise<boolean> {
  let locked = false;
  await sequelize.transaction(async (transaction) => {
    for (const { key, kind } of keysOf(keys)) {
      const row = await SignInThrottle.findByPk(key, { transaction, lock: transaction.LOCK.UPDATE });
      const limit = LIMITS[kind];
      if (!row || now.getTime() - row.windowStartedAt.getTime() > WINDOW_MS) {
        await SignInThrottle.upsert({ key, failures: 1, windowStartedAt: now, lockedUntil: null }, { transaction });
        continue;
      }
      const failures = row.failures + 1;
      const lockedUntil = failures >= limit.failures ? new Date(now.getTime() + limit.lockMs) : row.lockedUntil;
      if (failures >= limit.failures) locked = true;
      await row.update({ failures, lockedUntil }, { transaction });
    }
  });
  return locked;
}

export async function clearFailures(email: string): Promise<void> {
  await SignInThrottle.destroy({ where: { key: `email:${email}` } });
}
