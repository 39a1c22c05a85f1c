// Seat changes go to the payment fake; the team's count moves only with the webhook.
import { afterAll, describe, expect, it } from 'vitest';
import { POST as webhook } from '@/app/api/v1/billing/webhook/route';
import { GET as billing } from '@/app/api/v1/team/billing/route';
import { PUT as seats } from '@/app/api/v1/team/billing/seats/route';
import { DELETE as cancel } from '@/app/api/v1/team/billing/subscription/route';
import { paymentService } from '@/lib/billing/stripe';
import { sequelize } from '@/lib/db';
import { BillingEvent, TeamBilling } from '@/models';
import { workWaitingJobs } from '../helpers/jobs';
import { createTestTeam } from '../helpers/people';
import { call } from '../helpers/routes';
import { until } from '../helpers/until';
import { signedDelivery } from '../helpers/webhooks';

afterAll(async () => { await sequelize.close(); });

// Delivers what the payment service would send about a subscription, as it is now, and works its job.
async function webhookFor(subscriptionId: string, type: string): Promise<number> {
  const subscription = await paymentService().subscriptions.retrieve(subscriptionId);
  const { payload, signature } = signedDelivery({ id: `evt_${subscriptionId}_${type}_${Date.now()}`, type, data: { object: subscription } });
  const request = new Request('http://localhost/api/v1/billing/webhook', { method: 'POST', headers: { host: 'localhost', 'stripe-signature': signature }, body: payload });
  const { status } = await webhook(request, { params: Promise.resolve({}) });
  await workWaitingJobs(['apply-billing-event']);
  // Another test file's process may have taken the job: wait until the event is applied there.
  const eventIdSent = (JSON.parse(payload) as { id: string }).id;
  await until(`event ${eventIdSent} applied`, async () => (await BillingEvent.findOne({ where: { providerEventId: eventIdSent } }))?.outcome !== 'queued', 20_000);
  return status;
}

describe('seats', () => {
  it('buying seats asks the payment service; the count changes when its webhook arrives', async () => {
    const { team, cookieFor } = await createTestTeam('buy');
    const cookie = await cookieFor('admin');
    const asked = await call(seats, 'PUT', '/api/v1/team/billing/seats', { cookie, body: { paidSeats: 4 } });
    expect(asked.status).toBe(202);
    expect(asked.body).toMatchObject({ billing: { paidSeats: 0, requestedSeats: 4, seats: 3 } });
    const row = await TeamBilling.findByPk(team.id);
    expect(row).toMatchObject({ paidSeats: 0, state: 'included' });
    expect(row!.subscriptionId).toMatch(/^sub_/);

    expect(await webhookFor(row!.subscriptionId!, 'customer.subscription.created')).toBe(200);
    const after = await call(billing, 'GET', '/api/v1/team/billing', { cookie });
    expect(after.body).toMatchObject({ billing: { paidSeats: 4, requestedSeats: null, seats: 7, state: 'active', usage: { members: 5 } } });
  });

  it('lowering below the people holding seats is refused and names the field', async () => {
    const { team, cookieFor } = await createTestTeam('lower');
    await TeamBilling.create({ teamId: team.id, paidSeats: 4, state: 'active' });
    const answer = await call(seats, 'PUT', '/api/v1/team/billing/seats', { cookie: await cookieFor('admin'), body: { paidSeats: 1 } });
    expect(answer.status).toBe(409);
    expect(answer.body).toMatchObject({ error: { field: 'paidSeats', message: expect.stringContaining('you need at least 2 paid seats') } });
    expect(await TeamBilling.findByPk(team.id)).toMatchObject({ paidSeats: 4, requestedSeats: null });
  });

  it('cancelling with more people than the included seats is refused', async () => {
    const { team, cookieFor } = await createTestTeam('cancel');
    await TeamBilling.create({ teamId: team.id, paidSeats: 2, state: 'active', customerId: `cus_c${team.id.slice(0, 8)}`, subscriptionId: `sub_c${team.id.slice(0, 8)}` });
    const answer = await call(cancel, 'DELETE', '/api/v1/team/billing/subscription', { cookie: await cookieFor('admin') });
    expect(answer.status).toBe(409);
    expect(answer.body).toMatchObject({ error: { message: expect.stringContaining('Cancelling leaves the 3 included seats, but 5 people hold seats') } });
  });

  it('a seat count that is not a whole number is refused naming the field', async () => {
    const { cookieFor } = await createTestTeam('seats-bad');
    const answer = await call(seats, 'PUT', '/api/v1/team/billing/seats', { cookie: await cookieFor('admin'), body: { paidSeats: 2.5 } });
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'paidSeats' } });
  });
});
