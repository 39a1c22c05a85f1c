'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { inviteAction } from '@/app/(app)/team/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import type { ErrorBody } from '@/lib/errors';
import { invitationInputSchema, type InvitationInput } from '@/lib/team/schemas';
import { RoleSelect } from './role-select';

export function InviteForm() {
  const [serverError, setServerError] = useState<ErrorBody['error'] | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<InvitationInput>({
    resolver: zodResolver(invitationInputSchema),
    defaultValues: { email: '', role: 'acoustician' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    setSentTo(null);
    const result = await inviteAction(values);
    if (!result.ok) {
      showServerError(result.error, ['email'], setError, setServerError);
      return;
    }
    setSentTo(result.data.email);
    reset({ email: '', role: values.role });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Invite someone">
      <FormAlert message={serverError?.message ?? null} />
      {serverError?.field === 'seats' && (
        <p><Link href="/team/billing" className="btn-primary">Buy seats</Link></p>
      )}
      {sentTo && <p role="status" className="rounded bg-ok-soft px-3 py-2 text-sm"><span className="font-semibold">Sent: </span>an invitation is on its way to {sentTo}.</p>}
      <div className="grid gap-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end">
        <TextField label="E-mail" type="email" autoComplete="off" error={formState.errors.email?.message} {...register('email')} />
        <RoleSelect label="Role" error={formState.errors.role?.message} {...register('role')} />
        <button type="submit" className="btn-primary h-[38px]" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Sending…' : 'Send invitation'}
        </button>
      </div>
    </form>
  );
}
