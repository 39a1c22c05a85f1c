'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import type { ProjectSummary } from '@/lib/projects/data';

// Rename and archive (or restore) a project.
export function ProjectActions({ project }: { project: ProjectSummary }) {
  const router = useRouter();
  const [renaming, setRenaming] = useState(false);
  const [name, setName] = useState(project.name);
  const [error, setError] = useState<string | null>(null);

  async function patch(body: Record<string, unknown>) {
    const result = await apiFetch(`/api/v1/projects/${project.id}`, { method: 'PATCH', body: { version: project.version, ...body } });
    if (!result.ok) { setError(result.error.message); return false; }
    setError(null);
    router.refresh();
    return true;
  }

  return (
    <div className="flex flex-wrap items-center gap-2">
      {renaming ? (
        <form className="flex gap-2" onSubmit={async (event) => { event.preventDefault(); if (await patch({ name })) setRenaming(false); }}>
          <label htmlFor="project-rename" className="sr-only">Project name</label>
          <input id="project-rename" className="field-input mt-0 w-64" value={name} onChange={(event) => setName(event.target.value)} />
          <button type="submit" className="btn-primary">Save name</button>
          <button type="button" className="btn-quiet" onClick={() => { setRenaming(false); setName(project.name); }}>Cancel</button>
        </form>
      ) : (
        <button type="button" className="btn-quiet" onClick={() => setRenaming(true)}>Rename</button>
      )}
      <button type="button" className="btn-quiet" onClick={() => patch({ archived: !project.archived })}>
        {project.archived ? 'Restore from archive' : 'Archive'}
      </button>
      {error && <p role="alert" className="basis-full text-sm text-risk-ink">{error}</p>}
    </div>
  );
}
