import { afterAll, describe, expect, it } from 'vitest';
import { POST as requestReset } from '@/app/api/v1/password-resets/route';
import { POST as completeReset } from '@/app/api/v1/password-resets/complete/route';
import { signIn } from '@/lib/auth/accounts';
import { allAnswered } from '@/lib/jobs/after-answer';
import { sequelize } from '@/lib/db';
import { newLinkToken } from '@/lib/tokens';
import { PasswordReset, Session } from '@/models';
import { lastLinkTo, mailsTo } from '../helpers/inbox';
import { createTestTeam, uniqueEmail } from '../helpers/people';
import { call, FILE_PEER } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

describe('forgotten password', () => {
  it('answers the same whether or not the address has an account', async () => {
    const { members } = await createTestTeam('reset-same');
    const known = await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: members.viewer.email } });
    const unknown = await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: uniqueEmail('nobody') } });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
  });

  it('the mailed link sets a new password once and ends every session', async () => {
    const { members, cookieFor } = await createTestTeam('reset-flow');
    await cookieFor('engineer');
    await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: members.engineer.email } });
    await allAnswered();
    expect(await mailsTo(members.engineer.email)).toHaveLength(1);
    const token = await lastLinkTo(members.engineer.email, '/reset-password');
    const done = await call(completeReset, 'POST', '/x', { body: { token, password: 'a brand new password' } });
    expect(done.status).toBe(200);
    expect(await Session.count({ where: { userId: members.engineer.id } })).toBe(0);
    await expect(signIn(members.engineer.email, 'a brand new password', { address: FILE_PEER, deviceToken: null })).resolves.toMatchObject({ session: { name: 'antinode_session' } });

    const reused = await call(completeReset, 'POST', '/x', { body: { token, password: 'yet another password' } });
    expect(reused.status).toBe(409);
    expect(reused.body).toMatchObject({ error: { code: 'conflict', field: 'token', message: 'This reset link has already been used. Ask for a new one if you need to change the password again.' } });
  });

  it('refuses an expired link with a clear message', async () => {
    const { members } = await createTestTeam('reset-expired');
    const { token, tokenHash } = newLinkToken();
    await PasswordReset.create({ userId: members.viewer.id, tokenHash, expiresAt: new Date(Date.now() - 1000) });
    const answer = await call(completeReset, 'POST', '/x', { body: { token, password: 'a brand new password' } });
    expect(answer.status).toBe(409);
    expect(answer.body).toMatchObject({ error: { message: 'This reset link has expired (links work for an hour). Ask for a new one.' } });
  });

  it('names a password that is too short and changes nothing', async () => {
    const { members } = await createTestTeam('reset-short');
    const { token, tokenHash } = newLinkToken();
    await PasswordReset.create({ userId: members.viewer.id, tokenHash, expiresAt: new Date(Date.now() + 60_000) });
    const answer = await call(completeReset, 'POST', '/x', { body: { token, password: 'short' } });
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'password' } });
    expect(await PasswordReset.findOne({ where: { tokenHash } })).toMatchObject({ usedAt: null });
  });
});
