// Payment webhooks, delivered by hand against teams with real subscriptions in the local
// payment fake (their own webhooks held back). Signature scheme and tolerance: the payment
// service's webhook documentation (HMAC-SHA256 over "timestamp.payload", 5 minutes by default);
// refusing stamps from the future as well as the past is common practice, no source. A verified
// event is recorded and answered at once; its job applies it (worked here in the test's process).
import { createHash } from 'node:crypto';
import Stripe from 'stripe';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { POST as webhook } from '@/app/api/v1/billing/webhook/route';
import { GET as listProjects, POST as createProject } from '@/app/api/v1/projects/route';
import { applyBillingEventJob } from '@/lib/billing/apply-event-job';
import { paymentService } from '@/lib/billing/stripe';
import { sequelize } from '@/lib/db';
import type { JobData } from '@/lib/jobs/names';
import { AuditEvent, BillingEvent, BillingRefusal, TeamBilling } from '@/models';
import { workWaitingJobs } from '../helpers/jobs';
import { call } from '../helpers/routes';
import { until } from '../helpers/until';
import { fakeControl, setQuantity, subscribedTeam } from '../helpers/payment-fake';
import { eventId, invoiceEvent, signedDelivery, signedPayload, subscriptionEvent } from '../helpers/webhooks';

afterAll(async () => { await sequelize.close(); });

/** Delivers, then works the apply-billing-event jobs waiting (as the job worker would); `queue` leaves them waiting. */
async function deliver(delivery: { payload: string; signature?: string }, then: 'apply' | 'queue' = 'apply'): Promise<{ status: number; body: unknown }> {
  const headers: Record<string, string> = { host: 'localhost', 'content-type': 'application/json' };
  if (delivery.signature) headers['stripe-signature'] = delivery.signature;
  const request = new Request('http://localhost/api/v1/billing/webhook', { method: 'POST', headers, body: delivery.payload });
  const response = await webhook(request, { params: Promise.resolve({}) });
  const answer = { status: response.status, body: await response.json() };
  if (then === 'apply') {
    await workWaitingJobs(['apply-billing-event']);
    // Another test file's process may have taken this event's job: wait until it is applied there.
    const id = (/"id":"(evt_[^"]+)"/.exec(delivery.payload) ?? [])[1];
    if (answer.status === 200 && id) await until(`event ${id} applied`, async () => (await BillingEvent.findOne({ where: { providerEventId: id } }))?.outcome !== 'queued', 20_000);
  }
  return answer;
}

/** The job the webhook queued for this event, as the worker would get it on a given try. */
async function queuedJob(eventIdSent: string, retryCount: number): Promise<Parameters<typeof applyBillingEventJob>[0]> {
  const [rows] = await sequelize.query(
    `select id, data from pgboss.job where name = 'apply-billing-event' and data->'event'->>'id' = $1`,
    { bind: [eventIdSent] },
  );
  const [job] = rows as { id: string; data: JobData['apply-billing-event'] }[];
  // Taken out of the queue, so that no other test file's process works it meanwhile: this test plays the worker.
  await sequelize.query(`update pgboss.job set state = 'cancelled' where id = $1 and state = 'created'`, { bind: [job!.id] });
  return { id: job!.id, data: job!.data, retryCount, retryLimit: 10 };
}

function serviceAway(): void {
  vi.spyOn(paymentService().subscriptions, 'retrieve').mockRejectedValueOnce(new Stripe.errors.StripeConnectionError({ message: 'connect ECONNREFUSED 127.0.0.1' }));
}

async function refusalCount(kind: string): Promise<number> {
  return (await BillingRefusal.sum('count', { where: { kind } })) || 0;
}

describe('payment webhooks', () => {
  it('a signed event brings the team in line with the subscription the service holds', async () => {
    const team = await subscribedTeam('hook-ok', 2);
    await setQuantity(team, 6);
    const event = subscriptionEvent('customer.subscription.updated', team.customerId, 6, { subscription: team.subscriptionId });
    const answer = await deliver(signedDelivery(event));
    expect(answer).toMatchObject({ status: 200, body: { outcome: 'queued' } });
    expect(await BillingEvent.findOne({ where: { providerEventId: String(event.id) } })).toMatchObject({ outcome: 'applied', teamId: team.team.id });
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 6, state: 'active' });
    expect(await AuditEvent.findOne({ where: { teamId: team.team.id, action: 'billing.seats_changed' } })).toMatchObject({ actorName: 'Payment service', subject: '2 → 6 paid seats' });
  });

  it('two events of the same second, arriving in the wrong order, end on the newest state', async () => {
    // The case: 6 then 5 were delivered and the team ended on 5, though 6 was the later change.
    const team = await subscribedTeam('hook-order', 2);
    const second = Math.floor(Date.now() / 1000);
    await setQuantity(team, 5);
    await setQuantity(team, 6);
    const sixth = subscriptionEvent('customer.subscription.updated', team.customerId, 6, { subscription: team.subscriptionId, created: second });
    const fifth = subscriptionEvent('customer.subscription.updated', team.customerId, 5, { subscription: team.subscriptionId, created: second });
    expect((await deliver(signedDelivery(sixth))).status).toBe(200);
    expect((await deliver(signedDelivery(fifth))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 6 });
  });

  it('a tampered event or one signed with another secret is refused and counted, not logged one row each', async () => {
    const team = await subscribedTeam('hook-tampered', 2);
    const rowsBefore = await BillingEvent.count();
    const countedBefore = await refusalCount('bad_signature');
    const genuine = signedDelivery(subscriptionEvent('customer.subscription.updated', team.customerId, 3, { subscription: team.subscriptionId }));
    const tampered = await deliver({ payload: genuine.payload.replace('"quantity":3', '"quantity":300'), signature: genuine.signature });
    expect(tampered.status).toBe(400);
    expect(tampered.body).toMatchObject({ error: { code: 'bad_input', message: expect.stringContaining('signature did not verify') } });
    const otherSecret = await deliver(signedDelivery(subscriptionEvent('customer.subscription.updated', team.customerId, 9), { secret: 'whsec_someone_else' }));
    expect(otherSecret.status).toBe(400);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 2 });
    expect(await BillingEvent.count()).toBe(rowsBefore);
    expect(await refusalCount('bad_signature')).toBe(countedBefore + 2);
  });

  it('100 unsigned requests add no rows to the event log, only to one counter', async () => {
    const rowsBefore = await BillingEvent.count();
    const countedBefore = await refusalCount('unsigned');
    const statuses = new Set<number>();
    for (let index = 0; index < 100; index += 1) statuses.add((await deliver({ payload: `{"id":"evt_flood_${index}"}` })).status);
    expect([...statuses]).toEqual([400]);
    expect(await BillingEvent.count()).toBe(rowsBefore);
    expect(await refusalCount('unsigned')).toBe(countedBefore + 100);
    expect(await BillingRefusal.count({ where: { kind: 'unsigned' } })).toBeLessThanOrEqual(2); // one row per hour (two if the hour turned)
  });

  it('a delivery received twice is answered without being applied twice', async () => {
    const team = await subscribedTeam('hook-replay', 2);
    await setQuantity(team, 4);
    const event = subscriptionEvent('customer.subscription.updated', team.customerId, 4, { subscription: team.subscriptionId });
    const delivery = signedDelivery(event);
    expect(await deliver(delivery)).toMatchObject({ status: 200, body: { outcome: 'queued' } });
    expect(await deliver(delivery)).toMatchObject({ status: 200, body: { outcome: 'duplicate' } });
    expect(await deliver(signedDelivery(event))).toMatchObject({ status: 200, body: { outcome: 'duplicate' } });
    expect(await BillingEvent.count({ where: { providerEventId: String(event.id) } })).toBe(1);
    expect(await AuditEvent.count({ where: { teamId: team.team.id, action: 'billing.seats_changed' } })).toBe(1);
  });

  it('a signature stamped outside the tolerance is refused, in the past and in the future', async () => {
    const team = await subscribedTeam('hook-stamps', 2);
    await setQuantity(team, 7);
    const nowS = Math.floor(Date.now() / 1000);
    const event = () => subscriptionEvent('customer.subscription.updated', team.customerId, 7, { subscription: team.subscriptionId });
    const stale = await deliver(signedDelivery(event(), { timestamp: nowS - 3600 }));
    expect(stale).toMatchObject({ status: 400, body: { error: { message: expect.stringContaining('stamped 3600 s ago') } } });
    const future = await deliver(signedDelivery(event(), { timestamp: nowS + 600 }));
    expect(future).toMatchObject({ status: 400, body: { error: { message: expect.stringContaining('stamped 600 s in the future') } } });
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 2 });
    // Within the tolerance either way, clocks that differ a little still agree.
    expect((await deliver(signedDelivery(event(), { timestamp: nowS + 60 }))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 7 });
  });

  it('signed events that are malformed answer 400 naming what is wrong, and are recorded once', async () => {
    const team = await subscribedTeam('hook-malformed', 2);
    const subscription = subscriptionEvent('customer.subscription.updated', team.customerId, 3, { subscription: team.subscriptionId });
    const noItems = structuredClone(subscription) as { data: { object: { items: { data: unknown[] } } } };
    noItems.data.object.items.data = [];
    const invoice = invoiceEvent('invoice.payment_failed', team.customerId) as { data: { object: Record<string, unknown> } };
    delete invoice.data.object.currency;
    const cases: [string, { payload: string; signature: string }, string][] = [
      ['not JSON', signedPayload('this is not json'), 'the body is not JSON'],
      ['no items', signedDelivery(noItems), 'data.object.items.data: has no items'],
      ['no currency', signedDelivery(invoice), 'data.object.currency'],
      ['an empty object', signedPayload('{}'), 'id'],
    ];
    for (const [label, delivery, says] of cases) {
      const answer = await deliver(delivery);
      expect(answer.status, label).toBe(400);
      expect(answer.body, label).toMatchObject({ error: { code: 'bad_input', message: expect.stringContaining(says) } });
      // Recorded under the event's id, or the payload's hash when it has none (so "{}" is recorded once, ever).
      const id = (/"id":"(evt_[^"]+)"/.exec(delivery.payload) ?? [])[1] ?? `payload:${createHash('sha256').update(delivery.payload).digest('hex').slice(0, 40)}`;
      const recorded = await BillingEvent.findOne({ where: { providerEventId: id } });
      expect(recorded, label).toMatchObject({ outcome: 'refused', reason: expect.stringContaining(says) });
      // Sent again (the service retries what it thinks failed): still 400, counted, not recorded twice.
      const rows = await BillingEvent.count();
      expect((await deliver(delivery)).status, label).toBe(400);
      expect(await BillingEvent.count(), label).toBe(rows);
    }
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 2, state: 'active' });
  });

  it('a failed payment makes the team read-only on the server; a paid invoice lifts it', async () => {
    const team = await subscribedTeam('hook-grace', 1);
    await fakeControl('invoices', { email: team.email, outcome: 'failed' }); // the service marks the subscription past due
    expect((await deliver(signedDelivery(invoiceEvent('invoice.payment_failed', team.customerId)))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ state: 'past_due' });

    const cookie = await team.cookieFor('acoustician');
    const refused = await call(createProject, 'POST', '/api/v1/projects', { cookie, body: { name: 'During grace' } });
    expect(refused.status).toBe(403);
    expect(refused.body).toMatchObject({ error: { code: 'forbidden', message: expect.stringContaining('read-only because its last payment failed') } });
    expect((await call(listProjects, 'GET', '/api/v1/projects', { cookie })).status).toBe(200);

    await fakeControl('invoices', { email: team.email, outcome: 'paid' });
    expect((await deliver(signedDelivery(invoiceEvent('invoice.paid', team.customerId)))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ state: 'active', paymentFailedAt: null });
    expect((await call(createProject, 'POST', '/api/v1/projects', { cookie, body: { name: 'After payment' } })).status).toBe(201);
    expect(await AuditEvent.count({ where: { teamId: team.team.id, action: ['billing.payment_failed', 'billing.payment_succeeded'] } })).toBe(2);
  });

  it('an event for a customer no team has is received but changes nothing', async () => {
    const event = { ...subscriptionEvent('customer.subscription.updated', 'cus_nobody', 50), id: eventId() };
    expect(await deliver(signedDelivery(event))).toMatchObject({ status: 200, body: { outcome: 'queued' } });
    expect(await BillingEvent.findOne({ where: { providerEventId: event.id } })).toMatchObject({ outcome: 'ignored', reason: 'no team has customer cus_nobody' });
  });

  it('while the payment service cannot be asked, the event waits in its job and is applied once on a later try', async () => {
    const team = await subscribedTeam('hook-away', 2);
    await setQuantity(team, 8);
    const event = subscriptionEvent('customer.subscription.updated', team.customerId, 8, { subscription: team.subscriptionId });
    // The answer does not wait for the service: the delivery is taken as received.
    expect(await deliver(signedDelivery(event), 'queue')).toMatchObject({ status: 200, body: { outcome: 'queued' } });
    const firstTry = await queuedJob(String(event.id), 0);
    serviceAway();
    await expect(applyBillingEventJob(firstTry)).rejects.toThrow(/could not be asked about subscription/);
    expect(await BillingEvent.findOne({ where: { providerEventId: String(event.id) } })).toMatchObject({ outcome: 'queued' });
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 2 });
    // Its retry (the queue waits 10 s, doubling; run here at once), then the same job again, as after a lost worker.
    const retry = { ...firstTry, retryCount: 1 };
    expect(await applyBillingEventJob(retry)).toMatchObject({ outcome: 'applied' });
    expect(await applyBillingEventJob(retry)).toMatchObject({ outcome: 'duplicate' });
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 8 });
    expect(await AuditEvent.count({ where: { teamId: team.team.id, action: 'billing.seats_changed' } })).toBe(1);
  });

  it('an event whose last try fails is recorded as failed, saying why', async () => {
    const team = await subscribedTeam('hook-gave-up', 2);
    const event = subscriptionEvent('customer.subscription.updated', team.customerId, 3, { subscription: team.subscriptionId });
    await deliver(signedDelivery(event), 'queue');
    const lastTry = await queuedJob(String(event.id), 10);
    serviceAway();
    await expect(applyBillingEventJob(lastTry)).rejects.toThrow(/could not be asked/);
    expect(await BillingEvent.findOne({ where: { providerEventId: String(event.id) } })).toMatchObject({ outcome: 'failed', reason: expect.stringMatching(/^not applied after 11 tries: The payment service could not be asked/) });
  });
});
