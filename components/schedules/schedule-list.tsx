'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/api-fetch';
import type { ScheduleSummary } from '@/lib/schedules/data';

/** How often the list asks again while a schedule is being rendered, ms. */
const RENDERING_POLL_MS = 1500;

export const schedulesKey = (revisionId: string) => ['schedules', revisionId] as const;

async function fetchSchedules(revisionId: string): Promise<ScheduleSummary[]> {
  const answer = await apiFetch<{ schedules: ScheduleSummary[] }>(`/api/v1/revisions/${revisionId}/schedules`);
  if (!answer.ok) throw new Error(answer.error.message);
  return answer.data.schedules;
}

const stamp = (iso: string) => `${iso.slice(0, 16).replace('T', ' ')} UTC`;

function ScheduleRow({ schedule }: { schedule: ScheduleSummary }) {
  if (schedule.status === 'rendering') {
    return (
      <li className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2" aria-busy="true">
        <span>Asked for by {schedule.issuedByName} on {stamp(schedule.askedAt)}</span>
        <span role="status" className="text-graphite-500">Rendering the PDF…</span>
      </li>
    );
  }
  if (schedule.status === 'failed') {
    return (
      <li className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
        <span>Asked for by {schedule.issuedByName} on {stamp(schedule.askedAt)}</span>
        <span role="alert" className="w-full text-risk-ink">{schedule.failure}</span>
      </li>
    );
  }
  return (
    <li className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
      <span>Issued by {schedule.issuedByName} on {stamp(schedule.askedAt)} · {((schedule.bytes ?? 0) / 1024).toFixed(0)} KB</span>
      <a className="btn-quiet" href={`/api/v1/schedules/${schedule.id}`} download={schedule.fileName}>Download PDF</a>
      <span className="num w-full break-all text-xs text-graphite-500">SHA-256 {schedule.sha256}</span>
    </li>
  );
}

// Schedules of a revision, newest first: issued ones with their checksum, ones being rendered with
// their progress (asked again until done, and still shown after a reload), failed ones with what to do.
export function ScheduleList({ revisionId, initial }: { revisionId: string; initial: ScheduleSummary[] }) {
  const query = useQuery({
    queryKey: schedulesKey(revisionId),
    queryFn: () => fetchSchedules(revisionId),
    initialData: initial,
    refetchInterval: (current) => (current.state.data?.some((schedule) => schedule.status === 'rendering') ? RENDERING_POLL_MS : false),
  });
  const schedules = query.data;
  if (schedules.length === 0) return <p className="text-sm text-graphite-500">Not issued yet. The preview shows what issuing would produce.</p>;
  return (
    <ul className="panel divide-y divide-graphite-100 text-sm" aria-label="Issued schedules">
      {schedules.map((schedule) => <ScheduleRow key={schedule.id} schedule={schedule} />)}
    </ul>
  );
}
