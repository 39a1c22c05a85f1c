// Accounts: sign-in, sessions, and the team a new account starts with. Sign-up itself (asked
// for, confirmed from the mailed link) is in sign-up.ts.
import type { Cookie } from 'lucia';
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { recordSignIn } from '@/lib/audit/record';
import { Membership, Session, Team, User } from '@/models';
import { isKnownDevice, rememberDevice, type PlainCookie } from './known-devices';
import { lucia } from './lucia';
import { decoyPasswordHash, hashPassword, verifyPassword } from './password';
import { assertMayTrySignIn, recordSignInFailure, recordSignInSuccess } from './throttle';

export const WRONG_CREDENTIALS = 'The e-mail or password is wrong.';

export interface NewAccount { name: string; email: string; passwordHash: string; teamName: string; emailVerifiedAt: Date | null }

/** The account and its team, whose first member is its admin. */
export async function createAccountWithTeam(input: NewAccount): Promise<{ user: User; team: Team }> {
  try {
    return await sequelize.transaction(async (transaction) => {
      const user = await User.create({ name: input.name, email: input.email, passwordHash: input.passwordHash, emailVerifiedAt: input.emailVerifiedAt }, { transaction });
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

/** The same with a password in the clear (seeding, tests); the address counts as confirmed unless told otherwise. */
export async function createUserWithTeam(input: { name: string; email: string; password: string; teamName: string; emailVerifiedAt?: Date | null }): Promise<{ user: User; team: Team }> {
  return createAccountWithTeam({ ...input, passwordHash: await hashPassword(input.password), emailVerifiedAt: input.emailVerifiedAt === undefined ? new Date() : input.emailVerifiedAt });
}

export async function startSession(userId: string, activeTeamId: string | null): Promise<Cookie> {
  const session = await lucia.createSession(userId, { activeTeamId });
  return lucia.createSessionCookie(session.id);
}

/** Where a sign-in comes from: the client's address and the browser's device token, if any. */
export interface SignInClient { address: string | null; deviceToken: string | null }
export const NO_CLIENT: SignInClient = { address: null, deviceToken: null };

export interface SignedIn { session: Cookie; device: PlainCookie }

// Checks the credentials; the same message for an unknown e-mail and a wrong password, and the
// same slowing down after failures for both (throttle.ts).
export async function signIn(email: string, password: string, client: SignInClient = NO_CLIENT): Promise<SignedIn> {
  const user = await User.findOne({ where: { email } });
  const attempt = { email, address: client.address, knownDevice: await isKnownDevice(user?.id ?? null, client.deviceToken) };
  await assertMayTrySignIn(attempt);
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyPasswordHash()), password);
  if (!user || !ok) {
    await recordSignInFailure(attempt);
    throw new AppError('wrong_credentials', WRONG_CREDENTIALS);
  }
  await recordSignInSuccess(attempt);
  await recordSignIn(user, client.address);
  const first = await Membership.findOne({ where: { userId: user.id }, order: [['createdAt', 'ASC']] });
  return { session: await startSession(user.id, first?.teamId ?? null), device: await rememberDevice(user.id, client.deviceToken) };
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
