import type { Metadata } from 'next';
import Link from 'next/link';
import { Providers } from '@/components/providers';
import { RevisionStateBadge } from '@/components/revisions/revision-state-badge';
import { IssueSchedule } from '@/components/schedules/issue-schedule';
import { ScheduleList } from '@/components/schedules/schedule-list';
import { revisionOfPage } from '@/app/(app)/records-of-page';
import { can } from '@/lib/permissions';
import { revisionPath } from '@/lib/revisions/links';
import { isAcceptedForIssue } from '@/lib/revisions/states';
import { listSchedules } from '@/lib/schedules/data';

export const metadata: Metadata = { title: 'Treatment schedule' };

export default async function SchedulePage({ params }: { params: Promise<{ planId: string; number: string }> }) {
  const { planId, number } = await params;
  // Every role may read schedules (lib/permissions.ts); the revision's layout has answered 404 for an unknown one.
  const { team, revision } = await revisionOfPage(planId, number);
  const schedules = await listSchedules(team.teamId, revision.id);
  return (
    <Providers>
      <div className="space-y-6">
        <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
          <Link href={revisionPath(planId, revision.number)} className="hover:text-graphite">{revision.planName}, revision {revision.number}</Link> <span aria-hidden="true">/</span> Treatment schedule
        </nav>
        <div className="flex flex-wrap items-start justify-between gap-4">
          <div className="space-y-1">
            <h1 className="text-xl font-semibold">Treatment schedule: {revision.planName}, revision {revision.number}</h1>
            <p className="flex items-center gap-2 text-sm text-graphite-500"><RevisionStateBadge state={revision.state} /> {revision.project.name}</p>
          </div>
          {can(team.role, 'schedule.issue') && <IssueSchedule revisionId={revision.id} accepted={isAcceptedForIssue(revision.state)} />}
        </div>
        <section aria-labelledby="issued-title">
          <h2 id="issued-title" className="mb-2 text-sm font-semibold text-graphite-700">Issued</h2>
          <ScheduleList revisionId={revision.id} initial={schedules} />
        </section>
        <section aria-labelledby="preview-title">
          <h2 id="preview-title" className="mb-2 text-sm font-semibold text-graphite-700">Preview (rendered now, not issued)</h2>
          <iframe title="Schedule preview" src={`/api/v1/revisions/${revision.id}/schedule-preview`} className="panel h-[900px] w-full" />
        </section>
      </div>
    </Providers>
  );
}
