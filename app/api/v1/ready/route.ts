import { json, route } from '@/lib/http/route';
import { checkDatabase, checkStore } from '@/lib/health';

export const dynamic = 'force-dynamic';

// Readiness for a load balancer: 200 only when this instance can serve, its database and its file
// store both answering; 503 naming the one that does not. (The health route says only that the
// process answers and its database connection works.)
export const GET = route({ access: 'public' }, async () => {
  const [database, store] = await Promise.all([checkDatabase(), checkStore()]);
  const ready = database.ok && store.ok;
  return json({ status: ready ? 'ready' : 'not ready', database, store }, ready ? 200 : 503);
});
