'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { setPracticeNameAction } from '@/app/(app)/team/actions';
import { FormAlert } from '@/components/forms/form-alert';
import { showServerError } from '@/components/forms/server-error';
import { TextField } from '@/components/forms/text-field';
import type { ErrorBody } from '@/lib/errors';
import { practiceNameSchema, type PracticeNameInput } from '@/lib/team/schemas';

interface PracticeFormProps {
  teamName: string;
  practiceName: string;
  logo: { id: string; fileName: string } | null;
}

// The practice's name and logo, printed at the head of every page of the team's treatment schedules.
export function PracticeForm({ teamName, practiceName, logo }: PracticeFormProps) {
  const router = useRouter();
  const file = useRef<HTMLInputElement>(null);
  const [serverError, setServerError] = useState<ErrorBody['error'] | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [logoMessage, setLogoMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const { register, handleSubmit, formState, setError } = useForm<PracticeNameInput>({ resolver: zodResolver(practiceNameSchema), defaultValues: { practiceName } });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    setSaved(null);
    const result = await setPracticeNameAction(values);
    if (!result.ok) {
      showServerError(result.error, ['practiceName'], setError, setServerError);
      return;
    }
    setSaved(result.data.practiceName ? `Schedules now carry “${result.data.practiceName}”.` : `Schedules now carry the team’s name, “${teamName}”.`);
  });

  async function send(method: 'POST' | 'DELETE', chosen?: File) {
    setBusy(true);
    setLogoMessage(null);
    const body = chosen ? new FormData() : undefined;
    if (chosen) body!.append('file', chosen);
    try {
      const response = await fetch('/api/v1/team/practice/logo', { method, body });
      if (!response.ok) {
        const error = ((await response.json().catch(() => null)) as ErrorBody | null)?.error;
        setLogoMessage({ ok: false, text: error?.message ?? `The logo could not be changed (${response.status}).` });
        return;
      }
      setLogoMessage({ ok: true, text: chosen ? `${chosen.name} is the practice’s logo now.` : 'The logo is removed; schedules carry the name alone.' });
      router.refresh();
    } catch {
      setLogoMessage({ ok: false, text: 'The server could not be reached; nothing changed.' });
    } finally {
      setBusy(false);
      if (file.current) file.current.value = '';
    }
  }

  return (
    <div className="space-y-4">
      <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Practice name">
        <FormAlert message={serverError?.message ?? null} />
        {saved && <p role="status" className="rounded bg-ok-soft px-3 py-2 text-sm">{saved}</p>}
        <div className="grid gap-3 sm:grid-cols-[1fr_auto] sm:items-end">
          <TextField label="Practice name" placeholder={teamName} autoComplete="organization" error={formState.errors.practiceName?.message} {...register('practiceName')} />
          <button type="submit" className="btn-primary h-[38px]" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : 'Save name'}</button>
        </div>
        <p className="text-xs text-graphite-500">Left empty, schedules carry the team’s name, “{teamName}”.</p>
      </form>
      <div className="flex flex-wrap items-center gap-3" aria-label="Practice logo" role="group">
        {logo ? (
          <img src={`/api/v1/uploads/${logo.id}`} alt={`Logo: ${logo.fileName}`} className="h-12 max-w-[10rem] rounded border border-graphite-100 object-contain p-1" />
        ) : <p className="text-sm text-graphite-500">No logo yet: schedules carry the name alone.</p>}
        <input ref={file} id="practice-logo" type="file" accept="image/png,image/jpeg" className="sr-only" aria-label="Logo file"
          onChange={(event) => { const chosen = event.target.files?.[0]; if (chosen) void send('POST', chosen); }} />
        <label htmlFor="practice-logo" className={`btn-quiet cursor-pointer ${busy ? 'opacity-50' : ''}`}>{busy ? 'Uploading…' : logo ? 'Replace logo' : 'Upload logo'}</label>
        {logo && <button type="button" className="btn-quiet" disabled={busy} onClick={() => void send('DELETE')}>Remove logo</button>}
        <p className="w-full text-xs text-graphite-500">PNG or JPEG, up to 1 MB and 2000 px a side; it prints at the head of every page.</p>
        {logoMessage && <p role={logoMessage.ok ? 'status' : 'alert'} className={`w-full rounded px-3 py-2 text-sm ${logoMessage.ok ? 'bg-ok-soft' : 'border border-risk bg-risk-soft text-risk-ink'}`}>{logoMessage.text}</p>}
      </div>
    </div>
  );
}
