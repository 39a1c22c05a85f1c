// Every page type (through proxy.ts, which answers for pages) and every API route (through the
// route wrapper) carries the security headers, and the sign-in cookies carry their flags.
// Which headers and values: OWASP HTTP Headers Cheat Sheet and OWASP Secure Headers Project
// (Content-Security-Policy with frame-ancestors, X-Frame-Options, X-Content-Type-Options,
// Referrer-Policy, Permissions-Policy, Cross-Origin-Opener-Policy); nonce-based script policy:
// W3C Content Security Policy Level 3 ('nonce-…', 'strict-dynamic'); cookie attributes: RFC 6265.
import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { sequelize } from '@/lib/db';
import { config, proxy } from '@/proxy';
import nextConfig from '@/next.config.mjs';
import { createTestTeam, TEST_PASSWORD } from '../helpers/people';
import { call, freshPeer, listRouteFiles, loadHandlers } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

const ID = randomUUID();
const PAGES = [
  '/', '/sign-in', '/sign-up', '/sign-up/confirm?token=t', '/forgotten-password', '/reset-password?token=t', '/invitation?token=t',
  '/projects', '/projects/new', `/projects/${ID}`, `/plans/${ID}`, `/plans/${ID}/revisions`, `/plans/${ID}/revisions/1`,
  `/plans/${ID}/revisions/1/schedule`, '/team', '/team/billing', '/team/audit', '/account', '/no-such-page',
];

function expectCommonHeaders(headers: Headers, where: string): void {
  expect(headers.get('x-content-type-options'), where).toBe('nosniff');
  expect(headers.get('referrer-policy'), where).toBe('same-origin');
  expect(headers.get('permissions-policy'), where).toContain('camera=()');
  expect(headers.get('cross-origin-opener-policy'), where).toBe('same-origin');
  expect(headers.get('cross-origin-resource-policy'), where).toBe('same-origin');
}

function directives(policy: string | null): Map<string, string> {
  return new Map((policy ?? '').split(';').map((part) => part.trim()).filter(Boolean).map((part) => {
    const [name, ...values] = part.split(/\s+/);
    return [name, values.join(' ')];
  }));
}

describe('pages', () => {
  const matcher = new RegExp(`^${config.matcher[0]}$`);

  it('every page path goes through the proxy; the API and static files do not', () => {
    for (const page of PAGES) expect(matcher.test(page.split('?')[0]), page).toBe(true);
    for (const other of ['/api/v1/health', '/_next/static/chunks/main.js', '/fonts/ibm-plex-sans-latin-400-normal.woff2', '/icon.svg']) {
      expect(matcher.test(other), other).toBe(false);
    }
  });

  for (const page of PAGES) {
    it(`${page}: a nonce-based script policy, no framing, and the other headers`, async () => {
      const response = await proxy(new Request(`http://localhost:3000${page}`, { headers: { accept: 'text/html' } }));
      const policy = directives(response.headers.get('content-security-policy'));
      const nonce = /'nonce-([A-Za-z0-9+/=]+)'/.exec(policy.get('script-src') ?? '')?.[1];
      expect(nonce, 'script-src carries a nonce').toBeTruthy();
      expect(policy.get('script-src')).toContain("'strict-dynamic'");
      expect(policy.get('script-src')).not.toContain("'unsafe-inline'");
      expect(policy.get('frame-ancestors')).toBe("'none'");
      expect(policy.get('object-src')).toBe("'none'");
      expect(policy.get('base-uri')).toBe("'none'");
      expect(policy.get('default-src')).toBe("'self'");
      expect(response.headers.get('x-frame-options')).toBe('DENY');
      expectCommonHeaders(response.headers, page);
      // The same nonce is handed to Next with the request, which puts it on its scripts.
      expect(response.headers.get('x-middleware-request-x-nonce')).toBe(nonce);
      expect(response.headers.get('x-middleware-request-content-security-policy')).toContain(`'nonce-${nonce}'`);
    });
  }

  it('each page request gets a nonce of its own', async () => {
    const nonces = new Set<string>();
    for (let index = 0; index < 5; index += 1) nonces.add((await proxy(new Request('http://localhost:3000/projects'))).headers.get('x-middleware-request-x-nonce') ?? '');
    expect(nonces.size).toBe(5);
  });

  it('a refused server action call carries the headers too', async () => {
    const response = await proxy(new Request('http://localhost:3000/projects', {
      method: 'POST', headers: { 'next-action': 'abc', 'content-type': 'application/json' }, body: '{}',
    }));
    expect(response.status).toBe(400);
    expect(response.headers.get('x-frame-options')).toBe('DENY');
    expectCommonHeaders(response.headers, 'action');
  });
});

describe('API routes', () => {
  it('every route handler, whatever it answers, sends JSON that may load and be framed by nothing', async () => {
    let checked = 0;
    for (const route of listRouteFiles()) {
      const params = Object.fromEntries(route.params.map((name) => [name, ID]));
      for (const [method, handler] of Object.entries(await loadHandlers(route))) {
        const answer = await call(handler, method as 'GET', route.urlPath, { params, headers: freshPeer() });
        const where = `${method} ${route.urlPath} (${answer.status})`;
        expect(answer.headers.get('content-security-policy'), where).toBe("default-src 'none'; frame-ancestors 'none'");
        expect(answer.headers.get('x-frame-options'), where).toBe('DENY');
        expectCommonHeaders(answer.headers, where);
        checked += 1;
      }
    }
    expect(checked).toBeGreaterThan(50);
  });

  it('a file answer (the schedule PDF) may be framed by our own pages only', async () => {
    const { apiSecurityHeaders } = await import('@/lib/http/security-headers');
    const headers = apiSecurityHeaders('application/pdf');
    expect(headers['Content-Security-Policy']).toBe("frame-ancestors 'self'");
    expect(headers['X-Frame-Options']).toBe('SAMEORIGIN');
  });
});

describe('static files', () => {
  it('scripts, styles, fonts and the icon are sent with nosniff and no framing', async () => {
    const rules = await nextConfig.headers!();
    for (const source of ['/_next/static/:path*', '/fonts/:path*', '/icon.svg']) {
      const rule = rules.find((entry) => entry.source === source);
      expect(rule?.headers, source).toEqual(expect.arrayContaining([{ key: 'X-Content-Type-Options', value: 'nosniff' }, { key: 'X-Frame-Options', value: 'DENY' }]));
    }
  });
});

describe('cookies', () => {
  it('the session cookie lives as long as the session; both cookies are httpOnly, SameSite=Lax, for the whole site', async () => {
    const { members } = await createTestTeam('cookies');
    const answer = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: members.viewer.email, password: TEST_PASSWORD }, headers: freshPeer() });
    expect(answer.status).toBe(201);
    const cookies = answer.headers.getSetCookie();
    const session = cookies.find((cookie) => cookie.startsWith('antinode_session='))!;
    const device = cookies.find((cookie) => cookie.startsWith('antinode_device='))!;
    for (const cookie of [session, device]) {
      expect(cookie).toMatch(/;\s*HttpOnly/i);
      expect(cookie).toMatch(/;\s*SameSite=Lax/i);
      expect(cookie).toMatch(/;\s*Path=\//i);
      // Secure under production (npm start and the browser tests); tests run the server code outside it.
      expect(/;\s*Secure/i.test(cookie)).toBe(process.env.NODE_ENV === 'production');
    }
    expect(Number(/Max-Age=(\d+)/i.exec(session)?.[1])).toBe(30 * 86_400); // the session's 30 days, not 400
    expect(Number(/Max-Age=(\d+)/i.exec(device)?.[1])).toBe(365 * 86_400);
  });
});
