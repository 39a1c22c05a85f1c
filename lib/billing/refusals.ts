// Refused webhook deliveries that carry no genuine event (unsigned, a wrong signature, a stamp
// outside the tolerance, too large) are counted per kind and hour in one row each
// (billing_refusals), not logged one row per request: anyone can send them, as many as they
// like. The server log gets the first of each kind in an hour, then every hundredth.
import { QueryTypes } from 'sequelize';
import { sequelize } from '@/lib/db';

export type RefusalKind = 'unsigned' | 'bad_signature' | 'stale' | 'future' | 'too_large' | 'repeated_malformed';

export async function countRefusal(kind: RefusalKind, reason: string): Promise<number> {
  const [row] = await sequelize.query<{ count: number }>(
    `insert into billing_refusals (kind, window_start, count, last_reason, last_at)
     values (:kind, date_trunc('hour', now()), 1, :reason, now())
     on conflict (kind, window_start) do update
       set count = billing_refusals.count + 1, last_reason = excluded.last_reason, last_at = excluded.last_at
     returning count`,
    { replacements: { kind, reason: reason.slice(0, 500) }, type: QueryTypes.SELECT },
  );
  const count = Number(row?.count ?? 0);
  if (count === 1 || count % 100 === 0) console.warn(`[billing] webhook refused (${kind}, ${count} this hour): ${reason}`);
  return count;
}
