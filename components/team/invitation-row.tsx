'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { resendInvitationAction, revokeInvitationAction } from '@/app/(app)/team/actions';
import type { ActionResult } from '@/lib/actions';
import { ROLE_LABELS } from '@/lib/permissions';
import type { InvitationSummary } from '@/lib/team/invitations';

export function InvitationRow({ invitation }: { invitation: InvitationSummary }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  function run(action: () => Promise<ActionResult<null>>, done: string) {
    setMessage(null);
    startTransition(async () => {
      const result = await action();
      setMessage(result.ok ? { ok: true, text: done } : { ok: false, text: result.error.message });
      if (result.ok) router.refresh();
    });
  }

  const expired = invitation.status === 'expired';
  return (
    <li className="grid gap-2 px-4 py-3 sm:grid-cols-[1fr_auto] sm:items-center" aria-label={`Invitation to ${invitation.email}`}>
      <div className="min-w-0">
        <p className="truncate font-medium">{invitation.email}</p>
        <p className="text-sm text-graphite-500">
          {ROLE_LABELS[invitation.role]} ·{' '}
          {expired
            ? <span className="font-medium text-risk-ink">Expired {invitation.expiresAt.slice(0, 10)}</span>
            : <span>Waiting for an answer, link valid until {invitation.expiresAt.slice(0, 10)}</span>}
        </p>
      </div>
      <div className="flex justify-end gap-2">
        <button type="button" className="btn-quiet" disabled={pending} onClick={() => run(() => resendInvitationAction(invitation.id), `Sent again to ${invitation.email}.`)}>Send again</button>
        <button type="button" className="btn-quiet" disabled={pending} onClick={() => run(() => revokeInvitationAction(invitation.id), 'Withdrawn.')}>Withdraw</button>
      </div>
      {message && (
        <p role={message.ok ? 'status' : 'alert'} className={`text-sm sm:col-span-2 ${message.ok ? 'text-graphite-700' : 'text-risk-ink'}`}>
          <span className="font-semibold">{message.ok ? 'Done: ' : 'Not done: '}</span>{message.text}
        </p>
      )}
    </li>
  );
}
