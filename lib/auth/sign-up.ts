// Sign-up in two steps, so that the answer never says whether an address has an account:
// 1. The request answers the same for every address, at once, and the rest happens after the
//    answer (lib/jobs/after-answer.ts): a new address gets a link to confirm it; an address that
//    already has an account gets a notice that someone tried, and no second account is made.
// 2. The link (once, within 24 hours) creates the account, confirmed, with its team, and signs in.
// Sign-ups from one client address, and the mails to one recipient, have budgets
// (lib/http/rate-limit-rules.ts).
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { addressKey } from '@/lib/http/client-address';
import { consumeRateLimit, emailKey, spend } from '@/lib/http/rate-limit';
import { afterAnswer } from '@/lib/jobs/after-answer';
import { signUpConfirmMail, signUpExistingAccountMail } from '@/lib/mail/messages';
import { sendMail } from '@/lib/mail/send';
import { appUrl, hashLinkToken, newLinkToken } from '@/lib/tokens';
import { SignUpRequest, User } from '@/models';
import { createAccountWithTeam, startSession, type SignedIn } from './accounts';
import { rememberDevice } from './known-devices';
import { hashPassword } from './password';
import type { SignUpInput } from './schemas';

export const SIGN_UP_LINK_HOURS = 24;

export function signUpRequestedMessage(email: string): string {
  return `Check the inbox of ${email}: a link to confirm the address and create your account is on its way. It works once, within ${SIGN_UP_LINK_HOURS} hours. Nothing after a few minutes? Check the address and the spam folder.`;
}

type SignUpFields = Required<Pick<SignUpInput, 'name' | 'email' | 'password' | 'teamName'>>;

async function mailSignUp(input: SignUpFields, now: Date): Promise<void> {
  const budget = await spend('signUpMailsPerRecipient', emailKey(input.email));
  if (!budget.allowed) {
    console.warn('[sign-up] mail not sent: this address has had its sign-up mails for the day');
    return;
  }
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    await sendMail(signUpExistingAccountMail({ to: existing.email, signInLink: appUrl('/sign-in'), resetLink: appUrl('/forgotten-password') }));
    return;
  }
  const { token, tokenHash } = newLinkToken();
  const expiresAt = new Date(now.getTime() + SIGN_UP_LINK_HOURS * 3_600_000);
  await SignUpRequest.create({ email: input.email, name: input.name, teamName: input.teamName, passwordHash: await hashPassword(input.password), tokenHash, expiresAt });
  await sendMail(signUpConfirmMail({ to: input.email, link: appUrl(`/sign-up/confirm?token=${encodeURIComponent(token)}`), expiresAt }));
}

/** Step 1: counts against the client's budget (429 past it), then answers; the mail follows. */
export async function requestSignUp(input: SignUpFields, clientAddress: string | null, now = new Date()): Promise<{ message: string }> {
  await consumeRateLimit('signUpPerAddress', addressKey(clientAddress));
  afterAnswer('sign-up mail', () => mailSignUp(input, now));
  return { message: signUpRequestedMessage(input.email) };
}

const INVALID_LINK = 'This confirmation link is not valid. Sign up again to get a new one.';

/** Step 2: the mailed link creates the account (address confirmed) and its team, and signs in. */
export async function confirmSignUp(token: string, deviceToken: string | null, now = new Date()): Promise<SignedIn> {
  const request = await sequelize.transaction(async (transaction) => {
    const row = await SignUpRequest.findOne({ where: { tokenHash: hashLinkToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new AppError('not_found', INVALID_LINK, { field: 'token' });
    if (row.usedAt) throw new AppError('conflict', 'This link has already created its account. Sign in instead.', { field: 'token' });
    if (row.expiresAt <= now) throw new AppError('conflict', `This confirmation link has expired (links work for ${SIGN_UP_LINK_HOURS} hours). Sign up again to get a new one.`, { field: 'token' });
    // Every open sign-up of this address ends with this one.
    await SignUpRequest.update({ usedAt: now }, { where: { email: row.email, usedAt: null }, transaction });
    return row;
  });
  const { user, team } = await createAccountWithTeam({
    name: request.name, email: request.email, passwordHash: request.passwordHash, teamName: request.teamName, emailVerifiedAt: now,
  });
  return { session: await startSession(user.id, team.id), device: await rememberDevice(user.id, deviceToken, now) };
}
