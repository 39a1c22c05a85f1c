// Builds payment-service webhook deliveries signed with the app's webhook secret.
import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';

export function signedPayload(payload: string, options: { secret?: string; timestamp?: number } = {}): { payload: string; signature: string } {
  const signature = Stripe.webhooks.generateTestHeaderString({
    payload, secret: options.secret ?? process.env.STRIPE_WEBHOOK_SECRET!, timestamp: options.timestamp,
  });
  return { payload, signature };
}

export function signedDelivery(event: Record<string, unknown>, options: { secret?: string; timestamp?: number } = {}): { payload: string; signature: string } {
  const payload = JSON.stringify({ object: 'event', livemode: false, api_version: '2026-10-28.endive', created: Math.floor(Date.now() / 1000), ...event });
  return signedPayload(payload, options);
}

export function eventId(): string {
  return `evt_${randomUUID().replace(/-/g, '')}`;
}

export function subscriptionEvent(type: string, customer: string, quantity: number, options: { status?: string; subscription?: string; created?: number } = {}): Record<string, unknown> {
  return {
    id: eventId(),
    type,
    ...(options.created ? { created: options.created } : {}),
    data: {
      object: {
        id: options.subscription ?? `sub_${customer}`, object: 'subscription', customer, status: options.status ?? 'active', metadata: {},
        items: { object: 'list', data: [{ id: `si_${customer}`, object: 'subscription_item', quantity }] },
      },
    },
  };
}

export function invoiceEvent(type: 'invoice.paid' | 'invoice.payment_failed', customer: string): Record<string, unknown> {
  return {
    id: eventId(),
    type,
    data: { object: { id: `in_${randomUUID().slice(0, 8)}`, object: 'invoice', customer, currency: 'eur', amount_due: 2900, amount_paid: type === 'invoice.paid' ? 2900 : 0 } },
  };
}
