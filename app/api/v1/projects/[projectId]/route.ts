import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { notFound } from '@/lib/errors';
import { getProject, updateProject } from '@/lib/projects/data';
import { projectUpdateSchema } from '@/lib/projects/schemas';

type Params = { projectId: string };

export const GET = route<Params>({ access: 'project.read' }, async ({ team, params }) => {
  const project = await getProject(team!.teamId, params.projectId);
  if (!project) throw notFound('That project');
  return json({ project });
});

export const PATCH = route<Params>({ access: 'project.update', maxBodyBytes: 8192 }, async ({ team, actor, params, readJson }) => {
  const changes = await readJson(projectUpdateSchema);
  return json({ project: await updateProject(team!.teamId, auditActorOf(actor!), params.projectId, changes) });
});
