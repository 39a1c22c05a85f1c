'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { switchTeamAction } from '@/app/(app)/actions';
import type { TeamMembership } from '@/lib/auth/actor';
import { ROLE_LABELS } from '@/lib/permissions';

export function TeamSwitcher({ teams, activeTeamId }: { teams: TeamMembership[]; activeTeamId: string | null }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const active = teams.find((team) => team.teamId === activeTeamId);

  if (teams.length === 0) return <span className="text-sm text-graphite-500">No team</span>;
  if (teams.length === 1) {
    return (
      <div className="flex items-center gap-2 text-sm">
        <span className="font-medium">{teams[0].teamName}</span>
        <span className="rounded bg-paper-sunk px-2 py-0.5 text-xs text-graphite-700" data-testid="active-role">{ROLE_LABELS[teams[0].role]}</span>
      </div>
    );
  }

  return (
    <div className="flex items-center gap-2">
      <label htmlFor="team-switcher" className="sr-only">Team</label>
      <select
        id="team-switcher"
        className="rounded border border-graphite-200 bg-paper-raised py-1 pl-2 pr-7 text-sm"
        value={activeTeamId ?? ''}
        disabled={pending}
        onChange={(event) => {
          const teamId = event.target.value;
          startTransition(async () => {
            const result = await switchTeamAction(teamId);
            if (!result.ok) setError(result.error.message);
            else { setError(null); router.push('/projects'); router.refresh(); }
          });
        }}
      >
        {teams.map((team) => (
          <option key={team.teamId} value={team.teamId}>{team.teamName}</option>
        ))}
      </select>
      {active && <span className="rounded bg-paper-sunk px-2 py-0.5 text-xs text-graphite-700" data-testid="active-role">{ROLE_LABELS[active.role]}</span>}
      {error && <span role="alert" className="text-xs text-risk-ink">{error}</span>}
    </div>
  );
}
