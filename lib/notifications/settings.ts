// Each person's mail switches: a kind with no row is on.
import { NotificationSetting } from '@/models';
import { NOTIFICATION_KINDS, type NotificationKind } from './kinds';
import type { NotificationSettingInput } from './schemas';

export type NotificationSettings = Record<NotificationKind, boolean>;

export async function notificationSettings(userId: string): Promise<NotificationSettings> {
  const rows = await NotificationSetting.findAll({ where: { userId } });
  const settings = Object.fromEntries(NOTIFICATION_KINDS.map((kind) => [kind, true])) as NotificationSettings;
  for (const row of rows) if ((NOTIFICATION_KINDS as readonly string[]).includes(row.kind)) settings[row.kind as NotificationKind] = row.enabled;
  return settings;
}

export async function setNotificationSetting(userId: string, input: NotificationSettingInput): Promise<NotificationSettings> {
  await NotificationSetting.upsert({ userId, kind: input.kind, enabled: input.enabled }, { conflictFields: ['user_id', 'kind'] as never });
  return notificationSettings(userId);
}

export async function wantsMail(userId: string, kind: NotificationKind): Promise<boolean> {
  const row = await NotificationSetting.findOne({ where: { userId, kind } });
  return row ? row.enabled : true;
}
