// A team's standing: its billing row (created on first use with the included seats only),
// its seat count, and whether it is read-only because a payment failed.
import type { Transaction } from 'sequelize';
import { AppError } from '@/lib/errors';
import { TeamBilling } from '@/models';
import type { BillingState } from '@/models/team-billing';
import { billingConfig } from './config';

export interface TeamStanding {
  state: BillingState;
  includedSeats: number;
  paidSeats: number;
  seats: number;
  requestedSeats: number | null;
  hasSubscription: boolean;
  readOnly: boolean;
  paymentFailedAt: string | null;
}

export async function billingRow(teamId: string, transaction?: Transaction, lock = false): Promise<TeamBilling> {
  const [row] = await TeamBilling.findOrCreate({ where: { teamId }, defaults: { teamId }, transaction });
  if (!lock || !transaction) return row;
  return (await TeamBilling.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE }))!;
}

export function standingOf(row: TeamBilling | null): TeamStanding {
  const { includedSeats } = billingConfig();
  const paidSeats = row?.paidSeats ?? 0;
  const state = row?.state ?? 'included';
  return {
    state,
    includedSeats,
    paidSeats,
    seats: includedSeats + paidSeats,
    requestedSeats: row?.requestedSeats ?? null,
    hasSubscription: Boolean(row?.subscriptionId),
    readOnly: state === 'past_due',
    paymentFailedAt: row?.paymentFailedAt?.toISOString() ?? null,
  };
}

export async function teamStanding(teamId: string): Promise<TeamStanding> {
  return standingOf(await TeamBilling.findByPk(teamId));
}

export const READ_ONLY_MESSAGE =
  'This team is read-only because its last payment failed. Nothing is lost: a team admin can settle the payment under Team settings → Seats and billing, and editing comes back once it is paid.';

// Refuses a change while the team is in its grace period after a failed payment.
export async function assertTeamWritable(teamId: string): Promise<void> {
  const row = await TeamBilling.findByPk(teamId, { attributes: ['state'] });
  if (row?.state === 'past_due') throw new AppError('forbidden', READ_ONLY_MESSAGE);
}
