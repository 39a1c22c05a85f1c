// The demo team's subscription, known to both the demo seeder and the local payment fake
// (scripts/fakes/payments.ts), so the demo admin can change seats straight away. Invented.
export const DEMO_BILLING = {
  teamName: 'Fernhollow Acoustics',
  email: 'admin@antinode.test',
  customerId: 'cus_demo_fernhollow',
  subscriptionId: 'sub_demo_fernhollow',
  itemId: 'si_demo_fernhollow',
  paidSeats: 5,
} as const;
