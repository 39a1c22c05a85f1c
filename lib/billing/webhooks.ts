// Webhooks from the payment service: the signal that a team's paid seats or state may have
// changed. A delivery is checked in this order, and each refusal says why:
//   size, then signature: no signature, a wrong one, or a stamp more than TOLERANCE_S away from
//     now in either direction → 400, counted per kind and hour (refusals.ts), no row each;
//   shape: a signed event that is not JSON or lacks what its type needs → 400, recorded once in
//     billing_events under its id (or the payload's hash), since only the service can sign it;
//   its id: an event already received → 200 "duplicate", nothing applied twice;
// then it is recorded as "queued" together with its apply-billing-event job, in one transaction,
// and answered 200 at once; the job worker applies it by re-reading the subscription from the
// service (apply-event-job.ts), trying again with backoff while the service cannot be asked.
import { createHash } from 'node:crypto';
import Stripe from 'stripe';
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendJob } from '@/lib/jobs/queue';
import { BillingEvent } from '@/models';
import { parseEvent } from './event-shape';
import { countRefusal, type RefusalKind } from './refusals';
import { webhookSecret } from './stripe';

export const MAX_WEBHOOK_BYTES = 256 * 1024;
export const TOLERANCE_S = 300;

async function refuseUnverified(kind: RefusalKind, reason: string): Promise<never> {
  await countRefusal(kind, reason);
  throw new AppError('bad_input', `The event was refused: ${reason}.`);
}

function signedAt(header: string): number | null {
  const stamp = header.split(',').map((part) => part.trim().split('=')).find(([key]) => key === 't')?.[1];
  const seconds = Number(stamp);
  return stamp && Number.isInteger(seconds) ? seconds : null;
}

async function verify(payload: string, signature: string | null, nowS: number): Promise<void> {
  if (Buffer.byteLength(payload) > MAX_WEBHOOK_BYTES) return refuseUnverified('too_large', 'the body is too large');
  if (!signature) return refuseUnverified('unsigned', 'it has no signature');
  const at = signedAt(signature);
  if (at !== null && at > nowS + TOLERANCE_S) return refuseUnverified('future', `its signature is stamped ${at - nowS} s in the future (tolerance ${TOLERANCE_S} s)`);
  if (at !== null && at < nowS - TOLERANCE_S) return refuseUnverified('stale', `its signature is stamped ${nowS - at} s ago (tolerance ${TOLERANCE_S} s)`);
  try {
    Stripe.webhooks.constructEvent(payload, signature, webhookSecret(), TOLERANCE_S);
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) {
      return refuseUnverified('bad_signature', 'its signature did not verify (tampered, or signed with another secret)');
    }
    if (error instanceof SyntaxError) return; // signed, but not JSON: parseEvent says so
    throw error;
  }
}

// A signed event we cannot use: recorded once (a repeat is counted instead), then 400.
async function refuseMalformed(payload: string, reason: string, id: string | null, type: string | null): Promise<never> {
  const key = id ?? `payload:${createHash('sha256').update(payload).digest('hex').slice(0, 40)}`;
  try {
    await BillingEvent.create({ providerEventId: key, type, teamId: null, outcome: 'refused', reason: `malformed: ${reason}`.slice(0, 500) });
    console.warn(`[billing] signed webhook ${key} refused: ${reason}`);
  } catch (error) {
    if (!(error instanceof UniqueConstraintError)) throw error;
    await countRefusal('repeated_malformed', `${key}: ${reason}`);
  }
  throw new AppError('bad_input', `The event was refused: ${reason}.`);
}

export interface WebhookReceipt { outcome: 'queued' | 'duplicate'; reason: string }

export async function receiveWebhook(payload: string, signature: string | null, now = new Date()): Promise<WebhookReceipt> {
  await verify(payload, signature, Math.floor(now.getTime() / 1000));
  const parsed = parseEvent(payload);
  if (!parsed.ok) return refuseMalformed(payload, parsed.reason, parsed.id, parsed.type);
  const { event } = parsed;
  try {
    await sequelize.transaction(async (transaction) => {
      const logged = await BillingEvent.create({ providerEventId: event.id, type: event.type, teamId: null, outcome: 'queued' }, { transaction });
      await sendJob('apply-billing-event', { billingEventId: logged.id, event }, { transaction });
    });
    return { outcome: 'queued', reason: `${event.id} will be applied by the job worker` };
  } catch (error) {
    if (error instanceof UniqueConstraintError) return { outcome: 'duplicate', reason: `${event.id} was already received` };
    throw error;
  }
}
