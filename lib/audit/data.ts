// A team's audit log, newest first, filtered by area and by day (UTC).
import { Op, type WhereOptions } from 'sequelize';
import { AuditEvent } from '@/models';
import { auditActionLabel } from './actions';
import type { AuditFilter } from './schemas';

export interface AuditLine { id: string; at: string; actorName: string; action: string; actionLabel: string; subject: string }

const PAGE_LIMIT = 500;

function whereFor(teamId: string, filter: AuditFilter): WhereOptions<AuditEvent> {
  const createdAt: Record<symbol, Date> = {};
  if (filter.from) createdAt[Op.gte] = new Date(`${filter.from}T00:00:00.000Z`);
  if (filter.to) createdAt[Op.lt] = new Date(new Date(`${filter.to}T00:00:00.000Z`).getTime() + 86_400_000);
  return {
    teamId,
    ...(filter.area ? { action: { [Op.startsWith]: `${filter.area}.` } } : {}),
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
