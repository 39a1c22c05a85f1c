'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/forms/form-alert';
import { apiFetch } from '@/components/api-fetch';
import { newPlanSchema, type NewPlanInput } from '@/lib/plans/schemas';

export function NewPlanForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<NewPlanInput>({ resolver: zodResolver(newPlanSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await apiFetch<{ plan: { id: string } }>(`/api/v1/projects/${projectId}/plans`, { method: 'POST', body: values });
    if (!result.ok) { setServerError(result.error.message); return; }
    router.push(`/plans/${result.data.plan.id}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="panel flex flex-wrap items-start gap-3 p-4" aria-label="New plan">
      <div className="min-w-64 flex-1">
        <label htmlFor="plan-name" className="sr-only">Plan name</label>
        <input id="plan-name" className="field-input mt-0" placeholder="New plan name, e.g. Level 2 ceiling void" aria-invalid={formState.errors.name ? true : undefined} {...register('name')} />
        {formState.errors.name && <p className="field-error" role="alert">{formState.errors.name.message}</p>}
      </div>
      <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Adding…' : 'Add plan'}</button>
      <div className="basis-full"><FormAlert message={serverError} /></div>
    </form>
  );
}
