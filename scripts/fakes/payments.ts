// The payment fake: exactly the calls Antinode makes through the stripe SDK (customers,
// subscriptions), plus a few controls for tests under /_fake. Loopback only.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { parseFormBody, type FormValue } from './form-body';
import { fakeId, now, PaymentsStore, SEAT_PRICE, seatItem, type FakeSubscription } from './payments-store';
import { WebhookSender } from './payments-webhooks';
import { environmentFor, PAYMENTS_FAKE_KEY, type FakeProfile } from './profiles';

type Form = Record<string, FormValue>;
class FakeError extends Error { constructor(readonly status: number, message: string) { super(message); } }

function text(value: FormValue | undefined): string | undefined {
  return typeof value === 'string' ? value : undefined;
}
function record(value: FormValue | undefined): Record<string, string> {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return {};
  return Object.fromEntries(Object.entries(value).filter((entry): entry is [string, string] => typeof entry[1] === 'string'));
}
function firstItem(form: Form): Form {
  const items = form.items;
  const first = Array.isArray(items) ? items[0] : undefined;
  if (!first || typeof first !== 'object' || Array.isArray(first)) throw new FakeError(400, 'items[0] is required');
  return first;
}
function quantityOf(item: Form): number {
  const quantity = Number(text(item.quantity) ?? '1');
  if (!Number.isInteger(quantity) || quantity < 0) throw new FakeError(400, 'items[0][quantity] must be a whole number');
  return quantity;
}

function invoiceFor(subscription: FakeSubscription, paid: boolean): Record<string, unknown> {
  const amount = subscription.items.data.reduce((sum, item) => sum + item.quantity * item.price.unit_amount, 0);
  return {
    id: fakeId('in'), object: 'invoice', customer: subscription.customer, currency: SEAT_PRICE.currency, created: now(),
    amount_due: amount, amount_paid: paid ? amount : 0, status: paid ? 'paid' : 'open',
  };
}

export function paymentsApp(store: PaymentsStore, webhooks: WebhookSender) {
  const emit = (customerId: string, type: string, object: unknown) => webhooks.emit(store.customer(customerId)?.email ?? null, type, object);
  const routes: { method: string; pattern: RegExp; handle: (match: RegExpMatchArray, form: Form) => unknown }[] = [
    { method: 'POST', pattern: /^\/v1\/customers$/, handle: (_, form) => store.putCustomer({
      id: fakeId('cus'), object: 'customer', email: text(form.email) ?? null, name: text(form.name) ?? null, metadata: record(form.metadata), created: now(),
    }) },
    { method: 'GET', pattern: /^\/v1\/customers\/(\w+)$/, handle: ([, id]) => store.customer(id) ?? notFound('customer', id) },
    { method: 'POST', pattern: /^\/v1\/subscriptions$/, handle: (_, form) => {
      const customer = text(form.customer);
      if (!customer || !store.customer(customer)) throw new FakeError(400, `No such customer: '${customer ?? ''}'`);
      const item = firstItem(form);
      const subscription = store.putSubscription({
        id: fakeId('sub'), object: 'subscription', customer, status: 'active', metadata: record(form.metadata), created: now(),
        items: { object: 'list', data: [seatItem(fakeId('si'), text(item.price) ?? 'price_unknown', quantityOf(item))] },
      });
      emit(customer, 'customer.subscription.created', subscription);
      emit(customer, 'invoice.paid', invoiceFor(subscription, true));
      return subscription;
    } },
    { method: 'GET', pattern: /^\/v1\/subscriptions\/(\w+)$/, handle: ([, id]) => store.subscription(id) ?? notFound('subscription', id) },
    { method: 'POST', pattern: /^\/v1\/subscriptions\/(\w+)$/, handle: ([, id], form) => {
      const subscription = store.subscription(id) ?? notFound('subscription', id);
      if (subscription.status === 'canceled') throw new FakeError(400, 'A canceled subscription can only update its cancellation details.');
      const item = firstItem(form);
      const existing = subscription.items.data.find((entry) => entry.id === text(item.id)) ?? subscription.items.data[0];
      existing.quantity = quantityOf(item);
      store.putSubscription(subscription);
      emit(subscription.customer, 'customer.subscription.updated', subscription);
      return subscription;
    } },
    { method: 'DELETE', pattern: /^\/v1\/subscriptions\/(\w+)$/, handle: ([, id]) => {
      const subscription = store.subscription(id) ?? notFound('subscription', id);
      subscription.status = 'canceled';
      store.putSubscription(subscription);
      emit(subscription.customer, 'customer.subscription.deleted', subscription);
      return subscription;
    } },
    // Test controls, by the customer's e-mail: hold and release webhooks, make the next deliveries
    // fail (they are retried on the usual delays), settle an invoice.
    { method: 'POST', pattern: /^\/_fake\/(hold|release)$/, handle: ([, verb], form) => {
      const email = text(form.email);
      if (!email) throw new FakeError(400, 'email is required');
      if (verb === 'hold') { webhooks.hold(email); return { holding: email }; }
      return { released: webhooks.release(email) };
    } },
    { method: 'POST', pattern: /^\/_fake\/fail$/, handle: (_, form) => {
      const email = text(form.email);
      const count = Number(form.count as unknown); // a JSON number or form text
      if (!email || !Number.isInteger(count) || count < 0) throw new FakeError(400, 'email and a whole count are required');
      webhooks.failDeliveries(email, count);
      return { failing: email, count };
    } },
    { method: 'POST', pattern: /^\/_fake\/invoices$/, handle: (_, form) => {
      const paid = text(form.outcome) !== 'failed';
      const subscriptions = store.customersByEmail(text(form.email) ?? '').flatMap((customer) => store.subscriptionsOf(customer.id)).filter((s) => s.status !== 'canceled');
      for (const subscription of subscriptions) {
        subscription.status = paid ? 'active' : 'past_due';
        store.putSubscription(subscription);
        emit(subscription.customer, paid ? 'invoice.paid' : 'invoice.payment_failed', invoiceFor(subscription, paid));
      }
      return { invoices: subscriptions.length };
    } },
  ];

  return async (request: IncomingMessage, response: ServerResponse): Promise<void> => {
    const chunks: Buffer[] = [];
    for await (const chunk of request) chunks.push(chunk as Buffer);
    const body = Buffer.concat(chunks).toString('utf8');
    const url = new URL(request.url ?? '/', 'http://fake');
    try {
      if (url.pathname.startsWith('/v1/') && request.headers.authorization !== `Bearer ${PAYMENTS_FAKE_KEY}`) throw new FakeError(401, 'Invalid API key provided.');
      const form = request.headers['content-type']?.includes('json') ? (JSON.parse(body || '{}') as Form) : parseFormBody(body || url.search.slice(1));
      for (const route of routes) {
        const match = route.method === request.method ? url.pathname.match(route.pattern) : null;
        if (match) return send(response, 200, route.handle(match, form));
      }
      throw new FakeError(404, `Unrecognized request URL (${request.method}: ${url.pathname}).`);
    } catch (error) {
      const status = error instanceof FakeError ? error.status : 500;
      send(response, status, { error: { type: status === 401 ? 'authentication_error' : 'invalid_request_error', message: error instanceof Error ? error.message : String(error) } });
    }
  };
}

function notFound(kind: string, id: string): never {
  throw new FakeError(404, `No such ${kind}: '${id}'`);
}

function send(response: ServerResponse, status: number, data: unknown): void {
  response.writeHead(status, { 'content-type': 'application/json', 'request-id': fakeId('req') });
  response.end(JSON.stringify(data));
}

export async function startPaymentsFake(profile: FakeProfile): Promise<() => Promise<void>> {
  const env = environmentFor(profile);
  const store = new PaymentsStore(profile.paymentsStateFile);
  const webhooks = new WebhookSender(env.PAYMENTS_WEBHOOK_URL, env.STRIPE_WEBHOOK_SECRET);
  const handle = paymentsApp(store, webhooks);
  const server = createServer((request, response) => { void handle(request, response); });
  await new Promise<void>((resolve, reject) => { server.once('error', reject); server.listen(profile.paymentsPort, '127.0.0.1', resolve); });
  return () => new Promise<void>((resolve) => { webhooks.stop(); server.close(() => resolve()); });
}
