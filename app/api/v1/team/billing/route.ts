import { billingOverview } from '@/lib/billing/overview';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'billing.manage' }, async ({ team }) => json({ billing: await billingOverview(team!.teamId) }));
