'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signUpAction } from '@/app/(auth)/actions';
import { signUpSchema, type SignUpInput } from '@/lib/auth/schemas';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';

export function SignUpForm() {
  const [serverError, setServerError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await signUpAction(values);
    if (!result.ok) {
      if (result.error.field === 'email') setError('email', { message: result.error.message });
      else setServerError(result.error.message);
      return;
    }
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
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Create an account">
      <FormAlert message={serverError} />
      <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." error={formState.errors.password?.message} {...register('password')} />
      <TextField label="Team name" hint="Your practice or group. You will be its admin and can invite others." error={formState.errors.teamName?.message} {...register('teamName')} />
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Sending…' : 'Create account and team'}
      </button>
      <p className="text-center text-sm text-graphite-500">
        Already have an account? <Link href="/sign-in" className="text-select-ink underline">Sign in</Link>
      </p>
    </form>
  );
}
