'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signInAction } from '@/app/(auth)/actions';
import { signInSchema, type SignInInput } from '@/lib/auth/schemas';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';

export function SignInForm({ next }: { next?: string }) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await signInAction(values);
    if (!result.ok) {
      setServerError(result.error.message);
      return;
    }
    router.replace(next && next.startsWith('/') && !next.startsWith('//') ? next : '/projects');
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Sign in">
      <FormAlert message={serverError} />
      <TextField label="E-mail" type="email" autoComplete="username" error={formState.errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register('password')} />
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </button>
      <p className="text-center text-sm"><Link href="/forgotten-password" className="text-select-ink underline">Forgotten your password?</Link></p>
      <p className="text-center text-sm text-graphite-500">
        New to Antinode? <Link href="/sign-up" className="text-select-ink underline">Create an account and team</Link>
      </p>
    </form>
  );
}
