import type { Metadata } from 'next';
import { EmailChangeForm } from '@/components/account/email-change-form';
import { NotificationSettingsSection } from '@/components/notifications/notification-settings-section';
import { PasswordChangeForm } from '@/components/account/password-change-form';
import { SignOutEverywhere } from '@/components/shell/sign-out-everywhere';
import { requireActor } from '@/lib/auth/current';
import { notificationSettings } from '@/lib/notifications/settings';
import { ROLE_LABELS, ROLES } from '@/lib/permissions';
import { ApiTokensSection } from '@/components/account/api-tokens-section';
import { roleWithin } from '@/lib/auth/api-tokens';

export const metadata: Metadata = { title: 'Account' };

export default async function AccountPage() {
  const actor = await requireActor();
  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <h1 className="text-xl font-semibold">Account</h1>
      <section className="panel p-6" aria-labelledby="profile-title">
        <h2 id="profile-title" className="mb-3 font-semibold">Profile</h2>
        <dl className="grid grid-cols-[10rem_1fr] gap-y-2 text-sm">
          <dt className="text-graphite-500">Name</dt><dd>{actor.user.name}</dd>
          <dt className="text-graphite-500">E-mail</dt><dd>{actor.user.email}</dd>
          <dt className="text-graphite-500">Units</dt><dd>{actor.user.unitSystem === 'si' ? 'SI (metres, °C)' : 'Imperial (feet and inches, °F)'}</dd>
        </dl>
      </section>
      <section className="panel p-6" aria-labelledby="email-title">
        <h2 id="email-title" className="mb-1 font-semibold">E-mail</h2>
        <p className="mb-3 text-sm text-graphite-500">You sign in with this address and mail from Antinode goes to it.</p>
        <EmailChangeForm email={actor.user.email} />
      </section>
      <section className="panel p-6" aria-labelledby="password-title">
        <h2 id="password-title" className="mb-1 font-semibold">Password</h2>
        <p className="mb-3 text-sm text-graphite-500">Changing it signs out your other sessions; this one stays.</p>
        <PasswordChangeForm />
      </section>
      <NotificationSettingsSection settings={await notificationSettings(actor.user.id)} />
      <section className="panel p-6" aria-labelledby="teams-title">
        <h2 id="teams-title" className="mb-3 font-semibold">Teams</h2>
        <ul className="divide-y divide-graphite-100 text-sm">
          {actor.memberships.map((membership) => (
            <li key={membership.teamId} className="flex justify-between py-2">
              <span>{membership.teamName}</span>
              <span className="text-graphite-500">{ROLE_LABELS[membership.role]}</span>
            </li>
          ))}
        </ul>
      </section>
      <ApiTokensSection teams={actor.memberships.map((membership) => ({ teamId: membership.teamId, teamName: membership.teamName, roles: ROLES.filter((role) => roleWithin(role, membership.role)) }))} />
      <section className="panel p-6" aria-labelledby="sessions-title">
        <h2 id="sessions-title" className="mb-1 font-semibold">Sessions</h2>
        <p className="mb-3 text-sm text-graphite-500">Ends every session of this account, on every device.</p>
        <SignOutEverywhere />
      </section>
    </div>
  );
}
