import Link from 'next/link';

// Shown to everyone in a team whose payment failed: the team is read-only until it is paid.
export function ReadOnlyBanner({ failedAt, isAdmin }: { failedAt: string | null; isAdmin: boolean }) {
  return (
    <div role="status" className="border-b border-risk bg-risk-soft text-sm text-risk-ink" data-testid="read-only-banner">
      <div className="mx-auto max-w-7xl px-4 py-2">
        <span className="font-semibold">Read-only: </span>
        the team’s last payment failed{failedAt ? ` (${failedAt.slice(0, 10)})` : ''}. Everything is kept and can be read and exported; editing comes back once a payment goes through.{' '}
        {isAdmin
          ? <Link href="/team/billing" className="underline">Settle it under Seats and billing</Link>
          : 'A team admin can settle it.'}
      </div>
    </div>
  );
}
