// Personal API tokens: a script sends `Authorization: Bearer <token>` and acts as its person in one
// team, with a role no higher than theirs (its permissions a subset of theirs, checked again on every
// use), until it expires or is revoked. The token is shown once; only its SHA-256 hash is stored
// (high-entropy random tokens need no slow hash; common practice, no source).
import { randomBytes, randomUUID } from 'node:crypto';
import { z } from 'zod';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { PERMISSIONS, ROLE_LABELS, ROLES, type Role } from '@/lib/permissions';
import { text } from '@/lib/text';
import { hashLinkToken } from '@/lib/tokens';
import { ApiToken, Membership, Team, User } from '@/models';
import type { Actor, TeamMembership } from './actor';

const TOKEN_PREFIX = 'ant_';
const SHOWN_PREFIX_LENGTH = 10;
/** Tokens live at most a year; a person may hold this many live ones (product rules). */
export const MAX_TOKEN_DAYS = 365;
export const MAX_LIVE_TOKENS = 20;
/** lastUsedAt is written at most this often per token, so every request does not write. */
const LAST_USED_RESOLUTION_MS = 60_000;
const DAY_MS = 86_400_000;

export const createTokenSchema = z.object({
  name: text({ error: 'must be text' }).trim().min(1, 'give the token a name').max(80, 'must be at most 80 characters'),
  teamId: z.uuid({ error: 'must be a team id' }),
  role: z.enum(ROLES, { error: `must be one of ${ROLES.join(', ')}` }),
  expiresInDays: z.number({ error: 'must be a number of days' }).int('must be a whole number of days').min(1, 'must be at least 1 day').max(MAX_TOKEN_DAYS, `must be at most ${MAX_TOKEN_DAYS} days`),
}).strict();
export type CreateTokenInput = z.infer<typeof createTokenSchema>;

export interface TokenView {
  id: string;
  name: string;
  teamId: string;
  teamName: string;
  role: Role;
  prefix: string;
  expiresAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
  createdAt: string;
}

/** Whether a token of role `asked` may be given by a member of role `own`: every permission of one is the other's. */
export function roleWithin(asked: Role, own: Role): boolean {
  return [...PERMISSIONS[asked]].every((action) => PERMISSIONS[own].has(action));
}

function view(token: ApiToken & { team?: Team | null }): TokenView {
  return {
    id: token.id, name: token.name, teamId: token.teamId, teamName: token.team?.name ?? '', role: token.role, prefix: token.prefix,
    expiresAt: token.expiresAt.toISOString(), lastUsedAt: token.lastUsedAt?.toISOString() ?? null,
    revokedAt: token.revokedAt?.toISOString() ?? null, createdAt: token.createdAt.toISOString(),
  };
}

export async function listTokens(userId: string): Promise<TokenView[]> {
  const rows = await ApiToken.findAll({ where: { userId }, include: [{ model: Team, as: 'team' }], order: [['createdAt', 'DESC']] });
  return rows.map(view);
}

/** Creates a token; the answer holds the token itself, which is never shown again. */
export async function createToken(actor: Actor, input: CreateTokenInput, now = new Date()): Promise<{ token: string; record: TokenView }> {
  const membership = actor.memberships.find((candidate) => candidate.teamId === input.teamId);
  if (!membership) throw new AppError('bad_input', 'You are not a member of that team.', { field: 'teamId' });
  if (!roleWithin(input.role, membership.role)) {
    throw new AppError('bad_input', `A token may not do more than you: as ${ROLE_LABELS[membership.role]} in ${membership.teamName} you may give it ${ROLES.filter((role) => roleWithin(role, membership.role)).map((role) => ROLE_LABELS[role]).join(', ')}.`, { field: 'role' });
  }
  const live = await ApiToken.count({ where: { userId: actor.user.id, revokedAt: null } });
  if (live >= MAX_LIVE_TOKENS) throw new AppError('conflict', `You hold ${MAX_LIVE_TOKENS} tokens already; revoke one you no longer use first.`);
  const token = `${TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`;
  const record = await sequelize.transaction(async (transaction) => {
    const created = await ApiToken.create({
      id: randomUUID(), userId: actor.user.id, teamId: input.teamId, name: input.name, role: input.role, tokenHash: hashLinkToken(token),
      prefix: token.slice(0, SHOWN_PREFIX_LENGTH), expiresAt: new Date(now.getTime() + input.expiresInDays * DAY_MS), lastUsedAt: null, revokedAt: null, createdAt: now,
    }, { transaction });
    await recordAudit({ teamId: input.teamId, actor: { id: actor.user.id, name: actor.user.name }, action: 'token.created', subject: `"${input.name}" (${ROLE_LABELS[input.role]}, ${input.expiresInDays} days)` }, transaction);
    return created;
  });
  return { token, record: view(Object.assign(record, { team: { name: membership.teamName } as Team })) };
}

export async function revokeToken(actor: Actor, tokenId: string, now = new Date()): Promise<TokenView> {
  const token = await ApiToken.findOne({ where: { id: tokenId, userId: actor.user.id }, include: [{ model: Team, as: 'team' }] });
  if (!token) throw notFound('That token');
  if (!token.revokedAt) {
    await sequelize.transaction(async (transaction) => {
      await token.update({ revokedAt: now }, { transaction });
      await recordAudit({ teamId: token.teamId, actor: { id: actor.user.id, name: actor.user.name }, action: 'token.revoked', subject: `"${token.name}"` }, transaction);
    });
  }
  return view(token);
}

const refused = (message: string) => new AppError('not_signed_in', message);

/** The person a bearer token acts as, in its team and role; a 401 that says why for any token that may not act. */
export async function actorFromBearer(token: string, now = new Date()): Promise<Actor> {
  if (!token.startsWith(TOKEN_PREFIX)) throw refused('That is not an Antinode API token. Create one on your account page.');
  const row = await ApiToken.findOne({ where: { tokenHash: hashLinkToken(token) }, include: [{ model: Team, as: 'team' }, { model: User, as: 'user' }] }) as (ApiToken & { team?: Team; user?: User }) | null;
  if (!row || !row.user) throw refused('This API token is not known. Create one on your account page.');
  if (row.revokedAt) throw refused(`This API token ("${row.name}") was revoked on ${row.revokedAt.toISOString().slice(0, 10)}. Create a new one on your account page.`);
  if (row.expiresAt.getTime() <= now.getTime()) throw refused(`This API token ("${row.name}") expired on ${row.expiresAt.toISOString().slice(0, 10)}. Create a new one on your account page.`);
  const membership = await Membership.findOne({ where: { userId: row.userId, teamId: row.teamId } });
  if (!membership) throw refused(`This API token ("${row.name}") belongs to a team you are no longer a member of.`);
  if (!roleWithin(row.role, membership.role)) throw refused(`This API token ("${row.name}") may do more than your role in the team now allows; create a new one.`);
  if (!row.lastUsedAt || now.getTime() - row.lastUsedAt.getTime() > LAST_USED_RESOLUTION_MS) await row.update({ lastUsedAt: now });
  const team: TeamMembership = { teamId: row.teamId, teamName: row.team?.name ?? '', role: row.role };
  return {
    sessionId: `token:${row.id}`,
    user: { id: row.user.id, email: row.user.email, name: row.user.name, unitSystem: row.user.unitSystem },
    memberships: [team],
    team,
    refreshedCookie: null,
  };
}

/** The token of an `Authorization: Bearer …` header, or null when there is none. */
export function bearerToken(header: string | null): string | null {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header ?? '');
  return match ? match[1] : null;
}
