import { listAuditLines } from '@/lib/audit/data';
import { auditFilterFromParams, auditFilterSchema } from '@/lib/audit/schemas';
import { json, route } from '@/lib/http/route';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'audit.read' }, async ({ team, request }) => {
  const filter = parseWith(auditFilterSchema, auditFilterFromParams(new URL(request.url).searchParams));
  return json({ events: await listAuditLines(team!.teamId, filter) });
});
