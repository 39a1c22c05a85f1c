'use client';

import { useRouter } from 'next/navigation';
import { useTransition } from 'react';
import { signOutAction } from '@/app/(app)/actions';

export function SignOutEverywhere() {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  return (
    <button
      type="button"
      className="btn-quiet"
      disabled={pending}
      onClick={() => startTransition(async () => { await signOutAction({ everywhere: true }); router.replace('/sign-in'); router.refresh(); })}
    >
      {pending ? 'Signing out…' : 'Sign out everywhere'}
    </button>
  );
}
