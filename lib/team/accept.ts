// Opening and accepting an invitation link. Accepting creates the account, or adds the team
// to an existing account once its owner proves it (signed in as that address, or password).
import type { Transaction } from 'sequelize';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { NO_CLIENT, type SignInClient } from '@/lib/auth/accounts';
import { isKnownDevice } from '@/lib/auth/known-devices';
import { assertMayTrySignIn, recordSignInFailure, recordSignInSuccess } from '@/lib/auth/throttle';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import { hashLinkToken } from '@/lib/tokens';
import { parseWith } from '@/lib/validation';
import { Invitation, Membership, Team, User } from '@/models';
import { acceptAsNewSchema, type AcceptInvitationInput } from './schemas';

export interface InvitationPreview { email: string; role: Role; teamName: string; expiresAt: string; accountExists: boolean }

function day(date: Date): string {
  return date.toISOString().slice(0, 10);
}

async function usableInvitation(token: string, now: Date, transaction?: Transaction): Promise<Invitation> {
  const row = await Invitation.findOne({
    where: { tokenHash: hashLinkToken(token) },
    include: [{ model: Team, as: 'team' }],
    transaction,
    lock: transaction ? { level: transaction.LOCK.UPDATE, of: Invitation } : undefined,
  });
  if (!row) {
    throw new AppError('not_found', 'This invitation link is not valid. A newer mail may have replaced it; ask your team admin to send it again.', { field: 'token' });
  }
  if (row.acceptedAt) throw new AppError('conflict', 'This invitation has already been used. Sign in to reach the team.', { field: 'token' });
  if (row.revokedAt) throw new AppError('conflict', 'A team admin withdrew this invitation. Ask them for a new one if you still need to join.', { field: 'token' });
  if (row.expiresAt <= now) {
    throw new AppError('conflict', `This invitation expired on ${day(row.expiresAt)}. Ask your team admin to send it again.`, { field: 'token' });
  }
  return row;
}

export async function previewInvitation(token: string, now = new Date()): Promise<InvitationPreview> {
  const row = await usableInvitation(token, now);
  const accountExists = (await User.count({ where: { email: row.email } })) > 0;
  return { email: row.email, role: row.role, teamName: row.team?.name ?? '', expiresAt: row.expiresAt.toISOString(), accountExists };
}

// The password is checked like a sign-in, with the same slowing down after failures.
async function provenExistingUser(user: User, input: AcceptInvitationInput, signedInUserId: string | null, client: SignInClient): Promise<void> {
  if (signedInUserId === user.id) return;
  if (!input.password) throw new AppError('bad_input', `You already have an account as ${user.email}: enter its password to join.`, { field: 'password' });
  const attempt = { email: user.email, address: client.address, knownDevice: await isKnownDevice(user.id, client.deviceToken) };
  await assertMayTrySignIn(attempt);
  if (!(await verifyPassword(user.passwordHash, input.password))) {
    await recordSignInFailure(attempt);
    throw new AppError('wrong_credentials', `That is not the password of ${user.email}. Forgotten it? Reset it from the sign-in page.`, { field: 'password' });
  }
  await recordSignInSuccess(attempt);
}

export async function acceptInvitation(
  input: AcceptInvitationInput, signedInUserId: string | null, client: SignInClient = NO_CLIENT, now = new Date(),
): Promise<{ userId: string; teamId: string }> {
  const invitation = await usableInvitation(input.token, now);
  const existing = await User.findOne({ where: { email: invitation.email } });
  let newAccount: { name: string; passwordHash: string } | null = null;
  if (existing) await provenExistingUser(existing, input, signedInUserId, client);
  else {
    const fields = parseWith(acceptAsNewSchema, input);
    newAccount = { name: fields.name, passwordHash: await hashPassword(fields.password) };
  }
  return sequelize.transaction(async (transaction) => {
    const row = await usableInvitation(input.token, now, transaction);
    // The link came to this address: that confirms it, for a new account and an existing one.
    const user = existing ?? (await User.create({ email: row.email, ...newAccount!, emailVerifiedAt: now }, { transaction }));
    if (!user.emailVerifiedAt) await user.update({ emailVerifiedAt: now }, { transaction });
    const already = await Membership.findOne({ where: { userId: user.id, teamId: row.teamId }, transaction });
    if (!already) await Membership.create({ userId: user.id, teamId: row.teamId, role: row.role }, { transaction });
    await row.update({ acceptedAt: now }, { transaction });
    await recordAudit({ teamId: row.teamId, actor: { id: user.id, name: user.name }, action: 'invitation.accepted', subject: `${row.email} joined as ${ROLE_LABELS[row.role]}` }, transaction);
    return { userId: user.id, teamId: row.teamId };
  });
}
