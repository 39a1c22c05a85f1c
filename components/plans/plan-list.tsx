import Link from 'next/link';
import { WaitingMarker } from '@/components/revisions/waiting-marker';
import type { PlanSummary } from '@/lib/plans/data';

/** Per plan id: the revision waiting for review, and whether the reader is the one asked. */
export type PlanWaiting = Record<string, { number: number; link: string; forYou: boolean }>;

export function PlanList({ plans, label, waiting = {} }: { plans: PlanSummary[]; label: string; waiting?: PlanWaiting }) {
  return (
    <section aria-label={label}>
      <h2 className="mb-2 text-sm font-semibold text-graphite-700">{label}</h2>
      <ul className="panel divide-y divide-graphite-100">
        {plans.map((plan) => {
          const marker = waiting[plan.id];
          return (
            <li key={plan.id} className="flex flex-wrap items-center hover:bg-paper-sunk">
              <Link href={`/plans/${plan.id}`} className="flex min-w-0 flex-1 items-baseline justify-between gap-4 px-4 py-3">
                <span className="font-medium">{plan.name}</span>
                <span className="num text-xs text-graphite-500">
                  {plan.hasBackground ? 'Drawing' : 'Blank grid'} · version {plan.version} · updated {plan.updatedAt.slice(0, 10)}
                </span>
              </Link>
              {marker && (
                <Link href={marker.link} className="px-2 py-3" aria-label={`Revision ${marker.number} of ${plan.name} is waiting for ${marker.forYou ? 'your review' : 'review'}`}>
                  <WaitingMarker text={`Revision ${marker.number} waiting for ${marker.forYou ? 'your review' : 'review'}`} />
                </Link>
              )}
              <Link href={`/plans/${plan.id}/revisions`} className="px-4 py-3 text-xs text-select-ink underline" aria-label={`Revisions of ${plan.name}`}>Revisions</Link>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
