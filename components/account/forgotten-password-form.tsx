'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { requestPasswordResetAction } from '@/app/(auth)/forgotten-password/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { passwordResetRequestSchema, type PasswordResetRequestInput } from '@/lib/account/schemas';

export function ForgottenPasswordForm() {
  const [serverError, setServerError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<PasswordResetRequestInput>({ resolver: zodResolver(passwordResetRequestSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await requestPasswordResetAction(values);
    if (!result.ok) { setServerError(result.error.message); return; }
    setSent(result.data.message);
  });

  if (sent) {
    return (
      <div className="space-y-4">
        <p role="status" className="text-sm">{sent}</p>
        <p className="text-sm"><Link href="/sign-in" className="text-select-ink underline">Back to sign in</Link></p>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Forgotten password">
      <p className="text-sm text-graphite-500">Enter the e-mail address of your account. We send a link to choose a new password.</p>
      <FormAlert message={serverError} />
      <TextField label="E-mail" type="email" autoComplete="username" error={formState.errors.email?.message} {...register('email')} />
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Sending…' : 'Send the link'}
      </button>
      <p className="text-center text-sm"><Link href="/sign-in" className="text-select-ink underline">Back to sign in</Link></p>
    </form>
  );
}
