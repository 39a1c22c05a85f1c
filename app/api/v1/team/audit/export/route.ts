import { auditCsv } from '@/lib/audit/csv';
import { listAuditLines } from '@/lib/audit/data';
import { auditFilterFromParams, auditFilterSchema } from '@/lib/audit/schemas';
import { route } from '@/lib/http/route';
import { parseWith } from '@/lib/validation';

export const dynamic = 'force-dynamic';

const EXPORT_LIMIT = 50_000;

export const GET = route({ access: 'audit.read' }, async ({ team, request }) => {
  const filter = parseWith(auditFilterSchema, auditFilterFromParams(new URL(request.url).searchParams));
  const csv = auditCsv(await listAuditLines(team!.teamId, filter, EXPORT_LIMIT));
  return new Response(`\uFEFF${csv}`, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="antinode-audit-${new Date().toISOString().slice(0, 10)}.csv"`,
      'cache-control': 'no-store',
    },
  });
});
