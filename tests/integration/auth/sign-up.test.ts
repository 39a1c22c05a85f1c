// Sign-up reveals nothing about which addresses have accounts: the same answer, given before any
// lookup or mail (a job looks the address up and queues the mail); an account exists only once its address is
// confirmed from the mailed link. Not revealing whether an account exists: OWASP Authentication
// Cheat Sheet ("Authentication and error messages": account creation). The budgets (10 sign-ups
// an hour per address, 3 sign-up mails a day per recipient) are product rules.
import { afterAll, describe, expect, it } from 'vitest';
import { POST as signUp } from '@/app/api/v1/sign-ups/route';
import { POST as confirm } from '@/app/api/v1/sign-ups/confirm/route';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { waitingJobs, workWaitingJobs } from '../helpers/jobs';
import { Membership, Session, SignUpRequest, Team, User } from '@/models';
import { lastLinkTo, mailsTo } from '../helpers/inbox';
import { createTestTeam, uniqueEmail } from '../helpers/people';
import { call, freshPeer } from '../helpers/routes';

afterAll(async () => { await stopJobQueue(); await sequelize.close(); });


function form(email: string, extra: Partial<Record<'name' | 'teamName', string>> = {}) {
  return { name: 'Rowan Tessaly', email, password: 'a long enough password', teamName: 'Tessaly Sound', ...extra };
}

describe('sign-up', () => {
  it('answers the same for a new and a taken address, before looking either up, and signs nobody in', async () => {
    const { members } = await createTestTeam('taken');
    const taken = members.viewer.email;
    const fresh = uniqueEmail('fresh');
    const usersBefore = await User.count();
    await workWaitingJobs(); // what earlier tests left
    const forFresh = await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(fresh), headers: freshPeer() });
    const forTaken = await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(taken), headers: freshPeer() });
    // Answered with nothing looked up, stored or sent yet, one job waiting for each (the job worker
    // is not running here): the two answers did the same steps, so cannot differ in time by a
    // lookup, a stored request or a mail.
    expect(await waitingJobs(['sign-up-mail'])).toBe(2);
    expect(await waitingJobs(['send-mail'])).toBe(0);
    expect(await SignUpRequest.count({ where: { email: fresh } })).toBe(0);
    expect(await mailsTo(fresh)).toEqual([]);
    expect(await mailsTo(taken)).toEqual([]);
    expect(forFresh.status).toBe(202);
    expect(forTaken.status).toBe(202);
    expect(JSON.stringify(forTaken.body)).toBe(JSON.stringify(forFresh.body).replace(fresh, taken));
    expect(forFresh.headers.get('set-cookie')).toBeNull();
    expect(forTaken.headers.get('set-cookie')).toBeNull();

    expect(await workWaitingJobs()).toBe(4); // two lookups, then two mails
    expect(await User.count()).toBe(usersBefore); // nothing exists until the link is used
    expect((await mailsTo(fresh)).map((mail) => mail.subject)).toEqual(['Confirm your address to create your Antinode account']);
    const notice = await mailsTo(taken);
    expect(notice.map((mail) => mail.subject)).toEqual(['Someone tried to sign up to Antinode with your address']);
    expect(notice[0].text).not.toMatch(/token=/);
  });

  it('the mailed link creates the account, confirmed, with its team, and signs in; once', async () => {
    const email = uniqueEmail('confirm');
    await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(email, { teamName: 'Quayside Acoustics' }), headers: freshPeer() });
    await workWaitingJobs();
    const token = await lastLinkTo(email, '/sign-up/confirm');
    const joined = await call(confirm, 'POST', '/api/v1/sign-ups/confirm', { body: { token } });
    expect(joined.status).toBe(201);
    expect(joined.headers.get('set-cookie')).toMatch(/antinode_session=/);
    const user = await User.findOne({ where: { email } });
    expect(user?.emailVerifiedAt).toBeInstanceOf(Date);
    expect(user?.passwordHash.startsWith('$argon2id$')).toBe(true);
    const membership = await Membership.findOne({ where: { userId: user!.id } });
    expect(membership?.role).toBe('admin');
    expect((await Team.findByPk(membership!.teamId))?.name).toBe('Quayside Acoustics');
    expect(await Session.count({ where: { userId: user!.id } })).toBe(1);

    const again = await call(confirm, 'POST', '/api/v1/sign-ups/confirm', { body: { token } });
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({ error: { code: 'conflict', field: 'token', message: 'This link has already created its account. Sign in instead.' } });
  });

  it('its mails carry none of the text the sender typed', async () => {
    const fresh = uniqueEmail('spam-target');
    const spam = { name: 'Cheap watches at spam.example', teamName: 'Visit spam.example now' };
    await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(fresh, spam), headers: freshPeer() });
    const { members } = await createTestTeam('spam-taken');
    await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(members.viewer.email, spam), headers: freshPeer() });
    await workWaitingJobs();
    for (const mail of [...(await mailsTo(fresh)), ...(await mailsTo(members.viewer.email))]) {
      expect(`${mail.subject}\n${mail.text}`).not.toContain('spam.example');
    }
  });

  it('one address may ask 10 times an hour; the 11th is refused with when to try again', async () => {
    const headers = freshPeer();
    const statuses: number[] = [];
    for (let index = 0; index < 11; index += 1) {
      statuses.push((await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(uniqueEmail(`burst-${index}`)), headers })).status);
    }
    expect(statuses).toEqual([...Array<number>(10).fill(202), 429]);
    const refused = await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(uniqueEmail('burst-late')), headers });
    expect(refused.headers.get('retry-after')).toMatch(/^\d+$/);
    expect(refused.body).toMatchObject({ error: { code: 'throttled', message: expect.stringMatching(/^Too many sign-ups from your network\. Try again in /) } });
    await workWaitingJobs();
  });

  it('one recipient gets at most 3 sign-up mails a day, however many addresses ask', async () => {
    const target = uniqueEmail('flooded');
    for (let index = 0; index < 6; index += 1) {
      expect((await call(signUp, 'POST', '/api/v1/sign-ups', { body: form(target), headers: freshPeer() })).status).toBe(202);
    }
    await workWaitingJobs();
    expect(await mailsTo(target)).toHaveLength(3);
  });
});
