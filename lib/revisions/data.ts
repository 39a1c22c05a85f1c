// Revisions of a team's plans: submit (freeze), list, read. Scoped by team everywhere.
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { planDocumentSchema, readSavedDocument } from '@/lib/plan/schema';
import { getPlan } from '@/lib/plans/data';
import { contentHash } from '@/lib/plans/analysis/content-hash';
import { planAnalysisOf } from '@/lib/plans/analysis/store';
import { runWithoutEnvelopes, type RunResult } from '@/lib/plans/results';
import { assertId } from '@/lib/ids';
import { Plan, Project, Revision, Upload } from '@/models';
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { recordAudit } from '@/lib/audit/record';
import { freezeExtras } from './freeze-extras';
import { revisionPath } from './links';
import { isRevisionState, type RevisionState } from './states';
import type { RevisionExtras, RevisionSummary, RevisionView } from './types';

function stateOf(row: Revision): RevisionState {
  return isRevisionState(row.state) ? row.state : 'waiting';
}

export function toRevisionSummary(row: Revision): RevisionSummary {
  return {
    id: row.id, planId: row.planId, number: row.number, planVersion: row.planVersion, state: stateOf(row), note: row.note,
    contentHash: row.document ? contentHash(planDocumentSchema.parse(row.document), row.metresPerPixel) : null,
    submittedByName: row.submittedByName, reviewedByName: row.reviewedByName, reviewedAt: row.reviewedAt?.toISOString() ?? null, reviewNote: row.reviewNote ?? '',
    createdAt: row.createdAt.toISOString(),
  };
}

// Freezes the plan as it is saved now: document, scale, rooms and the full analysis.
export async function submitRevision(teamId: string, actor: ActivityActor, planId: string, note: string): Promise<RevisionSummary> {
  const plan = await getPlan(teamId, planId);
  if (plan.document.runs.length === 0) {
    throw new AppError('bad_input', 'This plan has no duct run yet. Draw at least one run before submitting it for review.');
  }
  const planAnalysis = await planAnalysisOf(plan);
  const analysis = planAnalysis.runs;
  const extras = freezeExtras(plan.document, planAnalysis);
  return sequelize.transaction(async (transaction) => {
    // One submission at a time per plan, so numbers never collide.
    await Plan.findOne({ where: { id: planId }, transaction, lock: transaction.LOCK.UPDATE });
    const latest = (await Revision.max('number', { where: { planId }, transaction })) as number | null;
    const number = (latest ?? 0) + 1;
    await Revision.update({ state: 'replaced' }, { where: { planId, state: 'waiting' }, transaction });
    const row = await Revision.create({
      teamId, planId, number, planVersion: plan.version, planName: plan.name, metresPerPixel: plan.metresPerPixel,
      document: plan.document, analysis, extras, backgroundUploadId: plan.background?.id ?? null, state: 'waiting', note,
      submittedById: actor.id, submittedByName: actor.name, reviewedById: null, reviewedByName: null, reviewedAt: null,
    }, { transaction });
    const summary = `Revision ${number} submitted for review${note ? `: ${note}` : ''}`;
    await recordActivity({ teamId, planId, actor, kind: 'revision.submitted', summary, link: revisionPath(planId, number) }, transaction);
    await recordAudit({ teamId, actor, action: 'revision.submitted', subject: `${plan.project.name}, ${plan.name}: ${summary}` }, transaction);
    return toRevisionSummary(row);
  });
}

export async function listRevisions(teamId: string, planId: string): Promise<RevisionSummary[]> {
  assertId(planId, 'That plan');
  const rows = await Revision.findAll({ where: { teamId, planId }, attributes: { exclude: ['document', 'analysis', 'extras'] }, order: [['number', 'DESC']] });
  return rows.map(toRevisionSummary);
}

async function toView(row: Revision): Promise<RevisionView> {
  const project = await Project.findOne({ include: [{ model: Plan, as: 'plans', where: { id: row.planId }, attributes: [] }], attributes: ['id', 'name'] });
  const background = row.backgroundUploadId ? await Upload.findOne({ where: { id: row.backgroundUploadId, teamId: row.teamId } }) : null;
  return {
    ...toRevisionSummary(row),
    teamId: row.teamId,
    planName: row.planName,
    project: { id: project?.id ?? '', name: project?.name ?? '' },
    metresPerPixel: row.metresPerPixel,
    document: readSavedDocument(() => planDocumentSchema.parse(row.document)),
    analysis: (row.analysis as RunResult[]).map(runWithoutEnvelopes),
    extras: (row.extras ?? {}) as RevisionExtras,
    background: background && { id: background.id, contentType: background.contentType, widthPx: background.widthPx, heightPx: background.heightPx },
  };
}

export async function getRevisionById(teamId: string, revisionId: string): Promise<RevisionView> {
  assertId(revisionId, 'That revision');
  const row = await Revision.findOne({ where: { id: revisionId, teamId } });
  if (!row) throw notFound('That revision');
  return toView(row);
}

export async function getRevisionByNumber(teamId: string, planId: string, number: number): Promise<RevisionView> {
  assertId(planId, 'That plan');
  if (!Number.isSafeInteger(number) || number < 1 || number > 2_147_483_647) throw notFound('That revision');
  const row = await Revision.findOne({ where: { teamId, planId, number } });
  if (!row) throw notFound('That revision');
  return toView(row);
}

// The revision before this one, for "what changed".
export async function previousRevision(teamId: string, planId: string, number: number): Promise<RevisionView | null> {
  if (number <= 1) return null;
  const row = await Revision.findOne({ where: { teamId, planId, number: number - 1 } });
  return row ? toView(row) : null;
}

// The newest revision of a plan (for the plan header), or null before the first submission.
export async function latestRevision(teamId: string, planId: string): Promise<RevisionSummary | null> {
  assertId(planId, 'That plan');
  const row = await Revision.findOne({ where: { teamId, planId }, attributes: { exclude: ['analysis', 'extras'] }, order: [['number', 'DESC']] });
  return row ? toRevisionSummary(row) : null;
}
