import { json, route } from '@/lib/http/route';
import { receiveWebhook } from '@/lib/billing/webhooks';

export const dynamic = 'force-dynamic';

// Called by the payment service; trusted only through its signature (lib/billing/webhooks.ts).
// Its events are a few KB: the body is read under the default limit like any other.
export const POST = route({ access: 'public' }, async ({ request, readText }) => {
  const result = await receiveWebhook(await readText(), request.headers.get('stripe-signature'));
  return json({ received: true, outcome: result.outcome });
});
