import { json, route } from '@/lib/http/route';
import { preferencesSchema, setPreferences } from '@/lib/users/preferences';

export const PUT = route({ access: 'signed-in', maxBodyBytes: 1024 }, async ({ actor, readJson }) => {
  const preferences = await readJson(preferencesSchema);
  return json({ preferences: await setPreferences(actor!.user.id, preferences) });
});
