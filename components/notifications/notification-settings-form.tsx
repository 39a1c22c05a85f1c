'use client';

import { useState } from 'react';
import { FormAlert } from '@/components/forms/form-alert';
import { NOTIFICATION_KINDS, NOTIFICATION_LABELS } from '@/lib/notifications/kinds';
import { changeNotificationSetting } from '@/lib/notifications/actions';
import type { NotificationSettings } from '@/lib/notifications/settings';

// One switch per kind of mail; each change is saved at once.
export function NotificationSettingsForm({ initial }: { initial: NotificationSettings }) {
  const [settings, setSettings] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const change = async (kind: (typeof NOTIFICATION_KINDS)[number], enabled: boolean) => {
    setError(null);
    const result = await changeNotificationSetting({ kind, enabled });
    if (!result.ok) { setError(result.error.message); return; }
    setSettings(result.data);
    setSaved(`${NOTIFICATION_LABELS[kind].title}: ${enabled ? 'on' : 'off'}`);
  };
  return (
    <div className="space-y-3">
      {NOTIFICATION_KINDS.map((kind) => (
        <label key={kind} className="flex items-start gap-3 text-sm">
          <input type="checkbox" className="mt-1" checked={settings[kind]} onChange={(event) => change(kind, event.target.checked)} />
          <span><span className="font-medium">{NOTIFICATION_LABELS[kind].title}</span><span className="block text-graphite-500">{NOTIFICATION_LABELS[kind].detail}</span></span>
        </label>
      ))}
      <FormAlert message={error} />
      {saved && <p role="status" className="text-xs text-graphite-500">Saved. {saved}.</p>}
    </div>
  );
}
