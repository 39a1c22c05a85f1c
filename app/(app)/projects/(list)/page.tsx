import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/feedback/empty-state';
import { ProjectList } from '@/components/projects/project-list';
import { requireActor } from '@/lib/auth/current';
import { can } from '@/lib/permissions';
import { listProjects } from '@/lib/projects/data';
import { listWaitingReviews, waitingByProject } from '@/lib/reviews/waiting';

export const metadata: Metadata = { title: 'Projects' };

export default async function ProjectsPage() {
  const actor = await requireActor();
  if (!actor.team) {
    return (
      <EmptyState title="You are not in a team yet">
        Ask a team admin to invite you, or create your own team by signing up with another e-mail address.
      </EmptyState>
    );
  }
  const [projects, waiting] = await Promise.all([listProjects(actor.team.teamId), listWaitingReviews(actor.team.teamId)]);
  const mayCreate = can(actor.team.role, 'project.create');
  return (
    <div className="space-y-6">
      <div className="flex items-end justify-between gap-4">
        <div>
          <h1 className="text-xl font-semibold">Projects</h1>
          <p className="text-sm text-graphite-500">{actor.team.teamName}</p>
        </div>
        {mayCreate && <Link href="/projects/new" className="btn-primary">New project</Link>}
      </div>
      {projects.length === 0 ? (
        <EmptyState
          title="No projects yet"
          action={mayCreate ? <Link href="/projects/new" className="btn-primary">Create the first project</Link> : undefined}
        >
          {mayCreate
            ? 'Start with a project for the building, then add a plan: upload the architect’s drawing (or use a blank grid), set its scale, and sketch the duct runs from the fan.'
            : 'When an acoustician in your team creates a project, it appears here.'}
        </EmptyState>
      ) : (
        <ProjectList projects={projects} waiting={waitingByProject(waiting, { userId: actor.user.id, mayReview: can(actor.team.role, 'review.write') })} />
      )}
    </div>
  );
}
