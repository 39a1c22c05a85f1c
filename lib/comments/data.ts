// Comments on a team's plans: list threads, write, answer, close out and reopen.
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { sequelize } from '@/lib/db';
import { AppError, notFound } from '@/lib/errors';
import { assertId } from '@/lib/ids';
import { Comment, Plan, Project, Revision } from '@/models';
import type { z } from 'zod';
import type { newCommentSchema } from './schemas';
import type { CommentThread, CommentView } from './types';

function toView(row: Comment): CommentView {
  return {
    id: row.id, planId: row.planId, revisionId: row.revisionId, parentId: row.parentId, xPx: row.xPx, yPx: row.yPx, target: row.target,
    body: row.body, authorName: row.authorName, resolved: row.resolvedAt !== null, resolvedByName: row.resolvedByName, createdAt: row.createdAt.toISOString(),
  };
}

async function planInTeam(teamId: string, planId: string): Promise<{ id: string; name: string }> {
  assertId(planId, 'That plan');
  const plan = await Plan.findOne({ where: { id: planId }, attributes: ['id', 'name'], include: [{ model: Project, as: 'project', where: { teamId }, attributes: [], required: true }] });
  if (!plan) throw notFound('That plan');
  return { id: plan.id, name: plan.name };
}

// Threads of a plan, oldest first; with a revision id, only that revision's comments and
// the plan-wide ones (no revision).
export async function listThreads(teamId: string, planId: string, revisionId?: string): Promise<CommentThread[]> {
  await planInTeam(teamId, planId);
  const rows = await Comment.findAll({ where: { teamId, planId }, order: [['createdAt', 'ASC']] });
  const views = rows.map(toView).filter((view) => !revisionId || view.revisionId === null || view.revisionId === revisionId);
  const threads = views.filter((view) => view.parentId === null).map((view): CommentThread => ({ ...view, answers: [] }));
  const byId = new Map(threads.map((thread) => [thread.id, thread]));
  for (const view of views) if (view.parentId) byId.get(view.parentId)?.answers.push(view);
  return threads;
}

export interface CreatedComment { comment: CommentView; planName: string; revisionNumber: number | null }

export async function createComment(teamId: string, actor: ActivityActor, input: z.infer<typeof newCommentSchema>): Promise<CreatedComment> {
  const plan = await planInTeam(teamId, input.planId);
  let revisionNumber: number | null = null;
  if (input.revisionId) {
    const revision = await Revision.findOne({ where: { id: input.revisionId, teamId, planId: plan.id }, attributes: ['id', 'number'] });
    if (!revision) throw new AppError('bad_input', 'That revision is not one of this plan.', { field: 'revisionId' });
    revisionNumber = revision.number;
  }
  let parent: Comment | null = null;
  if (input.parentId) {
    parent = await Comment.findOne({ where: { id: input.parentId, teamId, planId: plan.id } });
    if (!parent) throw new AppError('bad_input', 'The comment being answered is not on this plan.', { field: 'parentId' });
    if (parent.parentId) throw new AppError('bad_input', 'Answer the first comment of the thread.', { field: 'parentId' });
  } else if (input.xPx === null && input.target === null) {
    throw new AppError('bad_input', 'Place the comment on the plan or on a table row.', { field: 'xPx' });
  }
  return sequelize.transaction(async (transaction) => {
    const row = await Comment.create({
      teamId, planId: plan.id, revisionId: parent ? parent.revisionId : input.revisionId, parentId: parent?.id ?? null,
      xPx: parent ? null : input.xPx, yPx: parent ? null : input.yPx, target: parent ? null : input.target,
      body: input.body, authorId: actor.id, authorName: actor.name, resolvedAt: null, resolvedByName: null,
    }, { transaction });
    await recordActivity({
      teamId, planId: plan.id, actor, kind: parent ? 'comment.answered' : 'comment.added', summary: input.body.slice(0, 200), link: null,
    }, transaction);
    return { comment: toView(row), planName: plan.name, revisionNumber };
  });
}

export async function setCommentResolved(teamId: string, actor: ActivityActor, commentId: string, resolved: boolean): Promise<CommentView> {
  assertId(commentId, 'That comment');
  return sequelize.transaction(async (transaction) => {
    const row = await Comment.findOne({ where: { id: commentId, teamId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('That comment');
    if (row.parentId) throw new AppError('bad_input', 'Close out the thread from its first comment.');
    await row.update({ resolvedAt: resolved ? new Date() : null, resolvedByName: resolved ? actor.name : null }, { transaction });
    await recordActivity({
      teamId, planId: row.planId, actor, kind: resolved ? 'comment.resolved' : 'comment.reopened', summary: row.body.slice(0, 200), link: null,
    }, transaction);
    return toView(row);
  });
}
