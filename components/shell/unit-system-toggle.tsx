'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { apiFetch } from '@/components/api-fetch';
import type { UnitSystem } from '@/models/user';

// SI or imperial display for this person; inputs accept either whichever is chosen.
export function UnitSystemToggle({ unitSystem }: { unitSystem: UnitSystem }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  async function choose(next: UnitSystem) {
    if (next === unitSystem) return;
    const result = await apiFetch('/api/v1/me/preferences', { method: 'PUT', body: { unitSystem: next } });
    if (!result.ok) { setError(result.error.message); return; }
    setError(null);
    router.refresh();
  }
  return (
    <div role="group" aria-label="Units shown" className="inline-flex items-center overflow-hidden rounded border border-graphite-200 text-xs">
      {(['si', 'imperial'] as const).map((option) => (
        <button key={option} type="button" aria-pressed={unitSystem === option} onClick={() => choose(option)}
          className={`px-2 py-1 ${unitSystem === option ? 'bg-graphite text-paper' : 'bg-paper-raised text-graphite-700 hover:bg-paper-sunk'}`}>
          {option === 'si' ? 'SI' : 'Imperial'}
        </button>
      ))}
      {error && <span role="alert" className="px-2 text-risk-ink">{error}</span>}
    </div>
  );
}
