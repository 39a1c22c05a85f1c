import type { ReactNode } from 'react';
import { Providers } from '@/components/providers';
import { AppHeader } from '@/components/shell/app-header';
import { requireActor } from '@/lib/auth/current';
import { reviewsWaitingCount } from '@/lib/reviews/waiting';

// The plan editor uses the whole window below the header.
export default async function EditorLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  const reviewsWaiting = await reviewsWaitingCount(actor.user.id, actor.team);
  return (
    <div className="flex h-screen flex-col overflow-hidden">
      <AppHeader actor={actor} reviewsWaiting={reviewsWaiting} />
      <main id="main" className="min-h-0 flex-1"><Providers>{children}</Providers></main>
    </div>
  );
}
