// The payment fake's webhooks: signed like the real service (HMAC-SHA256 over
// "timestamp.payload" in the Stripe-Signature header), sent one at a time to the app. Tests
// may hold the webhooks of customers with a given e-mail and release them later.
import { createHmac } from 'node:crypto';
import { fakeId, now } from './payments-store';

export interface FakeEvent { id: string; object: 'event'; type: string; created: number; livemode: false; api_version: string; data: { object: unknown } }

export function signPayload(payload: string, secret: string, timestamp = now()): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

// The real service retries for days; the fake keeps trying for about 18 s so a busy test server is not dropped.
const RETRIES = 8;

export class WebhookSender {
  private readonly held = new Map<string, FakeEvent[]>(); // by customer e-mail
  private readonly holding = new Set<string>();
  private queue: Promise<void> = Promise.resolve();

  constructor(private readonly target: string, private readonly secret: string) {}

  emit(customerEmail: string | null, type: string, object: unknown): void {
    const event: FakeEvent = { id: fakeId('evt'), object: 'event', type, created: now(), livemode: false, api_version: '2026-10-28.endive', data: { object } };
    if (customerEmail && this.holding.has(customerEmail)) { this.held.set(customerEmail, [...(this.held.get(customerEmail) ?? []), event]); return; }
    this.enqueue(event);
  }

  hold(email: string): void { this.holding.add(email); }

  release(email: string): number {
    const events = this.held.get(email) ?? [];
    this.holding.delete(email);
    this.held.delete(email);
    for (const event of events) this.enqueue(event);
    return events.length;
  }

  private enqueue(event: FakeEvent): void {
    this.queue = this.queue.then(() => this.deliver(event)).catch((error: unknown) => console.error('[payments fake] delivery failed', error));
  }

  private async deliver(event: FakeEvent): Promise<void> {
    const payload = JSON.stringify(event);
    for (let attempt = 1; attempt <= RETRIES; attempt += 1) {
      try {
        const response = await fetch(this.target, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signPayload(payload, this.secret) }, body: payload });
        if (response.status < 500) {
          if (!response.ok) console.warn(`[payments fake] ${event.type} ${event.id}: the app answered ${response.status}`);
          return;
        }
        console.warn(`[payments fake] ${event.type} ${event.id}: the app answered ${response.status}; trying again`);
      } catch (error) {
        // the app is not up yet, or too busy to answer: try again below
        console.warn(`[payments fake] ${event.type} ${event.id}: ${error instanceof Error ? error.message : String(error)}; trying again`);
      }
      await new Promise((resolve) => setTimeout(resolve, 500 * attempt));
    }
    console.warn(`[payments fake] gave up on ${event.type} ${event.id} to ${this.target}`);
  }
}
