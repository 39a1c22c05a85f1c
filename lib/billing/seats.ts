// The admin asks the payment service for a seat count or a cancellation. Nothing here
// changes the team's paid seats or state: the payment service's webhooks do (webhooks.ts).
import { recordAudit, type AuditActor } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { describeUsage, seatUsage } from '@/lib/team/seats';
import { Team, User } from '@/models';
import type { TeamBilling } from '@/models/team-billing';
import { billingConfig } from './config';
import { billingRow } from './standing';
import { callPaymentService, paymentService } from './stripe';

async function ensureCustomer(row: TeamBilling, actor: AuditActor): Promise<string> {
  if (row.customerId) return row.customerId;
  const [team, user] = await Promise.all([Team.findByPk(row.teamId), User.findByPk(actor.id)]);
  const customer = await callPaymentService('create the customer', () =>
    paymentService().customers.create({ name: team?.name, email: user?.email, metadata: { teamId: row.teamId } }));
  return customer.id;
}

async function subscribe(row: TeamBilling, actor: AuditActor, paidSeats: number): Promise<{ customerId: string; subscriptionId: string }> {
  const customerId = await ensureCustomer(row, actor);
  const subscription = await callPaymentService('start the subscription', () =>
    paymentService().subscriptions.create({
      customer: customerId,
      items: [{ price: billingConfig().seatPriceId, quantity: paidSeats }],
      metadata: { teamId: row.teamId },
    }));
  return { customerId, subscriptionId: subscription.id };
}

async function changeQuantity(subscriptionId: string, paidSeats: number): Promise<void> {
  const service = paymentService();
  const subscription = await callPaymentService('read the subscription', () => service.subscriptions.retrieve(subscriptionId));
  const item = subscription.items.data[0];
  await callPaymentService('change the seat count', () =>
    service.subscriptions.update(subscriptionId, {
      items: [item ? { id: item.id, quantity: paidSeats } : { price: billingConfig().seatPriceId, quantity: paidSeats }],
      proration_behavior: 'create_prorations',
    }));
}

export async function requestPaidSeats(teamId: string, actor: AuditActor, paidSeats: number): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const row = await billingRow(teamId, transaction, true);
    const { includedSeats } = billingConfig();
    const usage = await seatUsage(teamId, transaction);
    if (includedSeats + paidSeats < usage.used) {
      const needed = usage.used - includedSeats;
      throw new AppError(
        'conflict',
        `${usage.used} people hold seats (${describeUsage(usage)}); with ${includedSeats} included seats you need at least ${needed} paid seat${needed === 1 ? '' : 's'}. Remove members or withdraw invitations first.`,
        { field: 'paidSeats' },
      );
    }
    if (paidSeats === row.paidSeats && row.requestedSeats === null) return;
    if (!row.subscriptionId) {
      if (paidSeats === 0) throw new AppError('bad_input', 'The team has no paid seats to release.', { field: 'paidSeats' });
      const ids = await subscribe(row, actor, paidSeats);
      await row.update({ ...ids, requestedSeats: paidSeats }, { transaction });
    } else {
      await changeQuantity(row.subscriptionId, paidSeats);
      await row.update({ requestedSeats: paidSeats }, { transaction });
    }
    await recordAudit({ teamId, actor, action: 'billing.seats_requested', subject: `${row.paidSeats} → ${paidSeats} paid seats` }, transaction);
  });
}

export async function cancelSubscription(teamId: string, actor: AuditActor): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const row = await billingRow(teamId, transaction, true);
    if (!row.subscriptionId) throw new AppError('conflict', 'This team has no subscription to cancel; it uses only its included seats.');
    const { includedSeats } = billingConfig();
    const usage = await seatUsage(teamId, transaction);
    if (usage.used > includedSeats) {
      throw new AppError(
        'conflict',
        `Cancelling leaves the ${includedSeats} included seats, but ${usage.used} people hold seats (${describeUsage(usage)}). Remove members or withdraw invitations first.`,
      );
    }
    const subscriptionId = row.subscriptionId;
    await callPaymentService('cancel the subscription', () => paymentService().subscriptions.cancel(subscriptionId));
    await row.update({ requestedSeats: 0 }, { transaction });
    await recordAudit({ teamId, actor, action: 'billing.cancel_requested', subject: `Subscription ${subscriptionId}` }, transaction);
  });
}
