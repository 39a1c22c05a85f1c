import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';
import { ReadOnlyBanner } from '@/components/shell/read-only-banner';
import { requireActor } from '@/lib/auth/current';
import { reconcileTeamForPage } from '@/lib/billing/reconcile';
import { teamStanding } from '@/lib/billing/standing';
import { can } from '@/lib/permissions';
import { reviewsWaitingCount } from '@/lib/reviews/waiting';

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  let standing = actor.team ? await teamStanding(actor.team.teamId) : null;
  if (actor.team && standing?.readOnly) {
    // Read-only until the payment service says the invoice is paid: ask it, in case that word was lost.
    await reconcileTeamForPage(actor.team.teamId);
    standing = await teamStanding(actor.team.teamId);
  }
  const reviewsWaiting = await reviewsWaitingCount(actor.user.id, actor.team);
  return (
    <div className="min-h-screen">
      <AppHeader actor={actor} reviewsWaiting={reviewsWaiting} />
      {standing?.readOnly && <ReadOnlyBanner failedAt={standing.paymentFailedAt} isAdmin={can(actor.team!.role, 'billing.manage')} />}
      <main id="main" className="mx-auto max-w-7xl px-4 py-8">{children}</main>
    </div>
  );
}
