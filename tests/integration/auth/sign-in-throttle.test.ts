// Failed sign-ins slow the next try down and never keep the right password out once the wait is
// over; a stranger's failures cannot hold the owner back; a client-sent X-Forwarded-For buys no
// fresh budget unless a configured proxy sent it. Growing delays in place of a hard lockout, and
// budgets per account and per source: OWASP Authentication Cheat Sheet ("Account lockout");
// remembering browsers that signed in before: OWASP, "Slow Down Online Guessing Attacks with
// Device Cookies". The figures (5 / 30 / 20 free failures, 30 s doubling to 15 minutes) are
// product rules (lib/auth/throttle.ts). Time is moved with a fake clock; nothing waits for real.
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { FIRST_WAIT_S, LONGEST_WAIT_S, SIGN_IN_FREE_FAILURES } from '@/lib/auth/throttle';
import { sequelize } from '@/lib/db';
import { PEER_HEADER } from '@/lib/http/client-address';
import { createTestTeam, TEST_PASSWORD, uniqueEmail } from '../helpers/people';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });
afterEach(() => {
  vi.useRealTimers();
  delete process.env.ANTINODE_TRUSTED_PROXIES;
});

function freshAddress(): string {
  return `198.${18 + Math.floor(Math.random() * 2)}.${Math.floor(Math.random() * 250)}.${1 + Math.floor(Math.random() * 250)}`;
}

async function tryPassword(email: string, password: string, headers: Record<string, string>, cookie?: string) {
  return call(signInRoute, 'POST', '/api/v1/sessions', { body: { email, password }, headers, cookie });
}

function later(seconds: number): void {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(Date.now() + seconds * 1000);
}

async function person(label: string): Promise<string> {
  const { members } = await createTestTeam(label);
  return members.admin.email;
}

describe('sign-in failures', () => {
  it('after five failures from one place the next try waits 30 s; then the right password signs in', async () => {
    const email = await person('wait');
    const from = { [PEER_HEADER]: freshAddress() };
    const statuses: number[] = [];
    for (let attempt = 0; attempt < SIGN_IN_FREE_FAILURES.pair; attempt += 1) statuses.push((await tryPassword(email, `wrong ${attempt}`, from)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 429]);

    const held = await tryPassword(email, TEST_PASSWORD, from);
    expect(held.status).toBe(429);
    expect(held.headers.get('retry-after')).toBe(String(FIRST_WAIT_S));
    expect(held.body).toMatchObject({ error: { code: 'throttled', message: expect.stringContaining('the right password then signs you in') } });

    later(FIRST_WAIT_S + 1);
    expect((await tryPassword(email, TEST_PASSWORD, from)).status).toBe(201);
  });

  it('each further failure doubles the wait, up to 15 minutes', async () => {
    const email = await person('doubling');
    const from = { [PEER_HEADER]: freshAddress() };
    for (let attempt = 0; attempt < SIGN_IN_FREE_FAILURES.pair - 1; attempt += 1) await tryPassword(email, 'wrong', from);
    const waits: number[] = [];
    for (let failure = 0; failure < 7; failure += 1) {
      const answer = await tryPassword(email, 'still wrong', from);
      expect(answer.status).toBe(429);
      const waitS = Number(answer.headers.get('retry-after'));
      waits.push(waitS);
      vi.useFakeTimers({ toFake: ['Date'] });
      vi.setSystemTime(Date.now() + (waitS + 1) * 1000);
    }
    expect(waits).toEqual([30, 60, 120, 240, 480, 900, 900]);
    expect(Math.max(...waits)).toBe(LONGEST_WAIT_S);
  });

  it('a stranger who knows the address cannot hold the owner back at the owner’s own address', async () => {
    const email = await person('stranger');
    const stranger = { [PEER_HEADER]: freshAddress() };
    for (let attempt = 0; attempt < 12; attempt += 1) await tryPassword(email, `guess ${attempt}`, stranger);
    expect((await tryPassword(email, TEST_PASSWORD, stranger)).status).toBe(429);
    // The old lockout refused the owner too, for 15 minutes.
    expect((await tryPassword(email, TEST_PASSWORD, { [PEER_HEADER]: freshAddress() })).status).toBe(201);
  });

  it('failures from many addresses slow a new browser; one that signed in before goes straight in', async () => {
    const email = await person('botnet');
    const owner = { [PEER_HEADER]: freshAddress() };
    const first = await tryPassword(email, TEST_PASSWORD, owner);
    expect(first.status).toBe(201);
    const device = /antinode_device=([^;]+)/.exec(first.headers.get('set-cookie') ?? '')?.[1];
    expect(device).toBeTruthy();

    for (let attempt = 0; attempt <= SIGN_IN_FREE_FAILURES.account; attempt += 1) await tryPassword(email, `guess ${attempt}`, { [PEER_HEADER]: freshAddress() });
    const newBrowser = await tryPassword(email, TEST_PASSWORD, { [PEER_HEADER]: freshAddress() });
    expect(newBrowser.status).toBe(429);
    expect((await tryPassword(email, TEST_PASSWORD, owner, `antinode_device=${device}`)).status).toBe(201);
    later(Number(newBrowser.headers.get('retry-after')) + 1);
    expect((await tryPassword(email, TEST_PASSWORD, { [PEER_HEADER]: freshAddress() })).status).toBe(201);
  });

  it('an unknown e-mail is slowed exactly like a known one', async () => {
    const known = await person('same-wait');
    const unknown = uniqueEmail('nobody');
    const answers = [];
    for (const email of [known, unknown]) {
      const from = { [PEER_HEADER]: freshAddress() };
      const seen = [];
      for (let attempt = 0; attempt < SIGN_IN_FREE_FAILURES.pair + 1; attempt += 1) {
        const answer = await tryPassword(email, 'wrong', from);
        seen.push([answer.status, answer.headers.get('retry-after'), answer.body]);
      }
      answers.push(seen);
    }
    expect(answers[0]).toEqual(answers[1]);
  });
});

describe('client addresses', () => {
  it('a made-up X-Forwarded-For from a client that is not a trusted proxy buys no fresh budget', async () => {
    const peer = { [PEER_HEADER]: freshAddress() };
    // One network tries many accounts, each time claiming another address: the address budget holds.
    const statuses: number[] = [];
    for (let attempt = 0; attempt < SIGN_IN_FREE_FAILURES.address; attempt += 1) {
      statuses.push((await tryPassword(uniqueEmail('spray'), 'wrong', { ...peer, 'x-forwarded-for': `203.0.113.${attempt + 1}` })).status);
    }
    expect(statuses.slice(0, -1).every((status) => status === 401)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
    const next = await tryPassword(uniqueEmail('spray'), 'wrong', { ...peer, 'x-forwarded-for': '203.0.113.250' });
    expect(next.status).toBe(429);
  });

  it('behind a configured proxy, each client has its own budget and a client-written hop is ignored', async () => {
    process.env.ANTINODE_TRUSTED_PROXIES = '10.250.0.0/16';
    const proxy = { [PEER_HEADER]: '10.250.0.7' };
    const clientA = freshAddress();
    for (let attempt = 0; attempt < SIGN_IN_FREE_FAILURES.address; attempt += 1) {
      // The client wrote its own first hop; the proxy appended the address it saw.
      await tryPassword(uniqueEmail('behind'), 'wrong', { ...proxy, 'x-forwarded-for': `203.0.113.${attempt + 1}, ${clientA}` });
    }
    expect((await tryPassword(uniqueEmail('behind'), 'wrong', { ...proxy, 'x-forwarded-for': clientA })).status).toBe(429);
    const email = await person('behind-owner');
    expect((await tryPassword(email, TEST_PASSWORD, { ...proxy, 'x-forwarded-for': freshAddress() })).status).toBe(201);
  });
});
