// Invitations of a team: send, list, send again, withdraw. Seat-changing steps lock the
// team's billing row so two admins cannot both take the last seat. Only an account whose own
// address is confirmed may invite. Each mail counts against the team's budget and the
// recipient's (from any team), "Send again" waits 10 minutes after each mail of an invitation
// (lib/http/rate-limit-rules.ts), and the mail is queued with the change (the send-mail job).
import { Op, type Transaction } from 'sequelize';
import { recordAudit, type AuditActor } from '@/lib/audit/record';
import { billingRow, standingOf } from '@/lib/billing/standing';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { emailKey, isSpent, spend, throttledError, type RateLimitName } from '@/lib/http/rate-limit';
import { RATE_LIMIT_RULES } from '@/lib/http/rate-limit-rules';
import { invitationMail } from '@/lib/mail/messages';
import { queueMail } from '@/lib/mail/queue';
import { ROLE_LABELS, type Role } from '@/lib/permissions';
import { appUrl, newLinkToken } from '@/lib/tokens';
import { Invitation, Membership, User } from '@/models';
import { assertId } from '@/lib/ids';
import { seatsFullError, seatUsage } from './seats';

export const INVITATION_DAYS = 7;
const DAY_MS = 86_400_000;

export interface InvitationSummary {
  id: string;
  email: string;
  role: Role;
  status: 'pending' | 'expired';
  expiresAt: string;
  sentAt: string;
}

function toSummary(row: Invitation, now = new Date()): InvitationSummary {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    status: row.expiresAt > now ? 'pending' : 'expired',
    expiresAt: row.expiresAt.toISOString(),
    sentAt: row.updatedAt.toISOString(),
  };
}

export async function listInvitations(teamId: string): Promise<InvitationSummary[]> {
  const rows = await Invitation.findAll({ where: { teamId, acceptedAt: null, revokedAt: null }, order: [['createdAt', 'DESC']] });
  return rows.map((row) => toSummary(row));
}

/** Queues the invitation's mail in the transaction that issued its link: both happen, or neither. */
async function mailInvitation(row: Invitation, token: string, transaction: Transaction): Promise<void> {
  const mail = invitationMail({ to: row.email, role: row.role, link: appUrl(`/invitation?token=${encodeURIComponent(token)}`), expiresAt: row.expiresAt });
  await queueMail('invitation', mail, { transaction });
}

export const UNCONFIRMED_INVITER =
  'Confirm your own e-mail address before inviting anyone: use the link in the mail we sent when you signed up.';

async function assertInviterConfirmed(inviter: AuditActor, transaction: Transaction): Promise<void> {
  const user = await User.findByPk(inviter.id, { attributes: ['emailVerifiedAt'], transaction });
  if (!user?.emailVerifiedAt) throw new AppError('forbidden', UNCONFIRMED_INVITER);
}

// The budgets one invitation mail counts against: checked first, all spent only when all allow it.
async function spendMailBudgets(budgets: { name: RateLimitName; key: string }[]): Promise<void> {
  for (const { name, key } of budgets) {
    const state = await isSpent(name, key);
    if (!state.allowed) throw throttledError(RATE_LIMIT_RULES[name].refusal(state.retryAfterS), state.retryAfterS);
  }
  for (const { name, key } of budgets) await spend(name, key);
}

function mailBudgets(teamId: string, email: string, invitationId: string): { name: RateLimitName; key: string }[] {
  return [
    { name: 'invitationResend', key: invitationId },
    { name: 'invitationMailsPerTeam', key: teamId },
    { name: 'invitationMailsPerRecipient', key: emailKey(email) },
  ];
}

export async function createInvitation(teamId: string, inviter: AuditActor, input: { email: string; role: Role }, now = new Date()): Promise<InvitationSummary> {
  const { token, tokenHash } = newLinkToken();
  const row = await sequelize.transaction(async (transaction) => {
    await assertInviterConfirmed(inviter, transaction);
    const billing = await billingRow(teamId, transaction, true);
    const existingUser = await User.findOne({ where: { email: input.email }, transaction });
    if (existingUser && (await Membership.count({ where: { teamId, userId: existingUser.id }, transaction }))) {
      throw new AppError('conflict', `${input.email} is already a member of this team.`, { field: 'email' });
    }
    const open = await Invitation.findOne({ where: { teamId, email: input.email, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: now } }, transaction });
    if (open) throw new AppError('conflict', `${input.email} already has a pending invitation. Use “Send again” in the list below.`, { field: 'email' });
    const { seats } = standingOf(billing);
    const usage = await seatUsage(teamId, transaction, now);
    if (usage.used >= seats) throw seatsFullError(seats, usage);
    const created = await Invitation.create(
      { teamId, email: input.email, role: input.role, tokenHash, invitedById: inviter.id, expiresAt: new Date(now.getTime() + INVITATION_DAYS * DAY_MS) },
      { transaction },
    );
    await spendMailBudgets(mailBudgets(teamId, input.email, created.id));
    await recordAudit({ teamId, actor: inviter, action: 'invitation.sent', subject: `${input.email} as ${ROLE_LABELS[input.role]}` }, transaction);
    await mailInvitation(created, token, transaction);
    return created;
  });
  return toSummary(row, now);
}

async function openInvitation(teamId: string, invitationId: string): Promise<Invitation> {
  assertId(invitationId, 'That invitation');
  const row = await Invitation.findOne({ where: { id: invitationId, teamId, acceptedAt: null, revokedAt: null } });
  if (!row) throw notFound('That invitation');
  return row;
}

// A fresh link (the old one stops working) and seven more days.
export async function resendInvitation(teamId: string, inviter: AuditActor, invitationId: string, now = new Date()): Promise<InvitationSummary> {
  assertId(invitationId, 'That invitation');
  const { token, tokenHash } = newLinkToken();
  const row = await sequelize.transaction(async (transaction) => {
    await assertInviterConfirmed(inviter, transaction);
    const billing = await billingRow(teamId, transaction, true);
    const found = await Invitation.findOne({ where: { id: invitationId, teamId, acceptedAt: null, revokedAt: null }, transaction, lock: transaction.LOCK.UPDATE });
    if (!found) throw notFound('That invitation');
    if (found.expiresAt <= now) {
      const { seats } = standingOf(billing);
      const usage = await seatUsage(teamId, transaction, now);
      if (usage.used >= seats) throw seatsFullError(seats, usage);
    }
    await spendMailBudgets(mailBudgets(teamId, found.email, found.id));
    await found.update({ tokenHash, expiresAt: new Date(now.getTime() + INVITATION_DAYS * DAY_MS) }, { transaction });
    await recordAudit({ teamId, actor: inviter, action: 'invitation.resent', subject: found.email }, transaction);
    await mailInvitation(found, token, transaction);
    return found;
  });
  return toSummary(row, now);
}

export async function revokeInvitation(teamId: string, actor: AuditActor, invitationId: string): Promise<void> {
  const row = await openInvitation(teamId, invitationId);
  await sequelize.transaction(async (transaction) => {
    await row.update({ revokedAt: new Date() }, { transaction });
    await recordAudit({ teamId, actor, action: 'invitation.revoked', subject: row.email }, transaction);
  });
}
