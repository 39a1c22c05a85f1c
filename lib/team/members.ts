// Members of a team: list, change a role, remove. A team always keeps at least one admin.
// What a removed member made (projects, comments, reviews) stays, attributed to them.
import type { Transaction } from 'sequelize';
import { recordAudit, type AuditActor } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import { Membership, User } from '@/models';
import { assertId } from '@/lib/ids';

export interface MemberSummary { id: string; userId: string; name: string; email: string; role: Role; joinedAt: string }

export async function listMembers(teamId: string): Promise<MemberSummary[]> {
  const rows = await Membership.findAll({ where: { teamId }, include: [{ model: User, as: 'user' }], order: [['createdAt', 'ASC']] });
  return rows.map((row) => ({
    id: row.id, userId: row.userId, name: row.user?.name ?? '', email: row.user?.email ?? '', role: row.role, joinedAt: row.createdAt.toISOString(),
  }));
}

// Locks the team's admin rows, so two admins demoting each other cannot both succeed.
async function lockedMember(teamId: string, memberId: string, transaction: Transaction): Promise<{ member: Membership; admins: number }> {
  assertId(memberId, 'That member');
  const admins = await Membership.findAll({ where: { teamId, role: 'admin' }, transaction, lock: transaction.LOCK.UPDATE });
  const member = await Membership.findOne({ where: { id: memberId, teamId }, include: [{ model: User, as: 'user' }], transaction, lock: { level: transaction.LOCK.UPDATE, of: Membership } });
  if (!member) throw notFound('That member');
  return { member, admins: admins.length };
}

function lastAdminError(name: string, change: 'removed' | 'demoted'): AppError {
  const what = change === 'removed' ? 'cannot be removed' : 'must stay an admin';
  return new AppError('conflict', `${name} is the only admin of this team and ${what}. Make another member an admin first.`, { field: 'role' });
}

export async function changeMemberRole(teamId: string, actor: AuditActor, memberId: string, role: Role): Promise<MemberSummary> {
  return sequelize.transaction(async (transaction) => {
    const { member, admins } = await lockedMember(teamId, memberId, transaction);
    const name = member.user?.name ?? 'This member';
    if (member.role === 'admin' && role !== 'admin' && admins <= 1) throw lastAdminError(name, 'demoted');
    const before = member.role;
    if (before !== role) {
      await member.update({ role }, { transaction });
      await recordAudit({ teamId, actor, action: 'member.role_changed', subject: `${member.user?.email ?? ''}: ${ROLE_LABELS[before]} → ${ROLE_LABELS[role]}` }, transaction);
    }
    return { id: member.id, userId: member.userId, name, email: member.user?.email ?? '', role, joinedAt: member.createdAt.toISOString() };
  });
}

export async function removeMember(teamId: string, actor: AuditActor, memberId: string): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const { member, admins } = await lockedMember(teamId, memberId, transaction);
    if (member.role === 'admin' && admins <= 1) throw lastAdminError(member.user?.name ?? 'This member', 'removed');
    await member.destroy({ transaction });
    await recordAudit({ teamId, actor, action: 'member.removed', subject: `${member.user?.email ?? ''} (${ROLE_LABELS[member.role]})` }, transaction);
  });
}
