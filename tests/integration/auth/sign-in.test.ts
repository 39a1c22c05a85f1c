import { afterAll, describe, expect, it } from 'vitest';
import { DELETE } from '@/app/api/v1/sessions/current/route';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { GET as me } from '@/app/api/v1/me/route';
import { createUserWithTeam, WRONG_CREDENTIALS } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { Membership, Session, User } from '@/models';
import { TEST_PASSWORD, uniqueEmail } from '../helpers/people';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

function cookieFrom(headers: Headers): string {
  const raw = headers.get('set-cookie') ?? '';
  return raw.split(';')[0];
}

describe('sign-up', () => {
  it('creates a team whose first member is its admin, with an argon2id hash', async () => {
    const email = uniqueEmail('founder');
    const { user, team } = await createUserWithTeam({ name: 'Founder', email, password: TEST_PASSWORD, teamName: 'New practice' });
    const membership = await Membership.findOne({ where: { userId: user.id, teamId: team.id } });
    expect(membership?.role).toBe('admin');
    const stored = await User.findByPk(user.id);
    expect(stored?.passwordHash.startsWith('$argon2id$')).toBe(true);
  });

  it('refuses a second account with the same e-mail', async () => {
    const email = uniqueEmail('twice');
    await createUserWithTeam({ name: 'One', email, password: TEST_PASSWORD, teamName: 'T1' });
    await expect(createUserWithTeam({ name: 'Two', email, password: TEST_PASSWORD, teamName: 'T2' })).rejects.toMatchObject({ code: 'conflict', field: 'email' });
  });
});

describe('POST /api/v1/sessions', () => {
  it('signs in, stores the session in PostgreSQL, and sets an httpOnly SameSite=Lax cookie that lives as long as the session', async () => {
    const email = uniqueEmail('signin');
    await createUserWithTeam({ name: 'Sign In', email, password: TEST_PASSWORD, teamName: 'Team' });
    const answer = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: email.toUpperCase(), password: TEST_PASSWORD } });
    expect(answer.status).toBe(201);
    const setCookie = answer.headers.get('set-cookie') ?? '';
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    // lucia's default for a cookie with no expiry is 400 days; the server forgets a session after 30.
    const maxAgeS = Number(/antinode_session=[^,]*Max-Age=(\d+)/i.exec(setCookie)?.[1]);
    expect(maxAgeS).toBeGreaterThan(29 * 86_400);
    expect(maxAgeS).toBeLessThanOrEqual(30 * 86_400);
    const sessionId = cookieFrom(answer.headers).split('=')[1];
    expect(await Session.findByPk(sessionId)).not.toBeNull();

    const who = await call(me, 'GET', '/api/v1/me', { cookie: cookieFrom(answer.headers) });
    expect(who.body).toMatchObject({ user: { email }, activeTeam: { role: 'admin' } });

    const out = await call(DELETE, 'DELETE', '/api/v1/sessions/current', { cookie: cookieFrom(answer.headers) });
    expect(out.status).toBe(200);
    expect(await Session.findByPk(sessionId)).toBeNull();
    const after = await call(me, 'GET', '/api/v1/me', { cookie: cookieFrom(answer.headers) });
    expect(after.status).toBe(401);
  });

  it('gives the same answer for an unknown e-mail and a wrong password', async () => {
    const email = uniqueEmail('same');
    await createUserWithTeam({ name: 'Same', email, password: TEST_PASSWORD, teamName: 'Team' });
    const wrongPassword = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email, password: 'not the password' } });
    const unknownEmail = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: uniqueEmail('nobody'), password: 'whatever' } });
    expect(wrongPassword.status).toBe(401);
    expect(unknownEmail.status).toBe(401);
    expect(wrongPassword.body).toEqual(unknownEmail.body);
    expect(wrongPassword.body).toMatchObject({ error: { message: WRONG_CREDENTIALS } });
  });

  it('names the missing field', async () => {
    const answer = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: 'a@b.test' } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'password', message: 'password: Enter your password.' } });
  });
});
