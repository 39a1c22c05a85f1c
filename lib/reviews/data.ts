// The review of a revision: the engineer checks each row or raises a query on it, then finishes
// the review by stamping an outcome with an overall note.
import { Op, type Transaction } from 'sequelize';
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { toRevisionSummary } from '@/lib/revisions/data';
import { revisionPath } from '@/lib/revisions/links';
import { reviewRows, type ReviewRow } from '@/lib/revisions/rows';
import { REVISION_STATE_LABELS, revisionStateLabel, type ReviewOutcome } from '@/lib/revisions/states';
import type { RevisionExtras, RevisionSummary } from '@/lib/revisions/types';
import type { RunResult } from '@/lib/plans/results';
import { assertId } from '@/lib/ids';
import { Comment, ReviewDecision, Revision } from '@/models';
import { DECISION_LABELS, type Decision } from './decisions';
import { isClearRow, outcomeRefusal, tallyReview, type RaisedQuery, type ReviewTally } from './outcome';
import type { decisionSchema, finishReviewSchema } from './schemas';
import type { z } from 'zod';

export interface DecisionView { target: string; decision: Decision; note: string; reviewerName: string; at: string }

export type { RaisedQuery };

export interface FinishedReview {
  revision: RevisionSummary;
  tally: ReviewTally;
  submittedById: string | null;
  queries: RaisedQuery[];
}

async function revisionInTeam(teamId: string, revisionId: string, lock?: { transaction: Transaction }): Promise<Revision> {
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

function rowsOf(row: Revision): ReviewRow[] {
  return reviewRows(row.analysis as RunResult[], (row.extras ?? {}) as RevisionExtras);
}

function rowName(row: ReviewRow): string {
  return `${row.runName ? `${row.runName}, ` : ''}${row.label}`;
}

// Rows someone left an open remark on (a comment on the row that nobody has closed out yet).
async function openRemarkTargets(revisionId: string, transaction?: Transaction): Promise<Set<string>> {
  const rows = await Comment.findAll({ where: { revisionId, parentId: null, resolvedAt: null, target: { [Op.ne]: null } }, attributes: ['target'], transaction });
  return new Set(rows.map((row) => row.target!));
}

async function decisionsOf(revisionId: string, transaction?: Transaction): Promise<Map<string, ReviewDecision>> {
  const rows = await ReviewDecision.findAll({ where: { revisionId }, transaction });
  return new Map(rows.map((row) => [row.target, row]));
}

function tallyOf(rows: readonly ReviewRow[], decisions: ReadonlyMap<string, ReviewDecision>, openRemarks: ReadonlySet<string>): ReviewTally {
  return tallyReview(rows, new Map([...decisions].map(([target, row]) => [target, row.decision as Decision])), openRemarks);
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
    const summary = `${DECISION_LABELS[input.decision]}: ${rowName(row)} in revision ${revision.number}${input.note ? ` (${input.note})` : ''}`;
    await recordActivity({ teamId, planId: revision.planId, actor, kind: 'review.decided', summary, link: revisionPath(revision.planId, revision.number) }, transaction);
    await recordAudit({ teamId, actor, action: input.decision === 'query' ? 'review.query_raised' : 'review.row_checked', subject: `${revision.planName}: ${summary}` }, transaction);
    return { target: saved.target, decision: saved.decision as Decision, note: saved.note, reviewerName: saved.reviewerName, at: saved.updatedAt.toISOString() };
  });
}

// Checks, in one step, every row not yet marked that the analysis did not mark at risk and that
// carries no open remark. Rows near a fan tone, risk flags and rows with a query stay for the engineer.
export async function checkClearRows(teamId: string, actor: ActivityActor, revisionId: string): Promise<{ checked: number; tally: ReviewTally }> {
  return sequelize.transaction(async (transaction) => {
    const revision = await revisionInTeam(teamId, revisionId, { transaction });
    assertOpen(revision);
    const rows = rowsOf(revision);
    const decisions = await decisionsOf(revisionId, transaction);
    const openRemarks = await openRemarkTargets(revisionId, transaction);
    const clear = rows.filter((row) => !decisions.has(row.target) && isClearRow(row, openRemarks));
    if (clear.length > 0) {
      await ReviewDecision.bulkCreate(
        clear.map((row) => ({ revisionId, target: row.target, decision: 'checked', note: '', reviewerId: actor.id, reviewerName: actor.name })),
        { transaction, ignoreDuplicates: true },
      );
      const summary = `${clear.length} clear ${clear.length === 1 ? 'row' : 'rows'} checked in revision ${revision.number}`;
      await recordActivity({ teamId, planId: revision.planId, actor, kind: 'review.decided', summary, link: revisionPath(revision.planId, revision.number) }, transaction);
      await recordAudit({ teamId, actor, action: 'review.rows_checked', subject: `${revision.planName}: ${summary}` }, transaction);
    }
    const tally = tallyOf(rows, await decisionsOf(revisionId, transaction), openRemarks);
    return { checked: clear.length, tally };
  });
}

export async function reviewTally(teamId: string, revisionId: string): Promise<ReviewTally> {
  const revision = await revisionInTeam(teamId, revisionId);
  return tallyOf(rowsOf(revision), await decisionsOf(revisionId), await openRemarkTargets(revisionId));
}

/** The queries raised on a revision's rows, in table order, for the finishing summary and the mail. */
export async function raisedQueries(teamId: string, revisionId: string): Promise<RaisedQuery[]> {
  const revision = await revisionInTeam(teamId, revisionId);
  const decisions = await decisionsOf(revisionId);
  return queriesOf(rowsOf(revision), decisions);
}

function queriesOf(rows: readonly ReviewRow[], decisions: ReadonlyMap<string, ReviewDecision>): RaisedQuery[] {
  return rows.flatMap((row) => {
    const decision = decisions.get(row.target);
    return decision?.decision === 'query' ? [{ row: rowName(row), note: decision.note }] : [];
  });
}

export async function finishReview(teamId: string, actor: ActivityActor, revisionId: string, input: z.infer<typeof finishReviewSchema>): Promise<FinishedReview> {
  return sequelize.transaction(async (transaction) => {
    const revision = await revisionInTeam(teamId, revisionId, { transaction });
    assertOpen(revision);
    const rows = rowsOf(revision);
    const decisions = await decisionsOf(revisionId, transaction);
    const tally = tallyOf(rows, decisions, await openRemarkTargets(revisionId, transaction));
    const refusal = outcomeRefusal(tally, input.outcome, input.note);
    if (refusal) throw new AppError('bad_input', refusal.message, { field: refusal.field });
    await revision.update({ state: input.outcome, reviewNote: input.note, reviewedById: actor.id, reviewedByName: actor.name, reviewedAt: new Date() }, { transaction });
    const summary = finishedSummary(revision.number, input.outcome, tally);
    await recordActivity({ teamId, planId: revision.planId, actor, kind: 'review.finished', summary: input.note ? `${summary}. Note: ${input.note}` : summary, link: revisionPath(revision.planId, revision.number) }, transaction);
    await recordAudit({ teamId, actor, action: 'review.finished', subject: `${revision.planName}: ${summary}` }, transaction);
    return { revision: toRevisionSummary(revision), tally, submittedById: revision.submittedById, queries: queriesOf(rows, decisions) };
  });
}

function finishedSummary(number: number, outcome: ReviewOutcome, tally: ReviewTally): string {
  const queries = tally.queries === 1 ? '1 query' : `${tally.queries} queries`;
  return `Revision ${number}: ${revisionStateLabel(outcome).toLowerCase()} (${tally.checked} of ${tally.rows} rows checked, ${queries}${tally.unchecked > 0 ? `, ${tally.unchecked} not checked` : ''})`;
}
