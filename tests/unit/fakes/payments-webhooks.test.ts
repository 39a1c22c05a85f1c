// The payment fake's retry schedule: growing delays, capped, long enough that a busy machine
// does not lose a webhook. (The real service retries for up to three days with exponential
// back-off: its webhook documentation; minutes are what a test machine needs.)
import { describe, expect, it } from 'vitest';
import { MAX_TRIES, retryDelayMs } from '../../../scripts/fakes/payments-webhooks';

describe('retryDelayMs', () => {
  it('doubles from 1 s to at most a minute, within ±10 % jitter', () => {
    const middle = () => 0.5;
    expect([1, 2, 3, 4, 5, 6, 7, 8].map((failedTry) => retryDelayMs(failedTry, middle))).toEqual([1000, 2000, 4000, 8000, 16000, 32000, 60000, 60000]);
    expect(retryDelayMs(1, () => 0)).toBe(900);
    expect(retryDelayMs(1, () => 1)).toBe(1100);
  });

  it('keeps trying for more than ten minutes in all before giving up', () => {
    let totalMs = 0;
    for (let failedTry = 1; failedTry < MAX_TRIES; failedTry += 1) totalMs += retryDelayMs(failedTry, () => 0);
    expect(totalMs).toBeGreaterThan(10 * 60_000);
  });
});
