'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { acceptInvitationAction } from '@/app/(auth)/invitation/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import { acceptAsExistingSchema, acceptAsNewSchema, acceptInvitationSchema } from '@/lib/team/schemas';

export type AcceptMode = 'new' | 'existing' | 'signed-in';

const SCHEMAS = { new: acceptAsNewSchema, existing: acceptAsExistingSchema, 'signed-in': acceptInvitationSchema } as const;
type AcceptFields = z.input<typeof acceptInvitationSchema>;

export function AcceptInvitationForm({ token, mode, email, teamName }: { token: string; mode: AcceptMode; email: string; teamName: string }) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<AcceptFields>({ resolver: zodResolver(SCHEMAS[mode]), defaultValues: { token } });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await acceptInvitationAction(values);
    if (!result.ok) {
      showServerError(result.error, ['password', 'name'], setError, (error) => setServerError(error.message));
      return;
    }
    router.replace('/projects');
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Accept the invitation">
      <FormAlert message={serverError} />
      <input type="hidden" {...register('token')} />
      <TextField label="E-mail" type="email" value={email} readOnly autoComplete="username" hint="The invitation is for this address." />
      {mode === 'new' && (
        <>
          <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />
          <TextField label="Choose a password" type="password" autoComplete="new-password" hint="At least 10 characters." error={formState.errors.password?.message} {...register('password')} />
        </>
      )}
      {mode === 'existing' && (
        <>
          <p className="text-sm text-graphite-500">You already have an Antinode account with this address. Enter its password to add {teamName} to it.</p>
          <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register('password')} />
          <p className="text-sm"><Link href="/forgotten-password" className="text-select-ink underline">Forgotten your password?</Link></p>
        </>
      )}
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Joining…' : `Join ${teamName}`}
      </button>
    </form>
  );
}
