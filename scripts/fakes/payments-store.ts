// The payment fake's objects (customers, subscriptions), kept in a JSON file under .data so
// they outlive a restart. Starts with the demo team's subscription.
import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { DEMO_BILLING } from '@/lib/billing/demo';

export interface FakeCustomer { id: string; object: 'customer'; email: string | null; name: string | null; metadata: Record<string, string>; created: number }
export interface FakeItem { id: string; object: 'subscription_item'; price: { id: string; object: 'price'; unit_amount: number; currency: string }; quantity: number }
export interface FakeSubscription {
  id: string; object: 'subscription'; customer: string; status: 'active' | 'past_due' | 'canceled';
  items: { object: 'list'; data: FakeItem[] }; metadata: Record<string, string>; created: number;
}
interface State { customers: Record<string, FakeCustomer>; subscriptions: Record<string, FakeSubscription> }

export const SEAT_PRICE = {
  unitAmount: Number(process.env.BILLING_SEAT_PRICE_MINOR || 2900),
  currency: (process.env.BILLING_CURRENCY || 'EUR').toLowerCase(),
};

export function fakeId(prefix: string): string {
  return `${prefix}_${randomBytes(10).toString('hex')}`;
}

export function now(): number {
  return Math.floor(Date.now() / 1000);
}

export function seatItem(id: string, priceId: string, quantity: number): FakeItem {
  return { id, object: 'subscription_item', price: { id: priceId, object: 'price', unit_amount: SEAT_PRICE.unitAmount, currency: SEAT_PRICE.currency }, quantity };
}

function demoState(): State {
  const created = now();
  return {
    customers: {
      [DEMO_BILLING.customerId]: { id: DEMO_BILLING.customerId, object: 'customer', email: DEMO_BILLING.email, name: DEMO_BILLING.teamName, metadata: {}, created },
    },
    subscriptions: {
      [DEMO_BILLING.subscriptionId]: {
        id: DEMO_BILLING.subscriptionId, object: 'subscription', customer: DEMO_BILLING.customerId, status: 'active', metadata: {}, created,
        items: { object: 'list', data: [seatItem(DEMO_BILLING.itemId, process.env.BILLING_SEAT_PRICE_ID || 'price_antinode_seat_monthly', DEMO_BILLING.paidSeats)] },
      },
    },
  };
}

export class PaymentsStore {
  private state: State;
  constructor(private readonly file: string) {
    this.state = existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as State) : demoState();
    this.save();
  }
  save(): void { writeFileSync(this.file, JSON.stringify(this.state, null, 2)); }
  customer(id: string): FakeCustomer | undefined { return this.state.customers[id]; }
  subscription(id: string): FakeSubscription | undefined { return this.state.subscriptions[id]; }
  customersByEmail(email: string): FakeCustomer[] { return Object.values(this.state.customers).filter((c) => c.email === email); }
  subscriptionsOf(customerId: string): FakeSubscription[] { return Object.values(this.state.subscriptions).filter((s) => s.customer === customerId); }
  putCustomer(customer: FakeCustomer): FakeCustomer { this.state.customers[customer.id] = customer; this.save(); return customer; }
  putSubscription(subscription: FakeSubscription): FakeSubscription { this.state.subscriptions[subscription.id] = subscription; this.save(); return subscription; }
}
