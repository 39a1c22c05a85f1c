// The Seats and billing page brings the team in line with the payment service when it opens, so
// webhooks that never arrived do not leave a team stuck (its webhooks are held back in the
// local payment fake here, as if lost).
import { afterAll, describe, expect, it } from 'vitest';
import { paymentService } from '@/lib/billing/stripe';
import { reconcileTeam } from '@/lib/billing/reconcile';
import { sequelize } from '@/lib/db';
import { AuditEvent, TeamBilling } from '@/models';
import { fakeControl, setQuantity, subscribedTeam } from '../helpers/payment-fake';

afterAll(async () => { await sequelize.close(); });

describe('reconciling with the payment service', () => {
  it('seats bought while every webhook was lost show once the page opens', async () => {
    const team = await subscribedTeam('lost-hooks', 4, { paidSeats: 0 });
    await TeamBilling.update({ requestedSeats: 4, state: 'included' }, { where: { teamId: team.team.id } });
    await reconcileTeam(team.team.id);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ paidSeats: 4, requestedSeats: null, state: 'active' });
    expect(await AuditEvent.findOne({ where: { teamId: team.team.id, action: 'billing.seats_changed' } })).toMatchObject({ subject: '0 → 4 paid seats' });
    await reconcileTeam(team.team.id); // nothing new: nothing recorded twice
    expect(await AuditEvent.count({ where: { teamId: team.team.id, action: 'billing.seats_changed' } })).toBe(1);
  });

  it('a failed payment and a cancellation the webhooks never told are found too', async () => {
    const team = await subscribedTeam('lost-failure', 2);
    await fakeControl('invoices', { email: team.email, outcome: 'failed' });
    await reconcileTeam(team.team.id);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ state: 'past_due', paidSeats: 2 });
    await setQuantity(team, 2);
    await paymentService().subscriptions.cancel(team.subscriptionId);
    await reconcileTeam(team.team.id);
    expect(await TeamBilling.findByPk(team.team.id)).toMatchObject({ state: 'canceled', paidSeats: 0, subscriptionId: null });
  });
});
