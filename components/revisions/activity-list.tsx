import Link from 'next/link';
import type { ActivityLine } from '@/lib/activity/data';

// Who did what on a plan, newest first.
export function ActivityList({ lines }: { lines: ActivityLine[] }) {
  if (lines.length === 0) return <p className="text-sm text-graphite-500">Nothing has happened on this plan yet. Submitting it for review starts the list.</p>;
  return (
    <ol className="panel divide-y divide-graphite-100 text-sm" aria-label="Activity">
      {lines.map((line) => (
        <li key={line.id} className="flex flex-wrap items-baseline gap-x-3 px-4 py-2">
          <time className="num text-xs text-graphite-500" dateTime={line.at}>{line.at.slice(0, 16).replace('T', ' ')} UTC</time>
          <span className="font-medium">{line.actorName}</span>
          <span>{line.label}</span>
          <span className="text-graphite-500">{line.link ? <Link href={line.link} className="underline">{line.summary}</Link> : line.summary}</span>
        </li>
      ))}
    </ol>
  );
}
