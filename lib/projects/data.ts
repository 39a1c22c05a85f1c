// Projects of a team. Every query is scoped by team id: one team never sees another's.
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
  const row = await Project.create({ teamId, createdById: userId, name: input.name, site: input.site });
  return toSummary(row);
}

export async function updateProject(teamId: string, projectId: string, changes: ProjectUpdate): Promise<ProjectSummary> {
  if (!isId(projectId)) throw notFound('That project');
  const row = await Project.findOne({ where: { teamId, id: projectId } });
  if (!row) throw notFound('That project');
  const { version, ...fields } = changes;
  const [updated] = await Project.update({ ...fields, version: version + 1 }, { where: { teamId, id: projectId, version } });
  if (updated === 0) {
    throw new AppError('conflict', `Someone changed this project since you opened it (it is now “${row.name}”, version ${row.version}). Reload to see their change, then make yours again.`, { field: 'version' });
  }
  await row.reload();
  return toSummary(row);
}
