import type { Metadata } from 'next';
import { BillingStateLabel } from '@/components/team/billing-state';
import { CancelSubscription } from '@/components/team/cancel-subscription';
import { SeatsForm } from '@/components/team/seats-form';
import { requireActor } from '@/lib/auth/current';
import { billingOverview } from '@/lib/billing/overview';
import { reconcileTeamForPage } from '@/lib/billing/reconcile';

export const metadata: Metadata = { title: 'Seats and billing' };

export default async function TeamBillingPage() {
  const actor = await requireActor();
  // The layout refuses anyone but an admin. The stored seats are first brought in line with the
  // payment service, so a webhook that never arrived does not leave the team behind.
  await reconcileTeamForPage(actor.team!.teamId);
  const billing = await billingOverview(actor.team!.teamId);
  return (
    <div className="space-y-6">
      <section className="panel p-4" aria-labelledby="seats-title">
        <div className="mb-3 flex items-center justify-between">
          <h2 id="seats-title" className="font-semibold">Seats</h2>
          <BillingStateLabel state={billing.state} />
        </div>
        <dl className="num grid grid-cols-[12rem_1fr] gap-y-2 text-sm">
          <dt className="text-graphite-500">Included</dt><dd>{billing.includedSeats}</dd>
          <dt className="text-graphite-500">Paid</dt><dd data-testid="paid-seats">{billing.paidSeats}</dd>
          <dt className="text-graphite-500">Seats in all</dt><dd data-testid="total-seats" className="font-semibold">{billing.seats}</dd>
          <dt className="text-graphite-500">In use</dt>
          <dd>{billing.usage.used} ({billing.usage.members} member{billing.usage.members === 1 ? '' : 's'}, {billing.usage.pendingInvitations} pending invitation{billing.usage.pendingInvitations === 1 ? '' : 's'})</dd>
          <dt className="text-graphite-500">Price</dt><dd>{billing.seatPrice} per paid seat per {billing.interval}: {billing.totalPerInterval} per {billing.interval}</dd>
        </dl>
        {billing.readOnly && (
          <p role="alert" className="mt-4 rounded border border-risk bg-risk-soft px-3 py-2 text-sm text-risk-ink">
            <span className="font-semibold">Payment failed{billing.paymentFailedAt ? ` on ${billing.paymentFailedAt.slice(0, 10)}` : ''}: </span>
            the team is read-only. Update the card with the payment service; editing comes back as soon as a payment goes through. You may also lower the paid seats or cancel.
          </p>
        )}
        {billing.requestedSeats !== null && (
          <p role="status" className="mt-4 rounded bg-select-soft px-3 py-2 text-sm text-select-ink" data-testid="seat-change-pending">
            <span className="font-semibold">Waiting for confirmation: </span>
            {billing.requestedSeats} paid seat{billing.requestedSeats === 1 ? '' : 's'} asked of the payment service. The count changes when it confirms; reload to check.
          </p>
        )}
      </section>
      <section className="panel p-4" aria-labelledby="change-title">
        <h2 id="change-title" className="mb-1 font-semibold">Buy or release seats</h2>
        <p className="mb-3 text-sm text-graphite-500">
          Every team has {billing.includedSeats} seats included. Paid seats come on top; you cannot go below the people who hold a seat now.
        </p>
        <SeatsForm paidSeats={billing.requestedSeats ?? billing.paidSeats} seatPrice={billing.seatPrice} interval={billing.interval} />
      </section>
      {billing.hasSubscription && (
        <section className="panel p-4" aria-labelledby="cancel-title">
          <h2 id="cancel-title" className="mb-1 font-semibold">Subscription</h2>
          <p className="mb-3 text-sm text-graphite-500">Cancelling ends the paid seats when the payment service confirms it.</p>
          <CancelSubscription includedSeats={billing.includedSeats} />
        </section>
      )}
    </div>
  );
}
