// A team's audit log, newest first, filtered by kind of event, person and day (UTC).
import { Op, type WhereOptions } from 'sequelize';
import { sequelize } from '@/lib/db';
import { AuditEvent } from '@/models';
import { actionsOfArea, auditActionLabel, isAuditArea } from './actions';
import { PAYMENT_SERVICE } from './record';
import { SERVICE_ACTOR, type AuditFilter } from './schemas';

export interface AuditLine { id: string; at: string; actorName: string; action: string; actionLabel: string; subject: string }

/** Someone who appears in a team's log: a member (by user id, also after leaving) or the payment service. */
export interface AuditPerson { value: string; name: string }

const PAGE_LIMIT = 500;

function whereFor(teamId: string, filter: AuditFilter): WhereOptions<AuditEvent> {
  const createdAt: Record<symbol, Date> = {};
  if (filter.from) createdAt[Op.gte] = new Date(`${filter.from}T00:00:00.000Z`);
  if (filter.to) createdAt[Op.lt] = new Date(new Date(`${filter.to}T00:00:00.000Z`).getTime() + 86_400_000);
  const kind = filter.kind ? (isAuditArea(filter.kind) ? { action: { [Op.in]: actionsOfArea(filter.kind) } } : { action: filter.kind }) : {};
  const person = filter.person ? { actorId: filter.person === SERVICE_ACTOR ? null : filter.person } : {};
  return {
    teamId,
    ...kind,
    ...person,
    ...(filter.from || filter.to ? { createdAt } : {}),
  };
}

export async function listAuditLines(teamId: string, filter: AuditFilter, limit = PAGE_LIMIT): Promise<AuditLine[]> {
  const rows = await AuditEvent.findAll({ where: whereFor(teamId, filter), order: [['createdAt', 'DESC'], ['id', 'ASC']], limit });
  return rows.map((row) => ({
    id: row.id,
    at: row.createdAt.toISOString(),
    actorName: row.actorName,
    action: row.action,
    actionLabel: auditActionLabel(row.action),
    subject: row.subject,
  }));
}

// Everyone who appears in the log, for the person filter: the newest name each person was written with.
export async function listAuditPeople(teamId: string): Promise<AuditPerson[]> {
  const [rows] = (await sequelize.query(
    `select distinct on (coalesce(actor_id::text, '')) actor_id, actor_name from audit_events
     where team_id = :teamId order by coalesce(actor_id::text, ''), created_at desc`,
    { replacements: { teamId } },
  )) as [{ actor_id: string | null; actor_name: string }[], unknown];
  return rows
    .map((row) => ({ value: row.actor_id ?? SERVICE_ACTOR, name: row.actor_id ? row.actor_name : PAYMENT_SERVICE }))
    .sort((a, b) => a.name.localeCompare(b.name));
}
