import type { BillingState } from '@/models/team-billing';

const LABELS: Record<BillingState, { text: string; tone: string }> = {
  included: { text: 'Included seats only', tone: 'bg-paper-sunk text-graphite-700' },
  active: { text: 'Paid up', tone: 'bg-ok-soft text-graphite' },
  past_due: { text: 'Payment failed: read-only', tone: 'bg-risk-soft text-risk-ink' },
  canceled: { text: 'Subscription cancelled', tone: 'bg-paper-sunk text-graphite-700' },
};

export function BillingStateLabel({ state }: { state: BillingState }) {
  const label = LABELS[state];
  return <span className={`rounded px-2 py-0.5 text-xs font-medium ${label.tone}`} data-testid="billing-state">{label.text}</span>;
}
