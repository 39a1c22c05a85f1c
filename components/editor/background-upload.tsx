'use client';

import { useRouter } from 'next/navigation';
import { useRef, useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import type { ErrorBody } from '@/lib/errors';
import type { StoredDrawing } from '@/lib/uploads/data';

type Message = { ok: boolean; text: string; undo?: { uploadId: string | null } };
type Uploaded = Pick<StoredDrawing, 'id' | 'dxf'>;

/** What the person reads after an upload: for a DXF, whether its units set the scale. */
function uploadedWords(fileName: string, upload: Uploaded): string {
  const dxf = upload.dxf;
  if (!dxf) return `${fileName} is the plan drawing now.`;
  const layers = `${dxf.layerNames.length} layer${dxf.layerNames.length === 1 ? '' : 's'}`;
  return dxf.metresPerPixel
    ? `${fileName} is the plan drawing now (${layers}), at true size: the file is in ${dxf.unitsName}, so the scale is set from it.`
    : `${fileName} is the plan drawing now (${layers}). It states no units: set the scale from two points (K).`;
}

// Upload (or replace) the plan drawing: PNG, JPEG, WebP, the first page of a PDF, or a DXF, up to 20 MB.
// After an upload, Undo puts back the drawing the plan had before (or the blank grid).
export function BackgroundUpload({ planId, backgroundId, onUploaded }: { planId: string; backgroundId: string | null; onUploaded?: (upload: Uploaded) => void }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<Message | null>(null);
  const hasBackground = backgroundId !== null;

  async function undo(uploadId: string | null) {
    setBusy(true);
    const answer = await apiFetch(`/api/v1/plans/${planId}/background`, { method: 'PUT', body: { uploadId } });
    setBusy(false);
    if (!answer.ok) { setMessage({ ok: false, text: answer.error.message }); return; }
    setMessage({ ok: true, text: uploadId ? 'The earlier drawing is back.' : 'The plan is back on the blank grid.' });
    router.refresh();
  }

  async function upload(file: File) {
    setBusy(true);
    setMessage(null);
    const body = new FormData();
    body.append('file', file);
    try {
      const response = await fetch(`/api/v1/plans/${planId}/background`, { method: 'POST', body });
      if (!response.ok) {
        const error = ((await response.json().catch(() => null)) as ErrorBody | null)?.error;
        setMessage({ ok: false, text: error?.message ?? `The upload failed (${response.status}).` });
        return;
      }
      const { upload: stored } = (await response.json()) as { upload: Uploaded };
      setMessage({ ok: true, text: uploadedWords(file.name, stored), undo: { uploadId: backgroundId } });
      onUploaded?.(stored);
      router.refresh();
    } catch {
      setMessage({ ok: false, text: 'The server could not be reached; nothing changed.' });
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  }

  return (
    <div className="relative flex items-center gap-2">
      <input ref={input} type="file" accept="image/png,image/jpeg,image/webp,application/pdf,.dxf,image/vnd.dxf" className="sr-only" id="background-file" aria-label="Plan drawing file"
        onChange={(event) => { const file = event.target.files?.[0]; if (file) void upload(file); }} />
      <label htmlFor="background-file" className={`btn-quiet cursor-pointer whitespace-nowrap ${busy ? 'opacity-50' : ''}`}>{busy ? 'Uploading…' : hasBackground ? 'Replace drawing' : 'Upload drawing'}</label>
      {message && (
        <p role={message.ok ? 'status' : 'alert'} data-testid="upload-message"
          className={`absolute right-0 top-full z-30 mt-1 w-72 rounded border px-2 py-1 text-xs shadow-panel ${message.ok ? 'border-graphite-200 bg-paper-raised text-graphite-700' : 'border-risk bg-risk-soft text-risk-ink'}`}>
          {message.text}{' '}
          {message.undo && <button type="button" className="ml-1 underline" disabled={busy} onClick={() => void undo(message.undo!.uploadId)}>Undo</button>}
          <button type="button" className="ml-1 underline" onClick={() => setMessage(null)}>Dismiss</button>
        </p>
      )}
    </div>
  );
}
