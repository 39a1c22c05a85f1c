// Billing settings, all from the environment (defaults in DEVELOPERS.md). Prices and the
// currency are configuration: the seat price lives in the payment service under
// BILLING_SEAT_PRICE_ID; the amount shown here must match it.
function positiveInteger(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0) throw new Error(`${name} must be a whole number of 0 or more (got "${raw}")`);
  return value;
}

export interface BillingConfig {
  includedSeats: number;
  seatPriceId: string;
  seatPriceMinor: number;
  currency: string;
  interval: string;
}

export function billingConfig(): BillingConfig {
  return {
    includedSeats: positiveInteger('BILLING_INCLUDED_SEATS', 3),
    seatPriceId: process.env.BILLING_SEAT_PRICE_ID || 'price_antinode_seat_monthly',
    seatPriceMinor: positiveInteger('BILLING_SEAT_PRICE_MINOR', 2900),
    currency: (process.env.BILLING_CURRENCY || 'EUR').toUpperCase(),
    interval: process.env.BILLING_INTERVAL || 'month',
  };
}

export function formatMoney(amountMinor: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(amountMinor / 100);
}
