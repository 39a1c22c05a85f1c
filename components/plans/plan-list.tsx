import Link from 'next/link';
import type { PlanSummary } from '@/lib/plans/data';

export function PlanList({ plans, label }: { plans: PlanSummary[]; label: string }) {
  return (
    <section aria-label={label}>
      <h2 className="mb-2 text-sm font-semibold text-graphite-700">{label}</h2>
      <ul className="panel divide-y divide-graphite-100">
        {plans.map((plan) => (
          <li key={plan.id} className="flex items-center hover:bg-paper-sunk">
            <Link href={`/plans/${plan.id}`} className="flex flex-1 items-baseline justify-between gap-4 px-4 py-3">
              <span className="font-medium">{plan.name}</span>
              <span className="num text-xs text-graphite-500">
                {plan.hasBackground ? 'Drawing' : 'Blank grid'} · version {plan.version} · updated {plan.updatedAt.slice(0, 10)}
              </span>
            </Link>
            <Link href={`/plans/${plan.id}/revisions`} className="px-4 py-3 text-xs text-select-ink underline" aria-label={`Revisions of ${plan.name}`}>Revisions</Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
