// The shape a payment-service event must have before anything reads it. A signed event that is
// not JSON, or lacks what its type needs (items, a currency, a customer), is refused naming
// the field, never half-applied.
import { z } from 'zod';

const objectId = z.string().min(1).max(255);
const customer = z.union([objectId, z.object({ id: objectId })]).transform((value) => (typeof value === 'string' ? value : value.id));

const subscription = z.object({
  id: objectId,
  object: z.literal('subscription'),
  customer,
  status: z.string().min(1).max(40),
  metadata: z.record(z.string(), z.string()).nullish(),
  items: z.object({ data: z.array(z.object({ quantity: z.number().int().min(0).max(100_000) })).min(1, 'has no items') }),
});

const invoice = z.object({
  id: objectId,
  object: z.literal('invoice'),
  customer,
  currency: z.string().regex(/^[a-zA-Z]{3}$/, 'must be a three-letter currency code'),
  amount_due: z.number().int().min(0),
  amount_paid: z.number().int().min(0),
});

const base = z.object({
  id: objectId,
  type: z.string().min(1).max(120),
  created: z.number().int().positive(),
  data: z.object({ object: z.record(z.string(), z.unknown()) }),
});

export const SUBSCRIPTION_EVENTS = ['customer.subscription.created', 'customer.subscription.updated', 'customer.subscription.deleted'] as const;
export const INVOICE_EVENTS = ['invoice.paid', 'invoice.payment_failed'] as const;

export type SubscriptionEvent = { kind: 'subscription'; id: string; type: (typeof SUBSCRIPTION_EVENTS)[number]; created: number; object: z.infer<typeof subscription> };
export type InvoiceEvent = { kind: 'invoice'; id: string; type: (typeof INVOICE_EVENTS)[number]; created: number; object: z.infer<typeof invoice> };
export type OtherEvent = { kind: 'other'; id: string; type: string; created: number };
export type BillingEventIn = SubscriptionEvent | InvoiceEvent | OtherEvent;

export type ShapeResult = { ok: true; event: BillingEventIn } | { ok: false; reason: string; id: string | null; type: string | null };

function problem(error: z.ZodError, prefix: string): string {
  const issue = error.issues[0];
  const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.');
  return `${path || 'the event'}: ${issue.message}`.slice(0, 300);
}

/** Parses and checks a verified payload. */
export function parseEvent(payload: string): ShapeResult {
  let value: unknown;
  try {
    value = JSON.parse(payload);
  } catch {
    return { ok: false, reason: 'the body is not JSON', id: null, type: null };
  }
  const head = base.safeParse(value);
  const loose = (typeof value === 'object' && value !== null ? value : {}) as Record<string, unknown>;
  const id = typeof loose.id === 'string' ? loose.id.slice(0, 255) : null;
  const type = typeof loose.type === 'string' ? loose.type.slice(0, 120) : null;
  if (!head.success) return { ok: false, reason: problem(head.error, ''), id, type };
  const event = head.data;
  const known = { id: event.id, created: event.created };
  if ((SUBSCRIPTION_EVENTS as readonly string[]).includes(event.type)) {
    const object = subscription.safeParse(event.data.object);
    if (!object.success) return { ok: false, reason: problem(object.error, 'data.object'), id, type };
    return { ok: true, event: { kind: 'subscription', ...known, type: event.type as SubscriptionEvent['type'], object: object.data } };
  }
  if ((INVOICE_EVENTS as readonly string[]).includes(event.type)) {
    const object = invoice.safeParse(event.data.object);
    if (!object.success) return { ok: false, reason: problem(object.error, 'data.object'), id, type };
    return { ok: true, event: { kind: 'invoice', ...known, type: event.type as InvoiceEvent['type'], object: object.data } };
  }
  return { ok: true, event: { kind: 'other', ...known, type: event.type } };
}
