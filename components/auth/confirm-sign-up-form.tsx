'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { confirmSignUpAction } from '@/app/(auth)/actions';
import { FormAlert } from '@/components/forms/form-alert';

export function ConfirmSignUpForm({ token }: { token: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [serverError, setServerError] = useState<string | null>(null);

  function confirm() {
    setServerError(null);
    startTransition(async () => {
      const result = await confirmSignUpAction({ token });
      if (!result.ok) { setServerError(result.error.message); return; }
      router.replace('/projects');
      router.refresh();
    });
  }

  return (
    <div className="space-y-4">
      <p className="text-sm text-graphite-500">This creates your account with the details you gave, and your team, with you as its admin.</p>
      <FormAlert message={serverError} />
      <button type="button" className="btn-primary w-full" disabled={pending} onClick={confirm}>
        {pending ? 'Creating…' : 'Create account and team'}
      </button>
      <p className="text-center text-sm"><Link href="/sign-in" className="text-select-ink underline">Sign in instead</Link></p>
    </div>
  );
}
