import type { ReactNode } from 'react';

export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-graphite-200 bg-paper-raised px-6 py-12 text-center">
      <h2 className="text-base font-semibold">{title}</h2>
      <div className="mx-auto mt-2 max-w-md text-sm text-graphite-500">{children}</div>
      {action && <div className="mt-6">{action}</div>}
    </div>
  );
}
