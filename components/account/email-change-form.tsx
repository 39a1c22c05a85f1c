'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { changeEmailAction } from '@/app/(app)/account/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import { emailChangeSchema, type EmailChangeInput } from '@/lib/account/schemas';

export function EmailChangeForm({ email }: { email: string }) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, resetField } = useForm<EmailChangeInput>({ resolver: zodResolver(emailChangeSchema), defaultValues: { email } });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    setDone(null);
    const result = await changeEmailAction(values);
    if (!result.ok) {
      showServerError(result.error, ['currentPassword', 'email'], setError, (error) => setServerError(error.message));
      return;
    }
    resetField('currentPassword', { defaultValue: '' });
    setDone(result.data.email);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Change e-mail">
      <FormAlert message={serverError} />
      {done && <p role="status" className="rounded bg-ok-soft px-3 py-2 text-sm"><span className="font-semibold">Changed: </span>sign in with {done} from now on.</p>}
      <TextField label="New e-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register('email')} />
      <TextField label="Current password" id="email-current-password" type="password" autoComplete="current-password" error={formState.errors.currentPassword?.message} {...register('currentPassword')} />
      <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Change e-mail'}</button>
    </form>
  );
}
