import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/feedback/empty-state';
import { NewPlanForm } from '@/components/plans/new-plan-form';
import { PlanList } from '@/components/plans/plan-list';
import { ProjectActions } from '@/components/projects/project-actions';
import { projectOfPage } from '@/app/(app)/records-of-page';
import { can } from '@/lib/permissions';
import { listPlans } from '@/lib/plans/data';
import { listWaitingReviews, waitingByPlan } from '@/lib/reviews/waiting';

export const metadata: Metadata = { title: 'Project' };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { actor, team, project } = await projectOfPage(projectId);
  const [plans, reviews] = await Promise.all([listPlans(team.teamId, projectId, { includeArchived: true }), listWaitingReviews(team.teamId)]);
  const waiting = waitingByPlan(reviews.filter((review) => review.projectId === project.id), { userId: actor.user.id, mayReview: can(team.role, 'review.write') });
  const mayEdit = can(team.role, 'plan.edit');
  const active = plans.filter((plan) => !plan.archived);
  const archived = plans.filter((plan) => plan.archived);
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm text-graphite-500">
        <Link href="/projects" className="hover:text-graphite">Projects</Link> <span aria-hidden="true">/</span> {project.name}
      </nav>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-xl font-semibold">{project.name}{project.archived && <span className="ml-2 rounded bg-paper-sunk px-2 py-0.5 align-middle text-xs font-normal">Archived</span>}</h1>
          {project.site && <p className="text-sm text-graphite-500">{project.site}</p>}
        </div>
        {can(team.role, 'project.update') && <ProjectActions project={project} />}
      </div>
      {mayEdit && <NewPlanForm projectId={project.id} />}
      {active.length === 0 ? (
        <EmptyState title="No plans in this project">
          {mayEdit
            ? 'Add a plan above. Then upload the architect’s drawing (PNG, JPEG, WebP, PDF or DXF) or keep the blank grid, set the scale from two points, and draw the first duct run from the fan.'
            : 'When an acoustician adds a plan, it appears here.'}
        </EmptyState>
      ) : (
        <PlanList plans={active} label="Plans" waiting={waiting} />
      )}
      {archived.length > 0 && <PlanList plans={archived} label="Archived plans" />}
    </div>
  );
}
