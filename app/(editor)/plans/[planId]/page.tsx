import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PlanEditor } from '@/components/editor/plan-editor';
import { requireActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { can } from '@/lib/permissions';
import { getPlan } from '@/lib/plans/data';

export const metadata: Metadata = { title: 'Plan' };

export default async function PlanPage({ params }: { params: Promise<{ planId: string }> }) {
  const { planId } = await params;
  const actor = await requireActor();
  if (!actor.team || !/^[0-9a-f-]{36}$/i.test(planId)) notFound();
  const plan = await getPlan(actor.team.teamId, planId).catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'not_found') return null;
    throw error;
  });
  if (!plan) notFound();
  return <PlanEditor plan={plan} editable={can(actor.team.role, 'plan.edit')} unitSystem={actor.user.unitSystem} />;
}
