// What each kind of payment-service event does to a team's billing row.
import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { recordAudit } from '@/lib/audit/record';
import { TeamBilling } from '@/models';
import type { BillingState } from '@/models/team-billing';
import { formatMoney } from './config';

export interface EventResult { outcome: 'applied' | 'ignored'; teamId: string | null; reason: string }

const STATE_OF_STATUS: Partial<Record<Stripe.Subscription.Status, BillingState>> = {
  active: 'active', trialing: 'active', past_due: 'past_due', unpaid: 'past_due', canceled: 'canceled', incomplete_expired: 'canceled',
};

function idOf(value: string | { id: string } | null | undefined): string | null {
  return typeof value === 'string' ? value : value?.id ?? null;
}

// The team whose customer this is, locked; older events than the last applied are skipped.
async function lockedRow(event: Stripe.Event, customerId: string | null, teamHint: string | undefined, transaction: Transaction): Promise<TeamBilling | string> {
  if (!customerId) return 'the event names no customer';
  const byCustomer = await TeamBilling.findOne({ where: { customerId }, transaction });
  const teamId = byCustomer?.teamId ?? teamHint;
  const row = teamId ? await TeamBilling.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!row || row.customerId !== customerId) return `no team has customer ${customerId}`;
  const at = new Date(event.created * 1000);
  if (row.lastEventAt && at < row.lastEventAt) return 'it is older than the last event applied';
  return row;
}

async function subscriptionChanged(event: Stripe.Event, subscription: Stripe.Subscription, transaction: Transaction): Promise<EventResult> {
  const row = await lockedRow(event, idOf(subscription.customer), subscription.metadata?.teamId, transaction);
  if (typeof row === 'string') return { outcome: 'ignored', teamId: null, reason: row };
  const ended = event.type === 'customer.subscription.deleted';
  const state: BillingState = ended ? 'canceled' : STATE_OF_STATUS[subscription.status] ?? row.state;
  const paidSeats = state === 'canceled' ? 0 : subscription.items.data[0]?.quantity ?? 0;
  const before = row.paidSeats;
  await row.update({
    paidSeats,
    state,
    subscriptionId: state === 'canceled' ? null : subscription.id,
    requestedSeats: row.requestedSeats === paidSeats ? null : row.requestedSeats,
    paymentFailedAt: state === 'past_due' ? row.paymentFailedAt ?? new Date() : null,
    lastEventAt: new Date(event.created * 1000),
  }, { transaction });
  if (ended) await recordAudit({ teamId: row.teamId, actor: null, action: 'billing.subscription_ended', subject: `Subscription ${subscription.id}` }, transaction);
  else if (before !== paidSeats) await recordAudit({ teamId: row.teamId, actor: null, action: 'billing.seats_changed', subject: `${before} → ${paidSeats} paid seats` }, transaction);
  return { outcome: 'applied', teamId: row.teamId, reason: `${paidSeats} paid seats, ${state}` };
}

async function invoiceSettled(event: Stripe.Event, invoice: Stripe.Invoice, transaction: Transaction): Promise<EventResult> {
  const row = await lockedRow(event, idOf(invoice.customer), undefined, transaction);
  if (typeof row === 'string') return { outcome: 'ignored', teamId: null, reason: row };
  const failed = event.type === 'invoice.payment_failed';
  const amount = formatMoney(failed ? invoice.amount_due : invoice.amount_paid, invoice.currency.toUpperCase());
  if (failed) {
    await row.update({ state: 'past_due', paymentFailedAt: new Date(event.created * 1000), lastEventAt: new Date(event.created * 1000) }, { transaction });
  } else {
    await row.update({ state: row.state === 'past_due' ? 'active' : row.state, paymentFailedAt: null, lastEventAt: new Date(event.created * 1000) }, { transaction });
  }
  await recordAudit({
    teamId: row.teamId, actor: null, action: failed ? 'billing.payment_failed' : 'billing.payment_succeeded', subject: `Invoice ${invoice.id}, ${amount}`,
  }, transaction);
  return { outcome: 'applied', teamId: row.teamId, reason: failed ? 'payment failed: read-only' : 'paid' };
}

export async function applyBillingEvent(event: Stripe.Event, transaction: Transaction): Promise<EventResult> {
  switch (event.type) {
    case 'customer.subscription.created':
    case 'customer.subscription.updated':
    case 'customer.subscription.deleted':
      return subscriptionChanged(event, event.data.object, transaction);
    case 'invoice.paid':
    case 'invoice.payment_failed':
      return invoiceSettled(event, event.data.object, transaction);
    default:
      return { outcome: 'ignored', teamId: null, reason: `events of type ${event.type} are not used` };
  }
}
