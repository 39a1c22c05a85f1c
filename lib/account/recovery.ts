// Forgotten passwords. The request answers the same whether or not the address has an
// account; the mailed link works once, for an hour, and only its hash is stored.
import { Op } from 'sequelize';
import { hashPassword } from '@/lib/auth/password';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { passwordResetMail } from '@/lib/mail/messages';
import { sendMail } from '@/lib/mail/send';
import { appUrl, hashLinkToken, newLinkToken } from '@/lib/tokens';
import { PasswordReset, Session, User } from '@/models';

export const RESET_LINK_MINUTES = 60;
const MIN_GAP_MS = 60_000; // at most one mail a minute per account

export const RESET_REQUESTED_MESSAGE =
  'If an account uses that address, a link to choose a new password is on its way. It works once, within an hour.';

export async function requestPasswordReset(email: string, now = new Date()): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const recent = await PasswordReset.count({ where: { userId: user.id, createdAt: { [Op.gt]: new Date(now.getTime() - MIN_GAP_MS) } } });
  if (recent > 0) return;
  const { token, tokenHash } = newLinkToken();
  const expiresAt = new Date(now.getTime() + RESET_LINK_MINUTES * 60_000);
  await PasswordReset.create({ userId: user.id, tokenHash, expiresAt });
  try {
    await sendMail(passwordResetMail({ to: user.email, link: appUrl(`/reset-password?token=${encodeURIComponent(token)}`), expiresAt }));
  } catch (error) {
    console.error('[mail] password reset not sent', error); // the answer stays the same
  }
}

// Sets the new password, uses up the link (and any other open link), ends every session.
export async function resetPassword(token: string, password: string, now = new Date()): Promise<void> {
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({ where: { tokenHash: hashLinkToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!reset) throw new AppError('not_found', 'This reset link is not valid. Ask for a new one from the sign-in page.', { field: 'token' });
    if (reset.usedAt) throw new AppError('conflict', 'This reset link has already been used. Ask for a new one if you need to change the password again.', { field: 'token' });
    if (reset.expiresAt <= now) throw new AppError('conflict', 'This reset link has expired (links work for an hour). Ask for a new one.', { field: 'token' });
    await User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
    await PasswordReset.update({ usedAt: now }, { where: { userId: reset.userId, usedAt: null }, transaction });
    await Session.destroy({ where: { userId: reset.userId }, transaction });
  });
}
