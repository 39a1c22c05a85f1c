// The payment fake's webhooks: signed like the real service (HMAC-SHA256 over
// "timestamp.payload" in the Stripe-Signature header) and sent to the app. Like the real
// service, each event is delivered on its own, in no promised order, and retried after a failure
// (no answer, or a 5xx) on a growing delay: 1 s, 2 s, 4 s … capped at one minute between tries,
// for 20 tries over about a quarter of an hour. (The real service goes on for days; a test
// machine needs minutes.) Every try is signed afresh with the time it is sent.
// Tests may hold the webhooks of customers with a given e-mail and release them later, or make
// the next deliveries of a customer fail as if the app had not answered.
import { createHmac } from 'node:crypto';
import { fakeId, now } from './payments-store';

export interface FakeEvent { id: string; object: 'event'; type: string; created: number; livemode: false; api_version: string; data: { object: unknown } }

export function signPayload(payload: string, secret: string, timestamp = now()): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

export const MAX_TRIES = 20;
const FIRST_DELAY_MS = 1000;
const LONGEST_DELAY_MS = 60_000;

/** The wait after the given failed try (1-based): 1 s doubling to at most a minute, with ±10 % jitter. */
export function retryDelayMs(failedTry: number, random = Math.random): number {
  const base = Math.min(LONGEST_DELAY_MS, FIRST_DELAY_MS * 2 ** (failedTry - 1));
  return Math.round(base * (0.9 + 0.2 * random()));
}

export class WebhookSender {
  private readonly held = new Map<string, { email: string | null; event: FakeEvent }[]>(); // by customer e-mail
  private readonly holding = new Set<string>();
  private readonly failNext = new Map<string, number>(); // by customer e-mail: deliveries still to fail
  private readonly timers = new Set<NodeJS.Timeout>();

  constructor(private readonly target: string, private readonly secret: string) {}

  emit(customerEmail: string | null, type: string, object: unknown): void {
    const event: FakeEvent = { id: fakeId('evt'), object: 'event', type, created: now(), livemode: false, api_version: '2026-10-28.endive', data: { object } };
    if (customerEmail && this.holding.has(customerEmail)) {
      this.held.set(customerEmail, [...(this.held.get(customerEmail) ?? []), { email: customerEmail, event }]);
      return;
    }
    this.schedule(customerEmail, event, 1, 0);
  }

  hold(email: string): void { this.holding.add(email); }

  release(email: string): number {
    const events = this.held.get(email) ?? [];
    this.holding.delete(email);
    this.held.delete(email);
    for (const { event } of events) this.schedule(email, event, 1, 0);
    return events.length;
  }

  /** The next `count` deliveries for the customer fail as if the app had not answered, then are retried. */
  failDeliveries(email: string, count: number): void { this.failNext.set(email, count); }

  stop(): void {
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
  }

  private schedule(email: string | null, event: FakeEvent, attempt: number, delayMs: number): void {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void this.deliver(email, event, attempt);
    }, delayMs);
    this.timers.add(timer);
  }

  private async tryOnce(email: string | null, event: FakeEvent, payload: string): Promise<string | null> {
    const failures = email ? this.failNext.get(email) ?? 0 : 0;
    if (email && failures > 0) {
      this.failNext.set(email, failures - 1);
      return 'failed on purpose (test control)';
    }
    try {
      const response = await fetch(this.target, {
        method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signPayload(payload, this.secret) }, body: payload,
        signal: AbortSignal.timeout(30_000),
      });
      if (response.status < 500) {
        if (!response.ok) console.warn(`[payments fake] ${event.type} ${event.id}: the app answered ${response.status}: ${(await response.text()).slice(0, 300)}`);
        return null;
      }
      return `the app answered ${response.status}`;
    } catch (error) {
      return error instanceof Error ? error.message : String(error); // not up yet, or too busy to answer
    }
  }

  private async deliver(email: string | null, event: FakeEvent, attempt: number): Promise<void> {
    const problem = await this.tryOnce(email, event, JSON.stringify(event));
    if (problem === null) return;
    if (attempt >= MAX_TRIES) {
      console.warn(`[payments fake] gave up on ${event.type} ${event.id} to ${this.target} after ${attempt} tries: ${problem}`);
      return;
    }
    const delayMs = retryDelayMs(attempt);
    console.warn(`[payments fake] ${event.type} ${event.id} try ${attempt}: ${problem}; trying again in ${Math.round(delayMs / 1000)} s`);
    this.schedule(email, event, attempt + 1, delayMs);
  }
}
