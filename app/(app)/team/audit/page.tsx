import type { Metadata } from 'next';
import { EmptyState } from '@/components/feedback/empty-state';
import { AuditFilterForm } from '@/components/team/audit-filter';
import { AuditTable } from '@/components/team/audit-table';
import { listAuditLines } from '@/lib/audit/data';
import { auditFilterFromParams, auditFilterSchema } from '@/lib/audit/schemas';
import { requireActor } from '@/lib/auth/current';
import { zodToAppError } from '@/lib/validation';

export const metadata: Metadata = { title: 'Audit log' };

export default async function TeamAuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requireActor();
  const raw = auditFilterFromParams(await searchParams) as { area?: string; from?: string; to?: string };
  const parsed = auditFilterSchema.safeParse(raw);
  const error = parsed.success ? null : zodToAppError(parsed.error);
  const filter = parsed.success ? parsed.data : {};
  const lines = await listAuditLines(actor.team!.teamId, filter); // the layout refuses anyone but an admin
  const query = new URLSearchParams(Object.entries(filter).filter((entry): entry is [string, string] => Boolean(entry[1])));
  return (
    <div className="space-y-4">
      <AuditFilterForm values={raw} error={error ? { field: error.field, message: error.message } : null} exportHref={`/api/v1/team/audit/export?${query}`} />
      {lines.length === 0 ? (
        <EmptyState title="Nothing in the log for this filter">Invitations, role changes, removals and billing events are written here as they happen.</EmptyState>
      ) : (
        <AuditTable lines={lines} />
      )}
    </div>
  );
}
