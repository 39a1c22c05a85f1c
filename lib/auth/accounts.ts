// Accounts: sign-up (a new team whose first member is its admin), sign-in, sessions.
import type { Cookie } from 'lucia';
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { recordSignIn } from '@/lib/audit/record';
import { Membership, Session, Team, User } from '@/models';
import { lucia } from './lucia';
import { decoyPasswordHash, hashPassword, verifyPassword } from './password';
import type { SignUpInput } from './schemas';
import { assertNotThrottled, clearFailures, recordFailure } from './throttle';

export const WRONG_CREDENTIALS = 'The e-mail or password is wrong.';

export async function createUserWithTeam(input: { name: string; email: string; password: string; teamName: string }): Promise<{ user: User; team: Team }> {
  const passwordHash = await hashPassword(input.password);
  try {
    return await sequelize.transaction(async (transaction) => {
      const user = await User.create({ name: input.name, email: input.email, passwordHash }, { transaction });
      const team = await Team.create({ name: input.teamName }, { transaction });
      await Membership.create({ userId: user.id, teamId: team.id, role: 'admin' }, { transaction });
      return { user, team };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw new AppError('conflict', 'An account with this e-mail already exists. Sign in instead.', { field: 'email' });
    }
    throw error;
  }
}

export async function signUp(input: Required<Pick<SignUpInput, 'name' | 'email' | 'password' | 'teamName'>>): Promise<Cookie> {
  const { user, team } = await createUserWithTeam(input);
  return startSession(user.id, team.id);
}

export async function startSession(userId: string, activeTeamId: string | null): Promise<Cookie> {
  const session = await lucia.createSession(userId, { activeTeamId });
  return lucia.createSessionCookie(session.id);
}

// Checks the credentials; the same message for an unknown e-mail and a wrong password.
export async function signIn(email: string, password: string, clientAddress: string | null): Promise<Cookie> {
  const keys = { email, ip: clientAddress };
  await assertNotThrottled(keys);
  const user = await User.findOne({ where: { email } });
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyPasswordHash()), password);
  if (!user || !ok) {
    const locked = await recordFailure(keys);
    if (locked) await assertNotThrottled(keys);
    throw new AppError('wrong_credentials', WRONG_CREDENTIALS);
  }
  await clearFailures(email);
  await recordSignIn(user, clientAddress);
  const first = await Membership.findOne({ where: { userId: user.id }, order: [['createdAt', 'ASC']] });
  return startSession(user.id, first?.teamId ?? null);
}

export async function signOut(sessionId: string): Promise<Cookie> {
  await lucia.invalidateSession(sessionId);
  return lucia.createBlankSessionCookie();
}

export async function switchTeam(sessionId: string, userId: string, teamId: string): Promise<void> {
  const membership = await Membership.findOne({ where: { userId, teamId } });
  if (!membership) throw new AppError('not_found', 'You are not a member of that team.', { field: 'teamId' });
  await Session.update({ activeTeamId: teamId }, { where: { id: sessionId } });
}
