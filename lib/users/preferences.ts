import { z } from 'zod';
import { User } from '@/models';

// Display preferences of one person (SI inside everywhere; conversion at the edges only).
export const preferencesSchema = z.object({
  unitSystem: z.enum(['si', 'imperial'], { error: "unitSystem must be 'si' or 'imperial'" }),
});
export type Preferences = z.infer<typeof preferencesSchema>;

export async function setPreferences(userId: string, preferences: Preferences): Promise<Preferences> {
  await User.update({ unitSystem: preferences.unitSystem }, { where: { id: userId } });
  return preferences;
}
