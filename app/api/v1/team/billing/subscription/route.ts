import { auditActorOf } from '@/lib/audit/record';
import { billingOverview } from '@/lib/billing/overview';
import { cancelSubscription } from '@/lib/billing/seats';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

export const DELETE = route({ access: 'billing.manage' }, async ({ team, actor }) => {
  await cancelSubscription(team!.teamId, auditActorOf(actor!));
  return json({ billing: await billingOverview(team!.teamId) }, 202);
});
