// A team's paid seats and state are set from the subscription as the payment service holds it
// now, read while the team's billing row is locked. Webhooks only say *that* something changed:
// whatever order they arrive in, and whatever time they carry, each one re-reads the
// subscription, so the last to be applied carries the newest state. The Seats and billing page
// does the same when it opens, so a lost webhook never leaves a team stuck.
import { cache } from 'react';
import Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { TeamBilling } from '@/models';
import type { BillingState } from '@/models/team-billing';
import { paymentService } from './stripe';

const STATE_OF_STATUS: Partial<Record<string, BillingState>> = {
  active: 'active', trialing: 'active', past_due: 'past_due', unpaid: 'past_due', canceled: 'canceled', incomplete_expired: 'canceled',
};

export interface SubscriptionNow { id: string; customerId: string; status: string; quantity: number }

// A page waits for the payment service at most this long, once: past it, it shows what is stored.
const PAGE_TIMEOUT_MS = 3000;

/** The subscription as the payment service holds it now; null if it does not know it. */
export async function readSubscription(subscriptionId: string, forPage = false): Promise<SubscriptionNow | null> {
  try {
    const found = await paymentService().subscriptions.retrieve(subscriptionId, {}, forPage ? { timeout: PAGE_TIMEOUT_MS, maxNetworkRetries: 0 } : undefined);
    const customerId = typeof found.customer === 'string' ? found.customer : found.customer.id;
    return { id: found.id, customerId, status: found.status, quantity: found.items.data[0]?.quantity ?? 0 };
  } catch (error) {
    if (error instanceof Stripe.errors.StripeInvalidRequestError && error.statusCode === 404) return null;
    if (error instanceof Stripe.errors.StripeError) {
      throw new AppError('busy', `The payment service could not be asked about subscription ${subscriptionId} (${error.message}). Nothing was changed; try again later.`);
    }
    throw error;
  }
}

export interface Applied { changed: boolean; paidSeats: number; state: BillingState; reason: string }

/** Sets the locked row from the subscription; audits a change of seats and the end of a subscription. */
export async function applySubscription(row: TeamBilling, now: SubscriptionNow, transaction: Transaction, eventAt: Date | null = null): Promise<Applied> {
  if (row.customerId !== now.customerId) return { changed: false, paidSeats: row.paidSeats, state: row.state, reason: `subscription ${now.id} belongs to another customer` };
  if (row.subscriptionId && row.subscriptionId !== now.id) {
    return { changed: false, paidSeats: row.paidSeats, state: row.state, reason: `subscription ${now.id} is not the team's current one (${row.subscriptionId})` };
  }
  const state: BillingState = STATE_OF_STATUS[now.status] ?? row.state;
  const paidSeats = state === 'canceled' ? 0 : now.quantity;
  const before = { paidSeats: row.paidSeats, state: row.state };
  const lastEventAt = eventAt && (!row.lastEventAt || eventAt > row.lastEventAt) ? eventAt : row.lastEventAt;
  await row.update({
    paidSeats,
    state,
    subscriptionId: state === 'canceled' ? null : now.id,
    requestedSeats: row.requestedSeats === paidSeats ? null : row.requestedSeats,
    paymentFailedAt: state === 'past_due' ? row.paymentFailedAt ?? eventAt ?? new Date() : null,
    lastEventAt,
  }, { transaction });
  if (state === 'canceled' && before.state !== 'canceled') {
    await recordAudit({ teamId: row.teamId, actor: null, action: 'billing.subscription_ended', subject: `Subscription ${now.id}` }, transaction);
  } else if (before.paidSeats !== paidSeats) {
    await recordAudit({ teamId: row.teamId, actor: null, action: 'billing.seats_changed', subject: `${before.paidSeats} → ${paidSeats} paid seats` }, transaction);
  }
  const changed = before.paidSeats !== paidSeats || before.state !== state;
  return { changed, paidSeats, state, reason: `${paidSeats} paid seats, ${state}` };
}

/** For pages: brings the team in line with the payment service, if it can within a few seconds. */
export async function reconcileTeam(teamId: string): Promise<void> {
  const stored = await TeamBilling.findByPk(teamId, { attributes: ['subscriptionId'] });
  if (!stored?.subscriptionId) return;
  try {
    await sequelize.transaction(async (transaction) => {
      const row = await TeamBilling.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row?.subscriptionId) return;
      const now = await readSubscription(row.subscriptionId, true);
      if (now) await applySubscription(row, now, transaction);
    });
  } catch (error) {
    // The page shows what is stored; the next webhook or visit tries again.
    console.error('[billing] could not reconcile with the payment service', error instanceof Error ? error.message : error);
  }
}

/**
 * The same, at most once per page request (React's request cache): the Seats and billing page
 * calls it always; the signed-in layout calls it while the team is read-only, so a lost "paid"
 * webhook does not keep the banner up, and so the banner and the page agree.
 */
export const reconcileTeamForPage = cache(reconcileTeam);
