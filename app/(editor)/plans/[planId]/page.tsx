import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PlanEditor } from '@/components/editor/plan-editor';
import { requireActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { can } from '@/lib/permissions';
import { getPlan } from '@/lib/plans/data';
import { latestRevision } from '@/lib/revisions/data';
import { listMembers } from '@/lib/team/members';

export const metadata: Metadata = { title: 'Plan' };

export default async function PlanPage({ params, searchParams }: { params: Promise<{ planId: string }>; searchParams: Promise<{ comment?: string }> }) {
  const { planId } = await params;
  const { comment } = await searchParams;
  const actor = await requireActor();
  if (!actor.team || !/^[0-9a-f-]{36}$/i.test(planId)) notFound();
  const plan = await getPlan(actor.team.teamId, planId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'not_found') return null;
    throw error;
  });
  if (!plan) notFound();
  const role = actor.team.role;
  const [latest, members] = await Promise.all([latestRevision(actor.team.teamId, plan.id), listMembers(actor.team.teamId)]);
  return (
    <PlanEditor
      plan={plan}
      editable={can(role, 'plan.edit')}
      canEvaluate={can(role, 'analysis.run')}
      unitSystem={actor.user.unitSystem}
      revisions={{ latest, canSubmit: can(role, 'plan.edit'), canIssue: can(role, 'schedule.issue') }}
      comments={{
        canWrite: can(role, 'comment.write'),
        members: members.map((member) => member.name).filter((name) => name !== actor.user.name),
        initialActiveId: comment && /^[0-9a-f-]{36}$/i.test(comment) ? comment : null,
      }}
    />
  );
}
