import Link from 'next/link';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/permissions';
import { AccountMenu } from './account-menu';
import { TeamSwitcher } from './team-switcher';
import { Wordmark } from './wordmark';

export function AppHeader({ actor }: { actor: Actor }) {
  return (
    <header className="border-b border-graphite-100 bg-paper-raised">
      <div className="mx-auto flex h-14 max-w-7xl items-center gap-6 px-4">
        <Wordmark href="/projects" />
        <nav aria-label="Main" className="flex items-center gap-4 text-sm">
          <Link href="/projects" className="text-graphite-700 hover:text-graphite">Projects</Link>
          {actor.team && can(actor.team.role, 'members.manage') && (
            <Link href="/team" className="text-graphite-700 hover:text-graphite">Team settings</Link>
          )}
        </nav>
        <div className="ml-auto flex items-center gap-4">
          <TeamSwitcher teams={actor.memberships} activeTeamId={actor.team?.teamId ?? null} />
          <AccountMenu name={actor.user.name} email={actor.user.email} />
        </div>
      </div>
    </header>
  );
}
