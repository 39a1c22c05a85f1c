'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { resetPasswordAction } from '@/app/(auth)/forgotten-password/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { passwordResetSchema, type PasswordResetInput } from '@/lib/account/schemas';

export function ResetPasswordForm({ token }: { token: string }) {
  const [serverError, setServerError] = useState<{ message: string; linkProblem: boolean } | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, formState } = useForm<PasswordResetInput>({ resolver: zodResolver(passwordResetSchema), defaultValues: { token, password: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await resetPasswordAction(values);
    if (!result.ok) { setServerError({ message: result.error.message, linkProblem: result.error.field === 'token' }); return; }
    setDone(true);
  });

  if (done) {
    return (
      <div className="space-y-4">
        <p role="status" className="text-sm"><span className="font-semibold">Password changed. </span>Every session of the account was signed out; sign in with the new password.</p>
        <Link href="/sign-in" className="btn-primary w-full">Sign in</Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Choose a new password">
      <FormAlert message={serverError?.message ?? null} />
      {serverError?.linkProblem && <p className="text-sm"><Link href="/forgotten-password" className="text-select-ink underline">Ask for a new link</Link></p>}
      <input type="hidden" {...register('token')} />
      <TextField label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={formState.errors.password?.message} {...register('password')} />
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Saving…' : 'Set the new password'}
      </button>
    </form>
  );
}
