// A team with a real subscription in the local payment fake, its webhooks held back (the tests
// deliver the events themselves), and the fake's test controls.
import { paymentService } from '@/lib/billing/stripe';
import { TeamBilling } from '@/models';
import { createTestTeam, type TestTeam } from './people';

export async function fakeControl(control: 'hold' | 'release' | 'invoices' | 'fail', body: Record<string, unknown>): Promise<unknown> {
  const base = process.env.PAYMENTS_FAKE_URL;
  if (!base) throw new Error('PAYMENTS_FAKE_URL is not set: run the tests with the local fakes (npm test starts them).');
  const response = await fetch(`${base}/_fake/${control}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
  if (!response.ok) throw new Error(`payment fake ${control}: ${response.status} ${await response.text()}`);
  return response.json();
}

export interface SubscribedTeam extends TestTeam { customerId: string; subscriptionId: string; itemId: string; email: string }

/** A team whose billing row names a customer and a subscription of `quantity` seats in the fake. */
export async function subscribedTeam(label: string, quantity: number, stored: { paidSeats: number } = { paidSeats: quantity }): Promise<SubscribedTeam> {
  const testTeam = await createTestTeam(label);
  const email = testTeam.members.admin.email;
  await fakeControl('hold', { email });
  const service = paymentService();
  const customer = await service.customers.create({ email, name: 'Test team', metadata: { teamId: testTeam.team.id } });
  const subscription = await service.subscriptions.create({ customer: customer.id, items: [{ price: 'price_antinode_seat_monthly', quantity }], metadata: { teamId: testTeam.team.id } });
  await TeamBilling.create({ teamId: testTeam.team.id, customerId: customer.id, subscriptionId: subscription.id, paidSeats: stored.paidSeats, state: 'active' });
  return { ...testTeam, customerId: customer.id, subscriptionId: subscription.id, itemId: subscription.items.data[0].id, email };
}

/** Changes the quantity in the fake (its webhook is held): the service's state moves on. */
export async function setQuantity(team: SubscribedTeam, quantity: number): Promise<void> {
  await paymentService().subscriptions.update(team.subscriptionId, { items: [{ id: team.itemId, quantity }] });
}
