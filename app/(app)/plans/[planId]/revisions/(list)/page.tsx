import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/feedback/empty-state';
import { ActivityList } from '@/components/revisions/activity-list';
import { PlanRevisionActions } from '@/components/revisions/plan-revision-actions';
import { RevisionList } from '@/components/revisions/revision-list';
import { listPlanActivity } from '@/lib/activity/data';
import { planOfPage } from '@/app/(app)/records-of-page';
import { can } from '@/lib/permissions';
import { contentHash } from '@/lib/plans/analysis/content-hash';
import { latestRevision, listRevisions } from '@/lib/revisions/data';

export const metadata: Metadata = { title: 'Revisions' };

export default async function RevisionsPage({ params }: { params: Promise<{ planId: string }> }) {
  const { planId } = await params;
  const { team, plan } = await planOfPage(planId);
  const teamId = team.teamId;
  const [revisions, activity] = await Promise.all([listRevisions(teamId, planId), listPlanActivity(teamId, planId)]);
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
        <Link href="/projects" className="hover:text-graphite">Projects</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={`/projects/${plan.project.id}`} className="hover:text-graphite">{plan.project.name}</Link> <span aria-hidden="true">/</span>{' '}
        <Link href={`/plans/${plan.id}`} className="hover:text-graphite">{plan.name}</Link> <span aria-hidden="true">/</span> Revisions
      </nav>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <h1 className="text-xl font-semibold">Revisions of {plan.name}</h1>
          <p className="text-sm text-graphite-500">Each revision freezes the plan and its analysis as submitted. Edits after it make a new draft.</p>
        </div>
        <PlanRevisionActions planId={plan.id} latest={revisions.length > 0 ? await latestRevision(team.teamId, plan.id) : null} planVersion={plan.version} contentHash={contentHash(plan.document, plan.metresPerPixel)} canSubmit={can(team.role, 'plan.edit')} canIssue={can(team.role, 'schedule.issue')} showListLink={false} />
      </div>
      {revisions.length === 0 ? (
        <EmptyState title="No revision yet">
          {can(team.role, 'plan.edit') ? 'Draw the duct runs, then “Submit for review” freezes the plan as revision 1 and asks the engineers to review it.' : 'When the acoustician submits this plan for review, its revisions appear here.'}
        </EmptyState>
      ) : (
        <RevisionList planId={plan.id} revisions={revisions} />
      )}
      <section aria-labelledby="activity-title">
        <h2 id="activity-title" className="mb-2 text-sm font-semibold text-graphite-700">Activity</h2>
        <ActivityList lines={activity} />
      </section>
    </div>
  );
}
