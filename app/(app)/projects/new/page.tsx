import type { Metadata } from 'next';
import { Refused } from '@/components/feedback/refused';
import { ProjectForm } from '@/components/projects/project-form';
import { requireActor } from '@/lib/auth/current';
import { can, ROLE_LABELS } from '@/lib/permissions';

export const metadata: Metadata = { title: 'New project' };

export default async function NewProjectPage() {
  const actor = await requireActor();
  if (!actor.team || !can(actor.team.role, 'project.create')) {
    return <Refused what="create projects" role={actor.team ? ROLE_LABELS[actor.team.role] : 'person without a team'} />;
  }
  return (
    <div className="mx-auto max-w-lg">
      <h1 className="mb-4 text-xl font-semibold">New project</h1>
      <div className="panel p-6"><ProjectForm /></div>
    </div>
  );
}
