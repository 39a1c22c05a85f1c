import { afterAll, describe, expect, it } from 'vitest';
import { POST as webhook } from '@/app/api/v1/billing/webhook/route';
import { GET as listProjects, POST as createProject } from '@/app/api/v1/projects/route';
import { sequelize } from '@/lib/db';
import { AuditEvent, BillingEvent, TeamBilling } from '@/models';
import { createTestTeam } from '../helpers/people';
import { call } from '../helpers/routes';
import { invoiceEvent, signedDelivery, subscriptionEvent } from '../helpers/webhooks';

afterAll(async () => { await sequelize.close(); });

async function deliver(delivery: { payload: string; signature: string }): Promise<{ status: number; body: unknown }> {
  const request = new Request('http://localhost/api/v1/billing/webhook', {
    method: 'POST', headers: { host: 'localhost', 'content-type': 'application/json', 'stripe-signature': delivery.signature }, body: delivery.payload,
  });
  const response = await webhook(request, { params: Promise.resolve({}) });
  return { status: response.status, body: await response.json() };
}

async function billedTeam(label: string) {
  const testTeam = await createTestTeam(label);
  const customerId = `cus_${testTeam.team.id.replace(/-/g, '')}`;
  await TeamBilling.create({ teamId: testTeam.team.id, customerId, subscriptionId: `sub_${customerId}`, paidSeats: 2, state: 'active' });
  return { ...testTeam, customerId };
}

describe('payment webhooks', () => {
  it('a signed event changes the paid seats, and only then', async () => {
    const { team, customerId } = await billedTeam('hook-ok');
    const answer = await deliver(signedDelivery(subscriptionEvent('customer.subscription.updated', customerId, 6)));
    expect(answer).toMatchObject({ status: 200, body: { outcome: 'applied' } });
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ paidSeats: 6, state: 'active' });
    expect(await AuditEvent.findOne({ where: { teamId: team.id, action: 'billing.seats_changed' } })).toMatchObject({ actorName: 'Payment service', subject: '2 → 6 paid seats' });
  });

  it('a tampered event is refused and logged', async () => {
    const { team, customerId } = await billedTeam('hook-tampered');
    const event = subscriptionEvent('customer.subscription.updated', customerId, 3);
    const genuine = signedDelivery(event);
    const tampered = { payload: genuine.payload.replace('"quantity":3', '"quantity":300'), signature: genuine.signature };
    const answer = await deliver(tampered);
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', message: expect.stringContaining('signature did not verify') } });
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ paidSeats: 2 });
    const logged = await BillingEvent.findAll({ where: { outcome: 'refused', providerEventId: null }, order: [['createdAt', 'DESC']], limit: 1 });
    expect(logged[0]?.reason).toContain('signature did not verify');
  });

  it('an event signed with another secret is refused', async () => {
    const { team, customerId } = await billedTeam('hook-secret');
    const answer = await deliver(signedDelivery(subscriptionEvent('customer.subscription.updated', customerId, 9), { secret: 'whsec_someone_else' }));
    expect(answer.status).toBe(400);
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ paidSeats: 2 });
  });

  it('a replayed event is refused and logged, whether resent as is or re-signed later', async () => {
    const { team, customerId } = await billedTeam('hook-replay');
    const event = subscriptionEvent('customer.subscription.updated', customerId, 4);
    const delivery = signedDelivery(event);
    expect((await deliver(delivery)).status).toBe(200);
    await TeamBilling.update({ paidSeats: 2 }, { where: { teamId: team.id } });

    const again = await deliver(delivery);
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({ error: { code: 'conflict', message: expect.stringContaining(`replay of ${String(event.id)}`) } });
    const resigned = await deliver(signedDelivery(event));
    expect(resigned.status).toBe(409);
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ paidSeats: 2 });
    expect(await BillingEvent.count({ where: { providerEventId: String(event.id) } })).toBe(1);
    expect(await BillingEvent.count({ where: { outcome: 'refused', reason: `replay of ${String(event.id)}, which was already received` } })).toBe(2);
  });

  it('an old signature (outside the tolerance) is refused', async () => {
    const { customerId } = await billedTeam('hook-stale');
    const stale = signedDelivery(subscriptionEvent('customer.subscription.updated', customerId, 5), { timestamp: Math.floor(Date.now() / 1000) - 3600 });
    expect((await deliver(stale)).status).toBe(400);
  });

  it('a failed payment makes the team read-only on the server; a paid invoice lifts it', async () => {
    const { team, customerId, cookieFor } = await billedTeam('hook-grace');
    expect((await deliver(signedDelivery(invoiceEvent('invoice.payment_failed', customerId)))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ state: 'past_due' });

    const cookie = await cookieFor('acoustician');
    const refused = await call(createProject, 'POST', '/api/v1/projects', { cookie, body: { name: 'During grace' } });
    expect(refused.status).toBe(403);
    expect(refused.body).toMatchObject({ error: { code: 'forbidden', message: expect.stringContaining('read-only because its last payment failed') } });
    expect((await call(listProjects, 'GET', '/api/v1/projects', { cookie })).status).toBe(200);

    expect((await deliver(signedDelivery(invoiceEvent('invoice.paid', customerId)))).status).toBe(200);
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ state: 'active', paymentFailedAt: null });
    expect((await call(createProject, 'POST', '/api/v1/projects', { cookie, body: { name: 'After payment' } })).status).toBe(201);
  });

  it('an event for a customer no team has is received but changes nothing', async () => {
    const answer = await deliver(signedDelivery(subscriptionEvent('customer.subscription.updated', 'cus_nobody', 50)));
    expect(answer).toMatchObject({ status: 200, body: { outcome: 'ignored' } });
  });
});
