import Link from 'next/link';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/permissions';
import { AccountMenu } from './account-menu';
import { TeamSwitcher } from './team-switcher';
import { Wordmark } from './wordmark';

// reviewsWaiting: for people who may review, how many revisions wait for them (null for others).
export function AppHeader({ actor, reviewsWaiting = null }: { actor: Actor; reviewsWaiting?: number | null }) {
  return (
    <header className="border-b border-graphite-100 bg-paper-raised">
      <div className="mx-auto flex h-14 max-w-7xl items-center gap-6 px-4">
        <Wordmark href="/projects" />
        <nav aria-label="Main" className="flex items-center gap-4 text-sm">
          <Link href="/projects" className="text-graphite-700 hover:text-graphite">Projects</Link>
          {reviewsWaiting !== null && (
            <Link href="/reviews" className="inline-flex items-center gap-1 whitespace-nowrap text-graphite-700 hover:text-graphite" data-testid="reviews-waiting"
              aria-label={`To review: ${reviewsWaiting} ${reviewsWaiting === 1 ? 'revision waits' : 'revisions wait'} for you`}>
              To review
              <span className={`num rounded-full px-1.5 text-xs font-semibold ${reviewsWaiting > 0 ? 'bg-select text-paper' : 'bg-paper-sunk text-graphite-500'}`}>{reviewsWaiting}</span>
            </Link>
          )}
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
