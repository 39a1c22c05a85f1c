import { afterAll, describe, expect, it } from 'vitest';
import { GET as exportCsv } from '@/app/api/v1/team/audit/export/route';
import { GET as listAudit } from '@/app/api/v1/team/audit/route';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import { createTestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

describe('audit log', () => {
  it('filters by area and exports CSV with formulas neutralised', async () => {
    const { team, members, cookieFor } = await createTestTeam('audit');
    const actor = { id: members.admin.id, name: members.admin.name };
    await recordAudit({ teamId: team.id, actor, action: 'member.removed', subject: '=cmd|calc' });
    await recordAudit({ teamId: team.id, actor: null, action: 'billing.payment_failed', subject: 'Invoice in_1, €29.00' });
    const cookie = await cookieFor('admin');

    const billingOnly = await call(listAudit, 'GET', '/api/v1/team/audit?area=billing', { cookie });
    expect(billingOnly.body).toEqual({ events: [expect.objectContaining({ actorName: 'Payment service', actionLabel: 'Payment failed' })] });

    const csv = await call(exportCsv, 'GET', '/api/v1/team/audit/export?area=member', { cookie });
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expect(csv.body).toContain(`${members.admin.name},Member removed,'=cmd|calc`);
    expect(csv.body).not.toContain('Payment failed');
  });

  it('names a malformed date filter', async () => {
    const { cookieFor } = await createTestTeam('audit-bad');
    const answer = await call(listAudit, 'GET', '/api/v1/team/audit?from=yesterday', { cookie: await cookieFor('admin') });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'from' } });
  });
});
