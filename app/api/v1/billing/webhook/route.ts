import { json, route } from '@/lib/http/route';
import { receiveWebhook } from '@/lib/billing/webhooks';

export const dynamic = 'force-dynamic';

// Called by the payment service; trusted only through its signature (lib/billing/webhooks.ts).
export const POST = route({ access: 'public' }, async ({ request }) => {
  const result = await receiveWebhook(await request.text(), request.headers.get('stripe-signature'));
  return json({ received: true, outcome: result.outcome });
});
