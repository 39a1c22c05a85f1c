// Sign-up in two steps, so that the answer never says whether an address has an account:
// 1. The request does the same for every address (hashes the password, queues a sign-up-mail
//    job) and answers; the job worker then looks the address up: a new address gets a link to
//    confirm it; an address that already has an account gets a notice that someone tried, and no
//    second account is made.
// 2. The link (once, within 24 hours) creates the account, confirmed, with its team, and signs in.
// Sign-ups from one client address, and the mails to one recipient, have budgets
// (lib/http/rate-limit-rules.ts).
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { addressKey } from '@/lib/http/client-address';
import { consumeRateLimit, emailKey, spend } from '@/lib/http/rate-limit';
import type { JobData } from '@/lib/jobs/names';
import { followUpJobId, jobExists, sendJob } from '@/lib/jobs/queue';
import { signUpConfirmMail, signUpExistingAccountMail } from '@/lib/mail/messages';
import { queueMail } from '@/lib/mail/queue';
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

/**
 * The sign-up-mail job: spends the recipient's budget, looks the address up and queues its mail.
 * A job run twice (its worker stopped before it was marked done) queues its mail once.
 */
export async function signUpMailJob(job: { id: string; data: JobData['sign-up-mail'] }): Promise<{ outcome: string }> {
  const { email, name, teamName, passwordHash } = job.data;
  const mailJobId = followUpJobId(job.id, 'mail');
  if (await jobExists('send-mail', mailJobId)) return { outcome: 'already queued' };
  const budget = await spend('signUpMailsPerRecipient', emailKey(email));
  if (!budget.allowed) {
    console.warn('[sign-up] mail not sent: this address has had its sign-up mails for the day');
    return { outcome: 'over the recipient budget' };
  }
  const existing = await User.findOne({ where: { email } });
  if (existing) {
    await queueMail('sign-up notice', signUpExistingAccountMail({ to: existing.email, signInLink: appUrl('/sign-in'), resetLink: appUrl('/forgotten-password') }), { id: mailJobId });
    return { outcome: 'notice' };
  }
  const { token, tokenHash } = newLinkToken();
  const expiresAt = new Date(new Date(job.data.requestedAt).getTime() + SIGN_UP_LINK_HOURS * 3_600_000);
  await sequelize.transaction(async (transaction) => {
    await SignUpRequest.create({ email, name, teamName, passwordHash, tokenHash, expiresAt }, { transaction });
    await queueMail('sign-up link', signUpConfirmMail({ to: email, link: appUrl(`/sign-up/confirm?token=${encodeURIComponent(token)}`), expiresAt }), { id: mailJobId, transaction });
  });
  return { outcome: 'link' };
}

/**
 * Step 1: counts against the client's budget (429 past it), hashes the password and queues the
 * rest, the same steps for every address, then answers; the mail follows from the job worker.
 */
export async function requestSignUp(input: SignUpFields, clientAddress: string | null, now = new Date()): Promise<{ message: string }> {
  await consumeRateLimit('signUpPerAddress', addressKey(clientAddress));
  const passwordHash = await hashPassword(input.password);
  await sendJob('sign-up-mail', { name: input.name, email: input.email, teamName: input.teamName, passwordHash, requestedAt: now.toISOString() });
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
