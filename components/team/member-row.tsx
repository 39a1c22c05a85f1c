'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { changeRoleAction, removeMemberAction } from '@/app/(app)/team/actions';
import type { ActionResult } from '@/lib/actions';
import { isRole, ROLE_LABELS, type Role } from '@/lib/permissions';
import type { MemberSummary } from '@/lib/team/members';
import { RoleSelect } from './role-select';

export function MemberRow({ member, isYou }: { member: MemberSummary; isYou: boolean }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [role, setRole] = useState<Role>(member.role);
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  function run(action: () => Promise<ActionResult<null>>, onFail?: () => void, onDone?: () => void) {
    setError(null);
    setSaved(null);
    startTransition(async () => {
      const result = await action();
      if (!result.ok) { setError(result.error.message); onFail?.(); return; }
      onDone?.();
      router.refresh();
    });
  }

  return (
    <li className="grid gap-2 px-4 py-3 sm:grid-cols-[1fr_14rem_auto] sm:items-center" aria-label={member.name}>
      <div className="min-w-0">
        <p className="truncate font-medium">{member.name}{isYou && <span className="ml-2 text-xs text-graphite-500">(you)</span>}</p>
        <p className="truncate text-sm text-graphite-500">{member.email}</p>
      </div>
      <RoleSelect
        label={`Role of ${member.name}`}
        hideLabel
        id={`role-${member.id}`}
        value={role}
        disabled={pending}
        onChange={(event) => {
          const next = event.target.value;
          if (!isRole(next)) return;
          const before = role;
          setRole(next);
          run(() => changeRoleAction(member.id, { role: next }), () => setRole(before), () => setSaved(`Saved: ${member.name} is now ${ROLE_LABELS[next].toLowerCase()}.`));
        }}
      />
      <div className="flex justify-end gap-2">
        {confirming ? (
          <>
            <button type="button" className="btn-risk" disabled={pending} onClick={() => run(() => removeMemberAction(member.id), () => setConfirming(false))}>
              Remove {member.name}
            </button>
            <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep</button>
          </>
        ) : (
          <button type="button" className="btn-quiet" disabled={pending} onClick={() => setConfirming(true)}>Remove…</button>
        )}
      </div>
      {error && <p role="alert" className="text-sm text-risk-ink sm:col-span-3"><span className="font-semibold">Not done: </span>{error}</p>}
      {saved && <p role="status" className="text-sm text-graphite-700 sm:col-span-3"><span aria-hidden="true">✓ </span>{saved}</p>}
    </li>
  );
}
