// The payment fake's webhooks: signed like the real service (HMAC-SHA256 over
// "timestamp.payload" in the Stripe-Signature header), sent one at a time to the app. Tests
// may hold a customer's webhooks and release them later.
import { createHmac } from 'node:crypto';
import { fakeId, now } from './payments-store';

export interface FakeEvent { id: string; object: 'event'; type: string; created: number; livemode: false; api_version: string; data: { object: unknown } }

export function signPayload(payload: string, secret: string, timestamp = now()): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

const RETRIES = 3;

export class WebhookSender {
  private readonly held = new Map<string, FakeEvent[]>(); // by customer id
  private readonly holding = new Set<string>();
  private queue: Promise<void> = Promise.resolve();

  constructor(private readonly target: string, private readonly secret: string) {}

  emit(customerId: string, type: string, object: unknown): void {
    const event: FakeEvent = { id: fakeId('evt'), object: 'event', type, created: now(), livemode: false, api_version: '2026-10-28.endive', data: { object } };
    if (this.holding.has(customerId)) { this.held.set(customerId, [...(this.held.get(customerId) ?? []), event]); return; }
    this.enqueue(event);
  }

  hold(customerIds: string[]): void { for (const id of customerIds) this.holding.add(id); }

  release(customerIds: string[]): number {
    let count = 0;
    for (const id of customerIds) {
      this.holding.delete(id);
      for (const event of this.held.get(id) ?? []) { this.enqueue(event); count += 1; }
      this.held.delete(id);
    }
    return count;
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
      } catch {
        // the app is not up yet: try again below
      }
      await new Promise((resolve) => setTimeout(resolve, 500 * attempt));
    }
    console.warn(`[payments fake] gave up on ${event.type} ${event.id} to ${this.target}`);
  }
}
