import { afterAll, describe, expect, it } from 'vitest';
import { GET as me } from '@/app/api/v1/me/route';
import { PUT as switchRoute } from '@/app/api/v1/sessions/current/route';
import { sequelize } from '@/lib/db';
import { createTestTeam } from '../helpers/people';
import { call } from '../helpers/routes';
import { Membership } from '@/models';

afterAll(async () => { await sequelize.close(); });

describe('team switch', () => {
  it('moves the session to another team of the same person, with that team’s role', async () => {
    const first = await createTestTeam('first');
    const second = await createTestTeam('second');
    await Membership.create({ userId: first.members.engineer.id, teamId: second.team.id, role: 'viewer' });
    const cookie = await first.cookieFor('engineer');

    const before = await call(me, 'GET', '/api/v1/me', { cookie });
    expect(before.body).toMatchObject({ activeTeam: { teamId: first.team.id, role: 'engineer' } });
    const switched = await call(switchRoute, 'PUT', '/api/v1/sessions/current', { cookie, body: { teamId: second.team.id } });
    expect(switched.status).toBe(200);
    const after = await call(me, 'GET', '/api/v1/me', { cookie });
    expect(after.body).toMatchObject({ activeTeam: { teamId: second.team.id, role: 'viewer' } });
  });

  it('refuses a team the person is not in', async () => {
    const mine = await createTestTeam('mine');
    const theirs = await createTestTeam('theirs');
    const answer = await call(switchRoute, 'PUT', '/api/v1/sessions/current', { cookie: await mine.cookieFor('admin'), body: { teamId: theirs.team.id } });
    expect(answer.status).toBe(404);
  });
});
