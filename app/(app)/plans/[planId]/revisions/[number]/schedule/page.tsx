import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { RevisionStateBadge } from '@/components/revisions/revision-state-badge';
import { IssueSchedule } from '@/components/schedules/issue-schedule';
import { ScheduleList } from '@/components/schedules/schedule-list';
import { requireActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { can } from '@/lib/permissions';
import { getRevisionByNumber } from '@/lib/revisions/data';
import { revisionPath } from '@/lib/revisions/links';
import { listSchedules } from '@/lib/schedules/data';

export const metadata: Metadata = { title: 'Treatment schedule' };

export default async function SchedulePage({ params }: { params: Promise<{ planId: string; number: string }> }) {
  const { planId, number } = await params;
  const actor = await requireActor();
  if (!actor.team || !/^[0-9a-f-]{36}$/i.test(planId) || !/^\d{1,6}$/.test(number) || !can(actor.team.role, 'schedule.read')) notFound();
  const revision = await getRevisionByNumber(actor.team.teamId, planId, Number(number)).catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'not_found') return null;
    throw error;
  });
  if (!revision) notFound();
  const schedules = await listSchedules(actor.team.teamId, revision.id);
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
        <Link href={revisionPath(planId, revision.number)} className="hover:text-graphite">{revision.planName}, revision {revision.number}</Link> <span aria-hidden="true">/</span> Treatment schedule
      </nav>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="space-y-1">
          <h1 className="text-xl font-semibold">Treatment schedule: {revision.planName}, revision {revision.number}</h1>
          <p className="flex items-center gap-2 text-sm text-graphite-500"><RevisionStateBadge state={revision.state} /> {revision.project.name}</p>
        </div>
        {can(actor.team.role, 'schedule.issue') && <IssueSchedule revisionId={revision.id} approved={revision.state === 'approved'} />}
      </div>
      <section aria-labelledby="issued-title">
        <h2 id="issued-title" className="mb-2 text-sm font-semibold text-graphite-700">Issued</h2>
        <ScheduleList schedules={schedules} />
      </section>
      <section aria-labelledby="preview-title">
        <h2 id="preview-title" className="mb-2 text-sm font-semibold text-graphite-700">Preview (rendered now, not issued)</h2>
        <iframe title="Schedule preview" src={`/api/v1/revisions/${revision.id}/schedule-preview`} className="panel h-[900px] w-full" />
      </section>
    </div>
  );
}
