'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

const TABS = [
  { href: '/team', label: 'Members and invitations' },
  { href: '/team/billing', label: 'Seats and billing' },
  { href: '/team/audit', label: 'Audit log' },
] as const;

export function TeamTabs() {
  const pathname = usePathname();
  return (
    <nav aria-label="Team settings" className="flex gap-1 border-b border-graphite-100 text-sm">
      {TABS.map((tab) => {
        const current = pathname === tab.href;
        return (
          <Link
            key={tab.href}
            href={tab.href}
            aria-current={current ? 'page' : undefined}
            className={`-mb-px border-b-2 px-3 py-2 ${current ? 'border-select font-medium text-graphite' : 'border-transparent text-graphite-500 hover:text-graphite'}`}
          >
            {tab.label}
          </Link>
        );
      })}
    </nav>
  );
}
