import { z } from 'zod';
import { NOTIFICATION_KINDS } from './kinds';

// Shared by the account page's switches and their server action.
export const notificationSettingSchema = z.object({
  kind: z.enum(NOTIFICATION_KINDS, { error: 'Unknown kind of mail.' }),
  enabled: z.boolean({ error: 'enabled must be true or false' }),
});
export type NotificationSettingInput = z.infer<typeof notificationSettingSchema>;
