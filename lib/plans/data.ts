// Plans of a team's projects. Every query is scoped by team (through the project).
import { AppError, notFound } from '@/lib/errors';
import { emptyDocument, type PlanDocument } from '@/lib/plan/document';
import { planDocumentSchema, readSavedDocument } from '@/lib/plan/schema';
import { sequelize } from '@/lib/db';
import { assertId } from '@/lib/ids';
import { Plan, Project, Upload } from '@/models';
import { toUploadSummary, type UploadSummary } from '@/lib/uploads/data';
import { auditActorById, recordAudit, type AuditActor } from '@/lib/audit/record';
import { askForAnalysisAhead } from './analysis/store';
import { recordDocumentAudit } from './document-audit';
import type { SavePlanInput } from './schemas';

/** Seconds after a save before the job worker analyses the new version ahead. */
const ANALYSE_AHEAD_DELAY_S = 5;

export interface PlanSummary { id: string; name: string; archived: boolean; version: number; detailsVersion: number; updatedAt: string; hasBackground: boolean }

export interface PlanView {
  id: string;
  name: string;
  archived: boolean;
  /** Version of the name and archive state (a rename or archive carries it). */
  detailsVersion: number;
  version: number;
  metresPerPixel: number;
  document: PlanDocument;
  background: UploadSummary | null;
  project: { id: string; name: string };
  updatedAt: string;
}

async function projectInTeam(teamId: string, projectId: string): Promise<Project> {
  assertId(projectId, 'That project');
  const project = await Project.findOne({ where: { id: projectId, teamId } });
  if (!project) throw notFound('That project');
  return project;
}

async function planRowInTeam(teamId: string, planId: string): Promise<Plan & { project?: Project; background?: Upload | null }> {
  assertId(planId, 'That plan');
  const row = await Plan.findOne({
    where: { id: planId },
    include: [
      { model: Project, as: 'project', where: { teamId }, required: true },
      { model: Upload, as: 'background', required: false },
    ],
  });
  if (!row) throw notFound('That plan');
  return row as Plan & { project?: Project; background?: Upload | null };
}

function toSummary(row: Plan): PlanSummary {
  return { id: row.id, name: row.name, archived: row.archived, version: row.version, detailsVersion: row.detailsVersion, updatedAt: row.updatedAt.toISOString(), hasBackground: row.backgroundUploadId !== null };
}

export async function listPlans(teamId: string, projectId: string, options: { includeArchived?: boolean } = {}): Promise<PlanSummary[]> {
  await projectInTeam(teamId, projectId);
  const rows = await Plan.findAll({
    where: options.includeArchived ? { projectId } : { projectId, archived: false },
    attributes: { exclude: ['document'] },
    order: [['updatedAt', 'DESC']],
  });
  return rows.map(toSummary);
}

export async function createPlan(teamId: string, userId: string, projectId: string, name: string): Promise<PlanSummary> {
  const project = await projectInTeam(teamId, projectId);
  return sequelize.transaction(async (transaction) => {
    const row = await Plan.create({ projectId, name, document: emptyDocument(), updatedById: userId }, { transaction });
    await recordAudit({ teamId, actor: await auditActorById(userId, transaction), action: 'plan.created', subject: `${name} in ${project.name}` }, transaction);
    return toSummary(row);
  });
}

export async function getPlan(teamId: string, planId: string): Promise<PlanView> {
  const row = await planRowInTeam(teamId, planId);
  const background = row.background ?? null;
  return {
    id: row.id,
    name: row.name,
    archived: row.archived,
    detailsVersion: row.detailsVersion,
    version: row.version,
    metresPerPixel: row.metresPerPixel,
    document: readSavedDocument(() => planDocumentSchema.parse(row.document)),
    background: background && toUploadSummary(background),
    project: { id: row.project!.id, name: row.project!.name },
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function updatePlanMeta(teamId: string, actor: AuditActor, planId: string, changes: { detailsVersion: number; name?: string; archived?: boolean }): Promise<PlanSummary> {
  const row = await planRowInTeam(teamId, planId);
  const { detailsVersion, ...fields } = changes;
  const before = { name: row.name, archived: row.archived };
  return sequelize.transaction(async (transaction) => {
    const [updated] = await Plan.update({ ...fields, detailsVersion: detailsVersion + 1 }, { where: { id: planId, detailsVersion }, transaction });
    if (updated === 0) {
      throw new AppError('conflict', `Someone renamed or archived this plan since you opened it (it is now “${row.name}”${row.archived ? ', archived' : ''}, details version ${row.detailsVersion}). Reload to see their change, then make yours again.`, { field: 'detailsVersion' });
    }
    await row.reload({ transaction });
    const said = [
      fields.name !== undefined && fields.name !== before.name ? `renamed from ${before.name}` : null,
      fields.archived !== undefined && fields.archived !== before.archived ? (fields.archived ? 'archived' : 'taken out of the archive') : null,
    ].filter(Boolean);
    if (said.length > 0) await recordAudit({ teamId, actor, action: 'plan.changed', subject: `${row.name}: ${said.join(', ')}` }, transaction);
    return toSummary(row);
  });
}

export async function setPlanBackground(teamId: string, actor: AuditActor, planId: string, uploadId: string | null): Promise<void> {
  const row = await planRowInTeam(teamId, planId);
  await sequelize.transaction(async (transaction) => {
    await row.update({ backgroundUploadId: uploadId }, { transaction });
    const upload = uploadId ? await Upload.findOne({ where: { id: uploadId, teamId }, attributes: ['fileName'], transaction }) : null;
    await recordAudit(uploadId
      ? { teamId, actor, action: 'plan.drawing_set', subject: `${row.name}: ${upload?.fileName ?? 'a drawing'}` }
      : { teamId, actor, action: 'plan.drawing_removed', subject: `${row.name}: back to the blank grid` }, transaction);
  });
}

// Saves the drawn document only if nobody saved since `version` was loaded; else 409 and
// nothing changes, so the editor can keep the person's edits and offer a choice.
export async function savePlanDocument(teamId: string, userId: string, planId: string, input: SavePlanInput): Promise<{ version: number; updatedAt: string }> {
  const before = await planRowInTeam(teamId, planId);
  const [rows] = (await sequelize.query(
    `update plans set document = :document::jsonb, metres_per_pixel = :metresPerPixel, version = version + 1,
       updated_by_id = :userId, updated_at = now()
     where id = :planId and version = :version
     returning version, updated_at`,
    { replacements: { document: JSON.stringify(input.document), metresPerPixel: input.metresPerPixel, userId, planId, version: input.version } },
  )) as [{ version: number; updated_at: Date }[], unknown];
  const saved = rows[0];
  if (!saved) {
    const current = await Plan.findByPk(planId, { attributes: ['version', 'updatedById', 'updatedAt'] });
    throw new AppError('conflict', `Someone saved this plan after you opened it (now version ${current?.version ?? '?'}, yours is ${input.version}). Your edits are kept: reload their version or overwrite it with yours.`);
  }
  // The version read above is the one this save replaced when their numbers agree.
  if (before.version === input.version) {
    await recordDocumentAudit(teamId, () => auditActorById(userId), before.name, { document: before.document, metresPerPixel: before.metresPerPixel }, input);
  }
  // The job worker analyses the new version ahead (after a moment: the editor asks for it at once).
  // Not awaited: autosave answers without waiting for the queue (a failure only costs the head start).
  void askForAnalysisAhead(planId, teamId, ANALYSE_AHEAD_DELAY_S);
  return { version: saved.version, updatedAt: new Date(saved.updated_at).toISOString() };
}
