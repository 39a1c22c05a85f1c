import { json, route } from '@/lib/http/route';
import { createProject, listProjects } from '@/lib/projects/data';
import { projectInputSchema } from '@/lib/projects/schemas';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'project.read' }, async ({ team, request }) => {
  const includeArchived = new URL(request.url).searchParams.get('archived') === 'include';
  return json({ projects: await listProjects(team!.teamId, { includeArchived }) });
});

export const POST = route({ access: 'project.create', maxBodyBytes: 8192 }, async ({ team, actor, readJson }) => {
  const input = await readJson(projectInputSchema);
  return json({ project: await createProject(team!.teamId, actor!.user.id, { name: input.name, site: input.site ?? '' }) }, 201);
});
