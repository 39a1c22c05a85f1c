import { json, route } from '@/lib/http/route';
import { checkDatabase } from '@/lib/health';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'public' }, async () => {
  const database = await checkDatabase();
  return json({ status: database.ok ? 'ok' : 'degraded', database }, database.ok ? 200 : 503);
});
