import type { NotificationSettings } from '@/lib/notifications/settings';
import { NotificationSettingsForm } from './notification-settings-form';

// The account page's "Notifications" section.
export function NotificationSettingsSection({ settings }: { settings: NotificationSettings }) {
  return (
    <section className="panel p-6" aria-labelledby="notifications-title">
      <h2 id="notifications-title" className="mb-1 font-semibold">Notifications</h2>
      <p className="mb-3 text-sm text-graphite-500">Mails Antinode sends you. Turn off any kind you do not want.</p>
      <NotificationSettingsForm initial={settings} />
    </section>
  );
}
