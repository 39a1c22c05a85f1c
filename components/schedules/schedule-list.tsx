import type { ScheduleSummary } from '@/lib/schedules/data';

// Issued schedules of a revision, newest first, each with its checksum.
export function ScheduleList({ schedules }: { schedules: ScheduleSummary[] }) {
  if (schedules.length === 0) return <p className="text-sm text-graphite-500">Not issued yet. The preview shows what issuing would produce.</p>;
  return (
    <ul className="panel divide-y divide-graphite-100 text-sm" aria-label="Issued schedules">
      {schedules.map((schedule) => (
        <li key={schedule.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
          <span>Issued by {schedule.issuedByName} on {schedule.issuedAt.slice(0, 16).replace('T', ' ')} UTC · {(schedule.bytes / 1024).toFixed(0)} KB</span>
          <a className="btn-quiet" href={`/api/v1/schedules/${schedule.id}`} download={schedule.fileName}>Download PDF</a>
          <span className="num w-full break-all text-xs text-graphite-500">SHA-256 {schedule.sha256}</span>
        </li>
      ))}
    </ul>
  );
}
