// Projects of a team. Every query is scoped by team id: one team never sees another's.
import { auditActorById, recordAudit, type AuditActor } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { Project } from '@/models';
import { AppError, notFound } from '@/lib/errors';
import { isId } from '@/lib/ids';
import type { ProjectInput, ProjectUpdate } from './schemas';

export interface ProjectSummary { id: string; name: string; site: string; archived: boolean; version: number; updatedAt: string }

function toSummary(row: Project): ProjectSummary {
  return { id: row.id, name: row.name, site: row.site, archived: row.archived, version: row.version, updatedAt: row.updatedAt.toISOString() };
}

export async function listProjects(teamId: string, options: { includeArchived?: boolean } = {}): Promise<ProjectSummary[]> {
  const rows = await Project.findAll({
    where: options.includeArchived ? { teamId } : { teamId, archived: false },
    order: [['updatedAt', 'DESC']],
  });
  return rows.map(toSummary);
}

export async function getProject(teamId: string, projectId: string): Promise<ProjectSummary | null> {
  if (!isId(projectId)) return null;
  const row = await Project.findOne({ where: { teamId, id: projectId } });
  return row ? toSummary(row) : null;
}

export async function createProject(teamId: string, userId: string, input: Required<ProjectInput>): Promise<ProjectSummary> {
  return sequelize.transaction(async (transaction) => {
    const row = await Project.create({ teamId, createdById: userId, name: input.name, site: input.site }, { transaction });
    await recordAudit({ teamId, actor: await auditActorById(userId, transaction), action: 'project.created', subject: input.name }, transaction);
    return toSummary(row);
  });
}

function describeProjectChanges(before: ProjectSummary, changes: Omit<ProjectUpdate, 'version'>): string[] {
  return [
    changes.name !== undefined && changes.name !== before.name ? `renamed from ${before.name}` : null,
    changes.site !== undefined && changes.site !== before.site ? `site now ${changes.site || 'blank'}` : null,
    changes.archived !== undefined && changes.archived !== before.archived ? (changes.archived ? 'archived' : 'taken out of the archive') : null,
  ].filter((said): said is string => said !== null);
}

export async function updateProject(teamId: string, actor: AuditActor, projectId: string, changes: ProjectUpdate): Promise<ProjectSummary> {
  if (!isId(projectId)) throw notFound('That project');
  const row = await Project.findOne({ where: { teamId, id: projectId } });
  if (!row) throw notFound('That project');
  const { version, ...fields } = changes;
  const said = describeProjectChanges(toSummary(row), fields);
  return sequelize.transaction(async (transaction) => {
    const [updated] = await Project.update({ ...fields, version: version + 1 }, { where: { teamId, id: projectId, version }, transaction });
    if (updated === 0) {
      throw new AppError('conflict', `Someone changed this project since you opened it (it is now “${row.name}”, version ${row.version}). Reload to see their change, then make yours again.`, { field: 'version' });
    }
    if (said.length > 0) await recordAudit({ teamId, actor, action: 'project.changed', subject: `${row.name}: ${said.join(', ')}` }, transaction);
    await row.reload({ transaction });
    return toSummary(row);
  });
}
