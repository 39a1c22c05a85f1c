'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { changePasswordAction } from '@/app/(app)/account/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import { passwordChangeSchema, type PasswordChangeInput } from '@/lib/account/schemas';

export function PasswordChangeForm() {
  const [serverError, setServerError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, formState, setError, reset } = useForm<PasswordChangeInput>({ resolver: zodResolver(passwordChangeSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    setDone(false);
    const result = await changePasswordAction(values);
    if (!result.ok) {
      showServerError(result.error, ['currentPassword', 'newPassword'], setError, (error) => setServerError(error.message));
      return;
    }
    reset({ currentPassword: '', newPassword: '' });
    setDone(true);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Change password">
      <FormAlert message={serverError} />
      {done && <p role="status" className="rounded bg-ok-soft px-3 py-2 text-sm"><span className="font-semibold">Changed: </span>your other sessions were signed out.</p>}
      <TextField label="Current password" id="password-current" type="password" autoComplete="current-password" error={formState.errors.currentPassword?.message} {...register('currentPassword')} />
      <TextField label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={formState.errors.newPassword?.message} {...register('newPassword')} />
      <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Change password'}</button>
    </form>
  );
}
