'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { createProjectAction } from '@/app/(app)/projects/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { projectInputSchema, type ProjectInput } from '@/lib/projects/schemas';

export function ProjectForm() {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<ProjectInput>({ resolver: zodResolver(projectInputSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const result = await createProjectAction(values);
    if (!result.ok) { setServerError(result.error.message); return; }
    router.push(`/projects/${result.data.id}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="New project">
      <FormAlert message={serverError} />
      <TextField label="Project name" placeholder="e.g. the building's name" error={formState.errors.name?.message} {...register('name')} />
      <TextField label="Site" hint="Optional: address or part of the building." error={formState.errors.site?.message} {...register('site')} />
      <div className="flex gap-2">
        <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Creating…' : 'Create project'}</button>
        <button type="button" className="btn-quiet" onClick={() => router.back()}>Cancel</button>
      </div>
    </form>
  );
}
