// Failed sign-ins slow the next try down; they never lock the right password out. Failures are
// counted in three budgets (lib/http/rate-limit.ts, shared by every app instance), each within
// an hour of its first failure:
//   pair     one account from one address: 5 free failures;
//   address  one address, any account:     30 free failures (one network trying many accounts);
//   account  one account, any address:     20 free failures (many networks trying one account).
// Past a budget's free failures, every further failure makes that key wait before the next try
// is even checked: 30 s, then twice as long each time, at most 15 minutes. Once the wait is over
// the right password signs in as usual. A stranger's failures land in their own pair and address
// budgets, so they cannot slow the owner's own address; only the account budget is shared, and a
// browser that signed in to the account before (known-devices.ts) is not held by it nor by the
// address budget. (Growing delays in place of lockouts, per account and per source: OWASP
// Authentication Cheat Sheet, "Account lockout"; the figures are product rules.)
import { addressKey } from '@/lib/http/client-address';
import { forgetRateLimit, heldFor, holdFor, releaseHold, spend, throttledError } from '@/lib/http/rate-limit';
import { emailKey, waitInWords, type RateLimitName } from '@/lib/http/rate-limit-rules';

export const SIGN_IN_FREE_FAILURES = { pair: 5, address: 30, account: 20 } as const;
export const FIRST_WAIT_S = 30;
export const LONGEST_WAIT_S = 15 * 60;

type Budget = keyof typeof SIGN_IN_FREE_FAILURES;
const RULE_OF: Record<Budget, RateLimitName> = { pair: 'signInFailuresPair', address: 'signInFailuresAddress', account: 'signInFailuresAccount' };

export interface SignInAttempt {
  email: string;
  address: string | null;
  // The browser signed in to this account before (known-devices.ts).
  knownDevice: boolean;
}

/** The wait after this many failures within a budget that allows `free` of them. */
export function waitAfterFailures(failures: number, free: number): number {
  if (failures < free) return 0;
  return Math.min(LONGEST_WAIT_S, FIRST_WAIT_S * 2 ** (failures - free));
}

function keysOf(attempt: SignInAttempt): { budget: Budget; key: string }[] {
  const account = emailKey(attempt.email);
  const address = addressKey(attempt.address);
  return [
    { budget: 'pair', key: `${account}|${address}` },
    { budget: 'address', key: address },
    { budget: 'account', key: account },
  ];
}

function holdKey(budget: Budget, key: string): string {
  return `signIn:${budget}:${key}`;
}

function waitMessage(seconds: number, afterFailure: boolean): string {
  const lead = afterFailure ? 'The e-mail or password is wrong, and there have been too many failed sign-ins.' : 'Too many failed sign-ins.';
  return `${lead} Wait ${waitInWords(seconds)} before the next try; the right password then signs you in.`;
}

/** Refuses the try (429) while one of its keys is still waiting; a known browser skips the shared ones. */
export async function assertMayTrySignIn(attempt: SignInAttempt): Promise<void> {
  const keys = keysOf(attempt).filter(({ budget }) => budget === 'pair' || !attempt.knownDevice);
  const waits = await Promise.all(keys.map(({ budget, key }) => heldFor(holdKey(budget, key))));
  const longest = Math.max(0, ...waits);
  if (longest > 0) throw throttledError(waitMessage(longest, false), longest);
}

/** Counts a failure in every budget; past a budget's free failures, its key waits. Throws 429 then. */
export async function recordSignInFailure(attempt: SignInAttempt): Promise<void> {
  let longest = 0;
  for (const { budget, key } of keysOf(attempt)) {
    const { used } = await spend(RULE_OF[budget], key);
    const seconds = waitAfterFailures(used, SIGN_IN_FREE_FAILURES[budget]);
    if (seconds > 0) {
      await holdFor(holdKey(budget, key), seconds);
      if (budget === 'pair' || !attempt.knownDevice) longest = Math.max(longest, seconds);
    }
  }
  if (longest > 0) throw throttledError(waitMessage(longest, true), longest);
}

/** A success clears the account's budget at that address (the shared budgets keep counting). */
export async function recordSignInSuccess(attempt: SignInAttempt): Promise<void> {
  const [pair] = keysOf(attempt);
  await forgetRateLimit(RULE_OF.pair, pair.key);
  await releaseHold(holdKey('pair', pair.key));
}
