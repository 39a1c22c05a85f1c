// Webhooks from the payment service: the only thing that changes a team's paid seats and
// state. Each event must carry a valid signature and is applied at most once (its id is
// unique in billing_events); refused events are logged there with the reason.
import Stripe from 'stripe';
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { BillingEvent } from '@/models';
import { applyBillingEvent, type EventResult } from './apply-event';
import { webhookSecret } from './stripe';

export const MAX_WEBHOOK_BYTES = 256 * 1024;

async function refuse(reason: string, event: { id?: string; type?: string } = {}): Promise<never> {
  await BillingEvent.create({ providerEventId: null, type: event.type ?? null, teamId: null, outcome: 'refused', reason: reason.slice(0, 500) });
  console.warn(`[billing] webhook refused: ${reason}`);
  throw new AppError(reason.startsWith('replay') ? 'conflict' : 'bad_input', `The event was refused: ${reason}.`);
}

function verified(payload: string, signature: string | null): Stripe.Event | null {
  if (!signature) return null;
  try {
    return Stripe.webhooks.constructEvent(payload, signature, webhookSecret());
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) return null;
    throw error;
  }
}

export async function receiveWebhook(payload: string, signature: string | null): Promise<EventResult> {
  if (Buffer.byteLength(payload) > MAX_WEBHOOK_BYTES) return refuse('the body is too large');
  const event = verified(payload, signature);
  if (!event) return refuse(signature ? 'its signature did not verify (tampered, stale or signed with another secret)' : 'it has no signature');
  try {
    return await sequelize.transaction(async (transaction) => {
      const logged = await BillingEvent.create({ providerEventId: event.id, type: event.type, teamId: null, outcome: 'ignored' }, { transaction });
      const result = await applyBillingEvent(event, transaction);
      await logged.update({ teamId: result.teamId, outcome: result.outcome, reason: result.reason.slice(0, 500) }, { transaction });
      return result;
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return refuse(`replay of ${event.id}, which was already received`, event);
    throw error;
  }
}
