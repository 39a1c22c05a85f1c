// Writes one line of a team's audit log. Called inside the transaction of the change it records.
import type { Transaction } from 'sequelize';
import { AuditEvent, Membership, User } from '@/models';
import type { AuditAction } from './actions';

export interface AuditActor { id: string; name: string }

export const PAYMENT_SERVICE = 'Payment service';

export async function recordAudit(
  entry: { teamId: string; actor: AuditActor | null; action: AuditAction; subject: string },
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create(
    {
      teamId: entry.teamId,
      actorId: entry.actor?.id ?? null,
      actorName: entry.actor?.name ?? PAYMENT_SERVICE,
      action: entry.action,
      subject: entry.subject.slice(0, 500),
    },
    { transaction },
  );
}

export function auditActorOf(actor: { user: { id: string; name: string } }): AuditActor {
  return { id: actor.user.id, name: actor.user.name };
}

/** The actor for a change known only by the user's id (data functions that take a user id). */
export async function auditActorById(userId: string, transaction?: Transaction): Promise<AuditActor> {
  const user = await User.findByPk(userId, { attributes: ['id', 'name'], transaction });
  return { id: userId, name: user?.name ?? 'Unknown member' };
}

/** A sign-in, written to the log of every team the person belongs to (each team's admins see their members' sign-ins). */
export async function recordSignIn(user: { id: string; name: string }, clientAddress: string | null): Promise<void> {
  const memberships = await Membership.findAll({ where: { userId: user.id }, attributes: ['teamId'] });
  const subject = clientAddress ? `from ${clientAddress}` : 'from an unknown address';
  await Promise.all(memberships.map((membership) => recordAudit({ teamId: membership.teamId, actor: user, action: 'session.signed_in', subject })));
}
