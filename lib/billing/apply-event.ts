// What an event from the payment service does to a team: it names the customer and the
// subscription, and the team is then set from the subscription as the service holds it now
// (reconcile.ts), so events that arrive out of order, or carry the same second, still end on
// the newest state. Invoice events also go into the audit log.
import type { Transaction } from 'sequelize';
import { recordAudit } from '@/lib/audit/record';
import { TeamBilling } from '@/models';
import { formatMoney } from './config';
import type { BillingEventIn, InvoiceEvent, SubscriptionEvent } from './event-shape';
import { applySubscription, readSubscription } from './reconcile';

export interface EventResult { outcome: 'applied' | 'ignored' | 'duplicate'; teamId: string | null; reason: string }

// The team whose customer this is, locked. A subscription just asked for may name its team in
// metadata before the team's row has committed its customer id: the lock waits for that commit.
async function lockedRow(customerId: string, teamHint: string | undefined, transaction: Transaction): Promise<TeamBilling | string> {
  const byCustomer = await TeamBilling.findOne({ where: { customerId }, attributes: ['teamId'], transaction });
  const teamId = byCustomer?.teamId ?? teamHint;
  const row = teamId ? await TeamBilling.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!row || row.customerId !== customerId) return `no team has customer ${customerId}`;
  return row;
}

async function subscriptionChanged(event: SubscriptionEvent, transaction: Transaction): Promise<EventResult> {
  const teamHint = event.object.metadata?.teamId;
  const row = await lockedRow(event.object.customer, typeof teamHint === 'string' ? teamHint : undefined, transaction);
  if (typeof row === 'string') return { outcome: 'ignored', teamId: null, reason: row };
  const now = await readSubscription(event.object.id);
  if (!now) return { outcome: 'ignored', teamId: row.teamId, reason: `the payment service does not know subscription ${event.object.id}` };
  const applied = await applySubscription(row, now, transaction, new Date(event.created * 1000));
  return { outcome: 'applied', teamId: row.teamId, reason: applied.reason };
}

async function invoiceSettled(event: InvoiceEvent, transaction: Transaction): Promise<EventResult> {
  const invoice = event.object;
  const row = await lockedRow(invoice.customer, undefined, transaction);
  if (typeof row === 'string') return { outcome: 'ignored', teamId: null, reason: row };
  const failed = event.type === 'invoice.payment_failed';
  const amount = formatMoney(failed ? invoice.amount_due : invoice.amount_paid, invoice.currency.toUpperCase());
  await recordAudit({
    teamId: row.teamId, actor: null, action: failed ? 'billing.payment_failed' : 'billing.payment_succeeded', subject: `Invoice ${invoice.id}, ${amount}`,
  }, transaction);
  if (!row.subscriptionId) return { outcome: 'applied', teamId: row.teamId, reason: failed ? 'payment failed; the team has no subscription' : 'paid; the team has no subscription' };
  const now = await readSubscription(row.subscriptionId);
  if (!now) return { outcome: 'ignored', teamId: row.teamId, reason: `the payment service does not know subscription ${row.subscriptionId}` };
  const applied = await applySubscription(row, now, transaction, new Date(event.created * 1000));
  return { outcome: 'applied', teamId: row.teamId, reason: `${failed ? 'payment failed' : 'paid'}: ${applied.reason}` };
}

export async function applyBillingEvent(event: BillingEventIn, transaction: Transaction): Promise<EventResult> {
  switch (event.kind) {
    case 'subscription': return subscriptionChanged(event, transaction);
    case 'invoice': return invoiceSettled(event, transaction);
    default: return { outcome: 'ignored', teamId: null, reason: `events of type ${event.type} are not used` };
  }
}
