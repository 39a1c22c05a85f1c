import { auditActorOf } from '@/lib/audit/record';
import { billingOverview } from '@/lib/billing/overview';
import { seatChangeSchema } from '@/lib/billing/schemas';
import { requestPaidSeats } from '@/lib/billing/seats';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

// Asks the payment service for a new count; the team's seats change when its webhook arrives (202).
export const PUT = route({ access: 'billing.manage', maxBodyBytes: 1024 }, async ({ team, actor, readJson }) => {
  const { paidSeats } = await readJson(seatChangeSchema);
  await requestPaidSeats(team!.teamId, auditActorOf(actor!), paidSeats);
  return json({ billing: await billingOverview(team!.teamId) }, 202);
});
