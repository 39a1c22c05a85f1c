// Changes from the account page; each asks for the current password first. Wrong current
// passwords are budgeted per session and per account (lib/http/rate-limit-rules.ts), so a
// session someone else got hold of cannot be used to guess the password: past either budget
// the check is refused (429) for every password, the right one included, until it comes back.
import { Op, UniqueConstraintError } from 'sequelize';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { sequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { isSpent, spend, throttledError } from '@/lib/http/rate-limit';
import { RATE_LIMIT_RULES } from '@/lib/http/rate-limit-rules';
import { emailChangedMail } from '@/lib/mail/messages';
import { queueMail } from '@/lib/mail/queue';
import { appUrl } from '@/lib/tokens';
import { PasswordReset, Session, User } from '@/models';

const BUDGETS = [
  { name: 'currentPasswordPerSession', keyOf: (userId: string, sessionId: string) => sessionId },
  { name: 'currentPasswordPerAccount', keyOf: (userId: string) => userId },
] as const;

async function assertMayCheck(userId: string, sessionId: string): Promise<void> {
  for (const budget of BUDGETS) {
    const state = await isSpent(budget.name, budget.keyOf(userId, sessionId));
    if (!state.allowed) throw throttledError(RATE_LIMIT_RULES[budget.name].refusal(state.retryAfterS), state.retryAfterS, 'currentPassword');
  }
}

async function provenUser(userId: string, sessionId: string, currentPassword: string): Promise<User> {
  await assertMayCheck(userId, sessionId);
  const user = await User.findByPk(userId);
  if (!user) throw new AppError('not_signed_in', 'Your session has ended. Sign in again.');
  if (!(await verifyPassword(user.passwordHash, currentPassword))) {
    for (const budget of BUDGETS) await spend(budget.name, budget.keyOf(userId, sessionId));
    throw new AppError('wrong_credentials', 'The current password is wrong. Nothing was changed.', { field: 'currentPassword' });
  }
  return user;
}

// New password; every other session of the account ends, this one stays.
export async function changePassword(userId: string, sessionId: string, currentPassword: string, newPassword: string): Promise<void> {
  const user = await provenUser(userId, sessionId, currentPassword);
  const passwordHash = await hashPassword(newPassword);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await Session.destroy({ where: { userId, id: { [Op.ne]: sessionId } }, transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId, usedAt: null }, transaction });
  });
}

export async function changeEmail(userId: string, sessionId: string, currentPassword: string, email: string): Promise<string> {
  const user = await provenUser(userId, sessionId, currentPassword);
  if (user.email === email) throw new AppError('bad_input', 'That is already your e-mail address.', { field: 'email' });
  const previous = user.email;
  try {
    await user.update({ email });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new AppError('conflict', 'Another account already uses that e-mail address.', { field: 'email' });
    throw error;
  }
  // Tell the old address, so a change nobody asked for does not go unnoticed.
  await queueMail('e-mail change notice', emailChangedMail({ to: previous, newEmail: email, link: appUrl('/forgotten-password') })).catch((error: unknown) => {
    console.error('[mail] e-mail change notice not queued', error);
  });
  return email;
}
