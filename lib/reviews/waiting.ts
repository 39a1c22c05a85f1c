// Revisions waiting for review in a team: for the projects list, the plan rows, the header count
// and the list of reviews to do. A plan has at most one revision waiting (a newer one supersedes it).
import { can, type Role } from '@/lib/permissions';
import { Plan, Project, Revision } from '@/models';
import { revisionPath } from '@/lib/revisions/links';

export interface WaitingReview {
  revisionId: string;
  planId: string;
  planName: string;
  projectId: string;
  projectName: string;
  number: number;
  submittedById: string | null;
  submittedByName: string;
  submittedAt: string;
  link: string;
}

export async function listWaitingReviews(teamId: string): Promise<WaitingReview[]> {
  const rows = await Revision.findAll({
    where: { teamId, state: 'waiting' },
    attributes: ['id', 'planId', 'number', 'submittedById', 'submittedByName', 'createdAt'],
    include: [{
      model: Plan, as: 'plan', attributes: ['id', 'name', 'archived'], required: true, where: { archived: false },
      include: [{ model: Project, as: 'project', attributes: ['id', 'name', 'archived'], required: true, where: { teamId, archived: false } }],
    }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((row) => {
    const plan = (row as Revision & { plan?: Plan & { project?: Project } }).plan!;
    return {
      revisionId: row.id, planId: row.planId, planName: plan.name, projectId: plan.project!.id, projectName: plan.project!.name,
      number: row.number, submittedById: row.submittedById, submittedByName: row.submittedByName, submittedAt: row.createdAt.toISOString(),
      link: revisionPath(row.planId, row.number),
    };
  });
}

/** The reviews this person is asked for: waiting, and submitted by someone else. */
export function waitingFor(reviews: readonly WaitingReview[], userId: string): WaitingReview[] {
  return reviews.filter((review) => review.submittedById !== userId);
}

/** Per project: plans with a revision waiting, and whether this reader is asked to review any of them. */
export function waitingByProject(reviews: readonly WaitingReview[], reader: { userId: string; mayReview: boolean }): Record<string, { plans: number; forYou: boolean }> {
  const byProject: Record<string, { plans: number; forYou: boolean }> = {};
  for (const review of reviews) {
    const entry = (byProject[review.projectId] ??= { plans: 0, forYou: false });
    entry.plans += 1;
    entry.forYou ||= reader.mayReview && review.submittedById !== reader.userId;
  }
  return byProject;
}

/** Per plan: its revision waiting, and whether this reader is asked to review it. */
export function waitingByPlan(reviews: readonly WaitingReview[], reader: { userId: string; mayReview: boolean }): Record<string, { number: number; link: string; forYou: boolean }> {
  return Object.fromEntries(reviews.map((review) => [review.planId, {
    number: review.number, link: review.link, forYou: reader.mayReview && review.submittedById !== reader.userId,
  }]));
}

/** For the header: how many revisions wait for this person's review; null for people who may not review. */
export async function reviewsWaitingCount(userId: string, team: { teamId: string; role: Role } | null): Promise<number | null> {
  if (!team || !can(team.role, 'review.write')) return null;
  return waitingFor(await listWaitingReviews(team.teamId), userId).length;
}
