import type { ReactNode } from 'react';
import { Refused } from '@/components/feedback/refused';
import { TeamTabs } from '@/components/team/team-tabs';
import { requireActor } from '@/lib/auth/current';
import { can, ROLE_LABELS } from '@/lib/permissions';

export default async function TeamSettingsLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  if (!actor.team || !can(actor.team.role, 'members.manage')) {
    return <Refused what="manage the team" role={actor.team ? ROLE_LABELS[actor.team.role] : 'person without a team'} />;
  }
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-xl font-semibold">Team settings</h1>
        <p className="text-sm text-graphite-500">{actor.team.teamName}</p>
      </div>
      <TeamTabs />
      {children}
    </div>
  );
}
