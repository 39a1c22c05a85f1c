import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';
import { requireActor } from '@/lib/auth/current';

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  return (
    <div className="min-h-screen">
      <AppHeader actor={actor} />
      <main id="main" className="mx-auto max-w-7xl px-4 py-8">{children}</main>
    </div>
  );
}
