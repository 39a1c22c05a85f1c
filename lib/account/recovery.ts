// Forgotten passwords. The request answers the same whether or not the address has an
// account, at once: it only queues a password-reset-mail job; looking the address up and sending
// the mail are the job worker's (lib/jobs/), so neither shows in how long the request takes. The mailed link works once,
// for an hour, and only its hash is stored. Requests from one client address, and mails to one
// account, have budgets (lib/http/rate-limit-rules.ts).
import { Op } from 'sequelize';
import { rememberDevice, type PlainCookie } from '@/lib/auth/known-devices';
import { hashPassword } from '@/lib/auth/password';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { addressKey } from '@/lib/http/client-address';
import { consumeRateLimit, spend } from '@/lib/http/rate-limit';
import type { JobData } from '@/lib/jobs/names';
import { followUpJobId, jobExists, sendJob } from '@/lib/jobs/queue';
import { passwordResetMail } from '@/lib/mail/messages';
import { queueMail } from '@/lib/mail/queue';
import { appUrl, hashLinkToken, newLinkToken } from '@/lib/tokens';
import { PasswordReset, Session, User } from '@/models';

export const RESET_LINK_MINUTES = 60;
const MIN_GAP_MS = 60_000; // at most one mail a minute per account

export const RESET_REQUESTED_MESSAGE =
  'If an account uses that address, a link to choose a new password is on its way. It works once, within an hour.';

/**
 * The password-reset-mail job: for an address with an account, within its budgets, a new link and
 * its mail, queued together. A job run twice queues its mail once.
 */
export async function passwordResetMailJob(job: { id: string; data: JobData['password-reset-mail'] }): Promise<{ outcome: string }> {
  const now = new Date(job.data.requestedAt);
  const mailJobId = followUpJobId(job.id, 'mail');
  if (await jobExists('send-mail', mailJobId)) return { outcome: 'already queued' };
  const user = await User.findOne({ where: { email: job.data.email } });
  if (!user) return { outcome: 'no account' };
  const recent = await PasswordReset.count({ where: { userId: user.id, createdAt: { [Op.gt]: new Date(now.getTime() - MIN_GAP_MS) } } });
  if (recent > 0) return { outcome: 'a link went less than a minute ago' };
  if (!(await spend('resetMailsPerAccount', user.id)).allowed) {
    console.warn('[mail] password reset not sent: the account has had its reset mails for the day');
    return { outcome: 'over the account budget' };
  }
  const { token, tokenHash } = newLinkToken();
  const expiresAt = new Date(now.getTime() + RESET_LINK_MINUTES * 60_000);
  await sequelize.transaction(async (transaction) => {
    await PasswordReset.create({ userId: user.id, tokenHash, expiresAt }, { transaction });
    await queueMail('password reset link', passwordResetMail({ to: user.email, link: appUrl(`/reset-password?token=${encodeURIComponent(token)}`), expiresAt }), { id: mailJobId, transaction });
  });
  return { outcome: 'link' };
}

/** Counts against the client's budget (429 past it, the same for every address), queues the lookup, answers. */
export async function requestPasswordReset(email: string, clientAddress: string | null, now = new Date()): Promise<void> {
  await consumeRateLimit('resetPerAddress', addressKey(clientAddress));
  await sendJob('password-reset-mail', { email, requestedAt: now.toISOString() });
}

// Sets the new password, uses up the link (and any other open link), ends every session. The
// browser that used the link proved it reads the account's mail: it is remembered as a known
// device (lib/auth/known-devices.ts), so others' failed sign-ins do not hold it back.
export async function resetPassword(token: string, password: string, deviceToken: string | null = null, now = new Date()): Promise<PlainCookie> {
  const passwordHash = await hashPassword(password);
  const userId = await sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({ where: { tokenHash: hashLinkToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!reset) throw new AppError('not_found', 'This reset link is not valid. Ask for a new one from the sign-in page.', { field: 'token' });
    if (reset.usedAt) throw new AppError('conflict', 'This reset link has already been used. Ask for a new one if you need to change the password again.', { field: 'token' });
    if (reset.expiresAt <= now) throw new AppError('conflict', 'This reset link has expired (links work for an hour). Ask for a new one.', { field: 'token' });
    await User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
    await PasswordReset.update({ usedAt: now }, { where: { userId: reset.userId, usedAt: null }, transaction });
    await Session.destroy({ where: { userId: reset.userId }, transaction });
    return reset.userId;
  });
  return rememberDevice(userId, deviceToken, now);
}
