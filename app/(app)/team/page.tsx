import type { Metadata } from 'next';
import { EmptyState } from '@/components/feedback/empty-state';
import { InvitationRow } from '@/components/team/invitation-row';
import { InviteForm } from '@/components/team/invite-form';
import { MemberRow } from '@/components/team/member-row';
import { PracticeForm } from '@/components/team/practice-form';
import { requireActor } from '@/lib/auth/current';
import { teamStanding } from '@/lib/billing/standing';
import { listInvitations } from '@/lib/team/invitations';
import { listMembers } from '@/lib/team/members';
import { getPracticeSettings } from '@/lib/team/practice';
import { seatUsage } from '@/lib/team/seats';

export const metadata: Metadata = { title: 'Team settings' };

export default async function TeamMembersPage() {
  const actor = await requireActor();
  const teamId = actor.team!.teamId; // the layout refuses anyone but an admin
  const [members, invitations, standing, usage, practice] = await Promise.all([listMembers(teamId), listInvitations(teamId), teamStanding(teamId), seatUsage(teamId), getPracticeSettings(teamId)]);
  return (
    <div className="space-y-6">
      <section className="panel" aria-labelledby="members-title">
        <div className="flex items-baseline justify-between border-b border-graphite-100 px-4 py-3">
          <h2 id="members-title" className="font-semibold">Members</h2>
          <p className="num text-sm text-graphite-500" data-testid="seat-usage">{usage.used} of {standing.seats} seats in use</p>
        </div>
        <ul className="divide-y divide-graphite-100">
          {members.map((member) => <MemberRow key={member.id} member={member} isYou={member.userId === actor.user.id} />)}
        </ul>
      </section>
      <section className="panel p-4" aria-labelledby="invite-title">
        <h2 id="invite-title" className="mb-1 font-semibold">Invite someone</h2>
        <p className="mb-3 text-sm text-graphite-500">They get a mail with a link that works once, for 7 days. A pending invitation holds a seat.</p>
        <InviteForm />
      </section>
      <section className="panel p-4" aria-labelledby="practice-title">
        <h2 id="practice-title" className="mb-1 font-semibold">Practice on treatment schedules</h2>
        <p className="mb-3 text-sm text-graphite-500">The name and logo at the head of every page of the schedules this team issues.</p>
        <PracticeForm teamName={practice.teamName} practiceName={practice.practiceName} logo={practice.logo && { id: practice.logo.id, fileName: practice.logo.fileName }} />
      </section>
      <section aria-labelledby="invitations-title">
        <h2 id="invitations-title" className="mb-2 font-semibold">Pending invitations</h2>
        {invitations.length === 0 ? (
          <EmptyState title="No pending invitations">Invitations you send appear here until they are accepted or withdrawn.</EmptyState>
        ) : (
          <ul className="panel divide-y divide-graphite-100">
            {invitations.map((invitation) => <InvitationRow key={invitation.id} invitation={invitation} />)}
          </ul>
        )}
      </section>
    </div>
  );
}
