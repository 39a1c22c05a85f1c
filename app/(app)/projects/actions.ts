'use server';

import { authorize } from '@/lib/auth/current';
import { runAction, type ActionResult } from '@/lib/actions';
import { createProject, type ProjectSummary } from '@/lib/projects/data';
import { projectInputSchema } from '@/lib/projects/schemas';
import { parseWith } from '@/lib/validation';

export async function createProjectAction(input: unknown): Promise<ActionResult<ProjectSummary>> {
  return runAction('createProject', async () => {
    const actor = await authorize('project.create');
    const data = parseWith(projectInputSchema, input);
    return createProject(actor.team.teamId, actor.user.id, { name: data.name, site: data.site ?? '' });
  });
}
