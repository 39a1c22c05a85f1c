import type { Metadata } from 'next';
import { EmptyState } from '@/components/feedback/empty-state';
import { AuditFilterForm } from '@/components/team/audit-filter';
import { AuditTable } from '@/components/team/audit-table';
import { listAuditLines, listAuditPeople } from '@/lib/audit/data';
import { auditFilterFromParams, auditFilterSchema } from '@/lib/audit/schemas';
import { requireActor } from '@/lib/auth/current';
import { zodToAppError } from '@/lib/validation';

export const metadata: Metadata = { title: 'Audit log' };

export default async function TeamAuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requireActor();
  const teamId = actor.team!.teamId; // the layout refuses anyone but an admin
  const raw = auditFilterFromParams(await searchParams);
  const parsed = auditFilterSchema.safeParse(raw);
  const error = parsed.success ? null : zodToAppError(parsed.error);
  const filter = parsed.success ? parsed.data : {};
  const [lines, people] = await Promise.all([listAuditLines(teamId, filter), listAuditPeople(teamId)]);
  const query = new URLSearchParams(Object.entries(filter).filter((entry): entry is [string, string] => Boolean(entry[1])));
  return (
    <div className="space-y-4">
      <AuditFilterForm values={raw} people={people} error={error ? { field: error.field, message: error.message } : null} exportHref={`/api/v1/team/audit/export?${query}`} />
      {lines.length === 0 ? (
        <EmptyState title="Nothing in the log for this filter">
          Sign-ins, projects and plans, revisions, reviews, treatments, schedules, members, invitations and billing events are written here as they happen. Widen the filter to see more.
        </EmptyState>
      ) : (
        <AuditTable lines={lines} />
      )}
    </div>
  );
}
