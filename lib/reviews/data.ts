// The review of a revision: one decision per row, then the reviewer finishes it.
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { toRevisionSummary } from '@/lib/revisions/data';
import { revisionPath } from '@/lib/revisions/links';
import { reviewRows } from '@/lib/revisions/rows';
import { REVISION_STATE_LABELS } from '@/lib/revisions/states';
import type { RevisionExtras, RevisionSummary } from '@/lib/revisions/types';
import type { RunResult } from '@/lib/plans/results';
import { assertId } from '@/lib/ids';
import { ReviewDecision, Revision } from '@/models';
import { DECISION_LABELS, type Decision } from './decisions';
import { tallyReview, type ReviewTally } from './outcome';
import type { decisionSchema } from './schemas';
import type { z } from 'zod';

export interface DecisionView { target: string; decision: Decision; note: string; reviewerName: string; at: string }

async function revisionInTeam(teamId: string, revisionId: string, lock?: { transaction: import('sequelize').Transaction }): Promise<Revision> {
  assertId(revisionId, 'That revision');
  const row = await Revision.findOne({ where: { id: revisionId, teamId }, ...(lock ? { transaction: lock.transaction, lock: lock.transaction.LOCK.UPDATE } : {}) });
  if (!row) throw notFound('That revision');
  return row;
}

function assertOpen(row: Revision): void {
  if (row.state !== 'waiting') {
    const label = REVISION_STATE_LABELS[row.state as keyof typeof REVISION_STATE_LABELS] ?? row.state;
    throw new AppError('conflict', `Revision ${row.number} is no longer waiting for review (${label.toLowerCase()}); its review cannot change.`);
  }
}

function rowsOf(row: Revision) {
  return reviewRows(row.analysis as RunResult[], (row.extras ?? {}) as RevisionExtras);
}

export async function listDecisions(teamId: string, revisionId: string): Promise<DecisionView[]> {
  await revisionInTeam(teamId, revisionId);
  const rows = await ReviewDecision.findAll({ where: { revisionId }, order: [['updatedAt', 'ASC']] });
  return rows.map((row) => ({ target: row.target, decision: row.decision as Decision, note: row.note, reviewerName: row.reviewerName, at: row.updatedAt.toISOString() }));
}

export async function decideRow(teamId: string, actor: ActivityActor, revisionId: string, input: z.infer<typeof decisionSchema>): Promise<DecisionView> {
  return sequelize.transaction(async (transaction) => {
    const revision = await revisionInTeam(teamId, revisionId, { transaction });
    assertOpen(revision);
    const row = rowsOf(revision).find((candidate) => candidate.target === input.target);
    if (!row) throw new AppError('bad_input', 'That row is not part of this revision.', { field: 'target' });
    const [saved] = await ReviewDecision.upsert({
      revisionId, target: input.target, decision: input.decision, note: input.note, reviewerId: actor.id, reviewerName: actor.name,
    }, { transaction, conflictFields: ['revision_id', 'target'] as never });
    await recordActivity({
      teamId, planId: revision.planId, actor, kind: 'review.decided',
      summary: `${DECISION_LABELS[input.decision]} ${row.runName ? `${row.runName}, ` : ''}${row.label} in revision ${revision.number}${input.note ? `: ${input.note}` : ''}`,
      link: revisionPath(revision.planId, revision.number),
    }, transaction);
    return { target: saved.target, decision: saved.decision as Decision, note: saved.note, reviewerName: saved.reviewerName, at: saved.updatedAt.toISOString() };
  });
}

export async function reviewTally(teamId: string, revisionId: string): Promise<ReviewTally> {
  const revision = await revisionInTeam(teamId, revisionId);
  const decisions = await ReviewDecision.findAll({ where: { revisionId } });
  return tallyReview(rowsOf(revision), new Map(decisions.map((row) => [row.target, row.decision as Decision])));
}

export async function finishReview(teamId: string, actor: ActivityActor, revisionId: string): Promise<{ revision: RevisionSummary; tally: ReviewTally; submittedById: string | null }> {
  return sequelize.transaction(async (transaction) => {
    const revision = await revisionInTeam(teamId, revisionId, { transaction });
    assertOpen(revision);
    const decisions = await ReviewDecision.findAll({ where: { revisionId }, transaction });
    const tally = tallyReview(rowsOf(revision), new Map(decisions.map((row) => [row.target, row.decision as Decision])));
    await revision.update({ state: tally.outcome, reviewedById: actor.id, reviewedByName: actor.name, reviewedAt: new Date() }, { transaction });
    const words = tally.outcome === 'approved'
      ? `Revision ${revision.number} approved (${tally.accepted} rows accepted)`
      : `Revision ${revision.number} returned: ${tally.flagged} flagged, ${tally.open} not settled`;
    await recordActivity({ teamId, planId: revision.planId, actor, kind: 'review.finished', summary: words, link: revisionPath(revision.planId, revision.number) }, transaction);
    return { revision: toRevisionSummary(revision), tally, submittedById: revision.submittedById };
  });
}
