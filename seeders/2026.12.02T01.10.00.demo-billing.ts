// The demo team's paid subscription (5 paid seats on top of the included ones), matching the
// one the local payment fake starts with. The training sandbox keeps its included seats only.
import type { QueryInterface } from 'sequelize';
import { DEMO_BILLING } from '@/lib/billing/demo';

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  const [rows] = await queryInterface.sequelize.query('select id from teams where name = :name', { replacements: { name: DEMO_BILLING.teamName } });
  const team = (rows as { id: string }[])[0];
  if (!team) return;
  const now = new Date();
  await queryInterface.bulkInsert('team_billing', [{
    team_id: team.id, customer_id: DEMO_BILLING.customerId, subscription_id: DEMO_BILLING.subscriptionId,
    paid_seats: DEMO_BILLING.paidSeats, requested_seats: null, state: 'active', payment_failed_at: null, last_event_at: null,
    created_at: now, updated_at: now,
  }]);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.bulkDelete('team_billing', { customer_id: DEMO_BILLING.customerId });
}
