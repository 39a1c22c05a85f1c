// Who holds a seat: every member, and every invitation still waiting for an answer.
import { Op, type Transaction } from 'sequelize';
import { AppError } from '@/lib/errors';
import { Invitation, Membership } from '@/models';

export interface SeatUsage { members: number; pendingInvitations: number; used: number }

export async function seatUsage(teamId: string, transaction?: Transaction, now = new Date()): Promise<SeatUsage> {
  const members = await Membership.count({ where: { teamId }, transaction });
  const pendingInvitations = await Invitation.count({
    where: { teamId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
  });
  return { members, pendingInvitations, used: members + pendingInvitations };
}

export function describeUsage(usage: SeatUsage): string {
  const members = `${usage.members} member${usage.members === 1 ? '' : 's'}`;
  const pending = `${usage.pendingInvitations} pending invitation${usage.pendingInvitations === 1 ? '' : 's'}`;
  return `${members} and ${pending}`;
}

export function seatsFullError(seats: number, usage: SeatUsage): AppError {
  return new AppError(
    'conflict',
    `All ${seats} seats are taken (${describeUsage(usage)}). Buy more seats under Seats and billing, then send the invitation.`,
    { field: 'seats' },
  );
}
