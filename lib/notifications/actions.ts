'use server';

// The account page's mail switches.
import { runAction, type ActionResult } from '@/lib/actions';
import { currentActor } from '@/lib/auth/current';
import { notSignedIn } from '@/lib/errors';
import { zodToAppError } from '@/lib/validation';
import { notificationSettingSchema } from './schemas';
import { setNotificationSetting, type NotificationSettings } from './settings';

export async function changeNotificationSetting(input: unknown): Promise<ActionResult<NotificationSettings>> {
  return runAction('changeNotificationSetting', async () => {
    const actor = await currentActor();
    if (!actor) throw notSignedIn();
    const parsed = notificationSettingSchema.safeParse(input);
    if (!parsed.success) throw zodToAppError(parsed.error);
    return setNotificationSetting(actor.user.id, parsed.data);
  });
}
