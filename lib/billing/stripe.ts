// The payment service client. STRIPE_API_HOST/PORT/PROTOCOL point it at the local fake
// under npm start and npm test; unset, the SDK talks to the real service.
import Stripe from 'stripe';
import { AppError } from '@/lib/errors';

let client: Stripe | null = null;

export function paymentService(): Stripe {
  if (client) return client;
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new AppError('internal', 'Billing is not configured on this server (STRIPE_SECRET_KEY is missing).');
  client = new Stripe(key, {
    host: process.env.STRIPE_API_HOST || undefined,
    port: process.env.STRIPE_API_PORT || undefined,
    protocol: (process.env.STRIPE_API_PROTOCOL as 'http' | 'https' | undefined) || undefined,
    maxNetworkRetries: 1,
    timeout: 10_000,
    telemetry: false,
  });
  return client;
}

export function webhookSecret(): string {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new AppError('internal', 'Billing is not configured on this server (STRIPE_WEBHOOK_SECRET is missing).');
  return secret;
}

// Errors from the payment service become one clear message; nothing was changed here.
export async function callPaymentService<T>(what: string, body: () => Promise<T>): Promise<T> {
  try {
    return await body();
  } catch (error) {
    if (error instanceof Stripe.errors.StripeError) {
      console.error(`[billing] ${what} failed`, error.message);
      throw new AppError('conflict', `The payment service could not ${what}: ${error.message} Nothing was changed; try again.`);
    }
    throw error;
  }
}
