'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { requestSeatsAction } from '@/app/(app)/team/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import { seatChangeSchema, type SeatChangeInput } from '@/lib/billing/schemas';

export function SeatsForm({ paidSeats, seatPrice, interval }: { paidSeats: number; seatPrice: string; interval: string }) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<SeatChangeInput>({
    resolver: zodResolver(seatChangeSchema),
    defaultValues: { paidSeats },
  });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await requestSeatsAction(values);
    if (!result.ok) {
      showServerError(result.error, ['paidSeats'], setError, (error) => setServerError(error.message));
      return;
    }
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Change paid seats">
      <FormAlert message={serverError} />
      <div className="grid gap-3 sm:grid-cols-[12rem_max-content]">
        <TextField
          label="Paid seats"
          type="number"
          min={0}
          step={1}
          inputMode="numeric"
          hint={`${seatPrice} per seat per ${interval}`}
          error={formState.errors.paidSeats?.message}
          {...register('paidSeats', { valueAsNumber: true })}
        />
        <button type="submit" className="btn-primary h-[38px] self-start sm:mt-6" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Asking the payment service…' : 'Change paid seats'}
        </button>
      </div>
    </form>
  );
}
