import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';
import { ReadOnlyBanner } from '@/components/shell/read-only-banner';
import { requireActor } from '@/lib/auth/current';
import { teamStanding } from '@/lib/billing/standing';
import { can } from '@/lib/permissions';
import { reviewsWaitingCount } from '@/lib/reviews/waiting';

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  const standing = actor.team ? await teamStanding(actor.team.teamId) : null;
  const reviewsWaiting = await reviewsWaitingCount(actor.user.id, actor.team);
  return (
    <div className="min-h-screen">
      <AppHeader actor={actor} reviewsWaiting={reviewsWaiting} />
      {standing?.readOnly && <ReadOnlyBanner failedAt={standing.paymentFailedAt} isAdmin={can(actor.team!.role, 'billing.manage')} />}
      <main id="main" className="mx-auto max-w-7xl px-4 py-8">{children}</main>
    </div>
  );
}
