'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { cancelSubscriptionAction } from '@/app/(app)/team/actions';
import { FormAlert } from '@/components/forms/form-alert';

export function CancelSubscription({ includedSeats }: { includedSeats: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);

  return (
    <div className="space-y-2">
      <FormAlert message={error} />
      {confirming ? (
        <div className="flex flex-wrap items-center gap-2">
          <span className="text-sm">The team keeps its {includedSeats} included seats and all its work.</span>
          <button
            type="button"
            className="btn-risk"
            disabled={pending}
            onClick={() => startTransition(async () => {
              const result = await cancelSubscriptionAction();
              setConfirming(false);
              if (!result.ok) setError(result.error.message);
              else { setError(null); router.refresh(); }
            })}
          >
            {pending ? 'Cancelling…' : 'Cancel the subscription'}
          </button>
          <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep it</button>
        </div>
      ) : (
        <button type="button" className="btn-quiet" onClick={() => setConfirming(true)}>Cancel subscription…</button>
      )}
    </div>
  );
}
