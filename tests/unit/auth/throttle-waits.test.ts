// The wait after failed sign-ins: none within the free failures, then 30 s doubling with each
// failure, never more than 15 minutes (exponential back-off instead of a fixed lockout: OWASP
// Authentication Cheat Sheet, "Account lockout"; the figures are product rules).
import { describe, expect, it } from 'vitest';
import { FIRST_WAIT_S, LONGEST_WAIT_S, SIGN_IN_FREE_FAILURES, waitAfterFailures } from '@/lib/auth/throttle';

describe('waitAfterFailures', () => {
  it('gives the free failures no wait, then 30 s, 1, 2, 4, 8 minutes, then 15 minutes each', () => {
    const free = SIGN_IN_FREE_FAILURES.pair;
    const waits = Array.from({ length: 12 }, (_, index) => waitAfterFailures(index + 1, free));
    expect(waits).toEqual([0, 0, 0, 0, 30, 60, 120, 240, 480, 900, 900, 900]);
    expect(FIRST_WAIT_S).toBe(30);
    expect(LONGEST_WAIT_S).toBe(900);
  });

  it('the wider budgets start later: 30 failures from one address, 20 at one account', () => {
    expect(waitAfterFailures(29, SIGN_IN_FREE_FAILURES.address)).toBe(0);
    expect(waitAfterFailures(30, SIGN_IN_FREE_FAILURES.address)).toBe(30);
    expect(waitAfterFailures(19, SIGN_IN_FREE_FAILURES.account)).toBe(0);
    expect(waitAfterFailures(20, SIGN_IN_FREE_FAILURES.account)).toBe(30);
  });
});
