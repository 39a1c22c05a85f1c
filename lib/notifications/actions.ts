'use server';

// The account page's mail switches.
import { runAction, type ActionResult } from '@/lib/actions';
import { currentActor } from '@/lib/auth/current';
import { notSignedIn } from '@/lib/errors';
import { parseWith } from '@/lib/validation';
import { notificationSettingSchema } from './schemas';
import { setNotificationSetting, type NotificationSettings } from './settings';

export async function changeNotificationSetting(input: unknown): Promise<ActionResult<NotificationSettings>> {
  return runAction('changeNotificationSetting', async () => {
    const actor = await currentActor();
    if (!actor) throw notSignedIn();
    return setNotificationSetting(actor.user.id, parseWith(notificationSettingSchema, input));
  });
}
