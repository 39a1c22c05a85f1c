// Who in a team receives a notification: members with a given permission, or named people.
import { can, type Action } from '@/lib/permissions';
import { Membership, User } from '@/models';

export interface Recipient { id: string; email: string; name: string }

export async function membersWhoMay(teamId: string, action: Action, exceptUserId: string): Promise<Recipient[]> {
  const rows = await Membership.findAll({ where: { teamId }, include: [{ model: User, as: 'user' }] });
  return rows
    .filter((row) => row.user && row.userId !== exceptUserId && can(row.role, action))
    .map((row) => ({ id: row.userId, email: row.user!.email, name: row.user!.name }));
}

export async function teamMembers(teamId: string): Promise<Recipient[]> {
  const rows = await Membership.findAll({ where: { teamId }, include: [{ model: User, as: 'user' }] });
  return rows.filter((row) => row.user).map((row) => ({ id: row.userId, email: row.user!.email, name: row.user!.name }));
}

export async function userById(userId: string | null): Promise<Recipient | null> {
  if (!userId) return null;
  const user = await User.findByPk(userId);
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}
