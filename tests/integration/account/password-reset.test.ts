// Forgotten passwords: the request reveals nothing about which addresses have accounts (OWASP
// Forgot Password Cheat Sheet: "Return a consistent message for both existent and non-existent
// accounts" and "Ensure that responses return in a consistent amount of time"); here the answer
// is given before the address is even looked up, and the mail follows. Budgets (20 requests an
// hour per address, 5 mails a day per account, one a minute) are product rules.
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { POST as requestReset } from '@/app/api/v1/password-resets/route';
import { POST as completeReset } from '@/app/api/v1/password-resets/complete/route';
import { signIn } from '@/lib/auth/accounts';
import { waitingJobs, workWaitingJobs } from '../helpers/jobs';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { newLinkToken } from '@/lib/tokens';
import { PasswordReset, Session } from '@/models';
import { lastLinkTo, mailsTo } from '../helpers/inbox';
import { createTestTeam, uniqueEmail } from '../helpers/people';
import { call, FILE_PEER, freshPeer } from '../helpers/routes';

afterAll(async () => { await stopJobQueue(); await sequelize.close(); });
afterEach(() => { vi.useRealTimers(); });


describe('forgotten password', () => {
  it('answers the same whether or not the address has an account', async () => {
    const { members } = await createTestTeam('reset-same');
    const known = await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: members.viewer.email } });
    const unknown = await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: uniqueEmail('nobody') } });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
  });

  it('answers before looking the address up: a job looks it up and mails a known address only', async () => {
    const { members } = await createTestTeam('reset-deferred');
    const known = members.architect.email;
    const unknown = uniqueEmail('nobody-deferred');
    await workWaitingJobs(); // what earlier tests left
    const answers = [];
    for (const email of [known, unknown]) {
      answers.push(await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email }, headers: freshPeer() }));
    }
    // Both answered while nothing was looked up, stored or sent: one waiting job each.
    expect(await waitingJobs(['password-reset-mail'])).toBe(2);
    expect(await PasswordReset.count({ where: { userId: members.architect.id } })).toBe(0);
    expect(await mailsTo(known)).toEqual([]);
    expect(answers.map((answer) => [answer.status, answer.body])).toEqual([[202, answers[0].body], [202, answers[0].body]]);

    expect(await workWaitingJobs()).toBe(3); // two lookups, one mail
    expect(await mailsTo(known)).toHaveLength(1);
    expect(await mailsTo(unknown)).toEqual([]);
  });

  it('one address may ask 20 times an hour; then 429 with when to try again, whatever the e-mail', async () => {
    const headers = freshPeer();
    const statuses: number[] = [];
    for (let index = 0; index < 21; index += 1) {
      statuses.push((await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: uniqueEmail(`burst-${index}`) }, headers })).status);
    }
    expect(statuses).toEqual([...Array<number>(20).fill(202), 429]);
    const refused = await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: uniqueEmail('burst-late') }, headers });
    expect(refused.headers.get('retry-after')).toMatch(/^\d+$/);
    expect(refused.body).toMatchObject({ error: { code: 'throttled', message: expect.stringContaining('Too many password-reset requests from your network') } });
    await workWaitingJobs();
  });

  it('one account gets at most one reset mail a minute and five a day', async () => {
    const { members } = await createTestTeam('reset-cap');
    const email = members.viewer.email;
    for (let minute = 0; minute < 8; minute += 1) {
      vi.useFakeTimers({ toFake: ['Date'] });
      vi.setSystemTime(Date.now() + 61_000);
      await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email }, headers: freshPeer() });
      await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email }, headers: freshPeer() }); // the same minute
      await workWaitingJobs();
    }
    expect(await mailsTo(email)).toHaveLength(5);
  });

  it('the mailed link sets a new password once and ends every session', async () => {
    const { members, cookieFor } = await createTestTeam('reset-flow');
    await cookieFor('engineer');
    await call(requestReset, 'POST', '/api/v1/password-resets', { body: { email: members.engineer.email } });
    await workWaitingJobs();
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
