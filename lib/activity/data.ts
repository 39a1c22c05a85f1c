// A plan's activity, newest first, scoped by team.
import { assertId } from '@/lib/ids';
import { PlanActivity } from '@/models';
import { activityLabel } from './kinds';

export interface ActivityLine { id: string; actorName: string; kind: string; label: string; summary: string; link: string | null; at: string }

export async function listPlanActivity(teamId: string, planId: string, limit = 200): Promise<ActivityLine[]> {
  assertId(planId, 'That plan');
  const rows = await PlanActivity.findAll({ where: { teamId, planId }, order: [['createdAt', 'DESC']], limit });
  return rows.map((row) => ({
    id: row.id, actorName: row.actorName, kind: row.kind, label: activityLabel(row.kind), summary: row.summary, link: row.link, at: row.createdAt.toISOString(),
  }));
}
