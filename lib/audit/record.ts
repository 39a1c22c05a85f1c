// Writes one line of a team's audit log. Called inside the transaction of the change it records.
import type { Transaction } from 'sequelize';
import { AuditEvent } from '@/models';
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
