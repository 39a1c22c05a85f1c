// The security headers as the production server sends them, and as the browser applies them:
// pages run under a nonce-based script policy with nothing refused, cannot be framed by another
// page, and the sign-in cookies carry their flags. (Header meanings: OWASP HTTP Headers Cheat
// Sheet; W3C Content Security Policy Level 3.)
import { expect, test } from '@playwright/test';
import { createPerson, createTeam, PASSWORD, signIn } from './fixtures';

test('pages carry a per-request script nonce that Next puts on its scripts, and nothing is refused', async ({ page }) => {
  const violations: string[] = [];
  page.on('console', (message) => { if (/Content Security Policy|Refused to/i.test(message.text())) violations.push(message.text()); });

  const answer = await page.goto('/sign-in');
  const policy = answer!.headers()['content-security-policy'];
  const nonce = /'nonce-([^']+)'/.exec(policy)?.[1];
  expect(nonce).toBeTruthy();
  expect(policy).toContain("frame-ancestors 'none'");
  expect(answer!.headers()['x-frame-options']).toBe('DENY');
  expect(answer!.headers()['x-content-type-options']).toBe('nosniff');
  expect(answer!.headers()['referrer-policy']).toBe('same-origin');
  const scripts = await page.locator('script[src]').evaluateAll((elements) => elements.map((element) => (element as HTMLScriptElement).nonce));
  expect(scripts.length).toBeGreaterThan(0);
  expect(new Set(scripts)).toEqual(new Set([nonce]));
  const again = await page.request.get('/sign-in');
  expect(/'nonce-([^']+)'/.exec(again.headers()['content-security-policy'])?.[1]).not.toBe(nonce);

  const team = await createTeam('Headers team');
  const { email } = await createPerson('headers', [{ team, role: 'admin' }]);
  await signIn(page, email); // hydrated forms and client navigation work under the policy
  for (const path of ['/projects', '/team', '/team/billing', '/team/audit', '/account']) {
    const response = await page.goto(path);
    expect(response!.headers()['content-security-policy'], path).toMatch(/'nonce-[^']+' 'strict-dynamic'/);
  }
  expect(violations).toEqual([]);
});

test('another page cannot frame ours', async ({ page, baseURL }) => {
  // setContent resolves on the outer page's load event, which waits for its frames to load or fail.
  // Control: a frame that may be shown, with the same heading, is found by the same locator.
  await page.setContent('<iframe id="framed" src="data:text/html,<h1>Sign in</h1>"></iframe>', { waitUntil: 'load' });
  await expect(page.frameLocator('#framed').getByRole('heading', { name: 'Sign in' })).toHaveCount(1);
  await page.setContent(`<iframe id="framed" src="${baseURL}/sign-in"></iframe>`, { waitUntil: 'load' });
  await expect(page.frameLocator('#framed').getByRole('heading', { name: 'Sign in' })).toHaveCount(0);
});

test('API answers and static files carry their headers; the sign-in cookies their flags', async ({ page }) => {
  const health = await page.request.get('/api/v1/health');
  expect(health.headers()['content-security-policy']).toBe("default-src 'none'; frame-ancestors 'none'");
  expect(health.headers()['x-frame-options']).toBe('DENY');
  expect(health.headers()['x-content-type-options']).toBe('nosniff');

  await page.goto('/sign-in');
  const scriptUrl = await page.locator('script[src*="/_next/static/"]').first().getAttribute('src');
  const script = await page.request.get(scriptUrl!);
  expect(script.headers()['x-content-type-options']).toBe('nosniff');

  const team = await createTeam('Cookie team');
  const { email } = await createPerson('cookies', [{ team, role: 'viewer' }]);
  const signedIn = await page.request.post('/api/v1/sessions', { data: { email, password: PASSWORD } });
  expect(signedIn.status()).toBe(201);
  const cookies = signedIn.headersArray().filter((header) => header.name.toLowerCase() === 'set-cookie').map((header) => header.value);
  const session = cookies.find((cookie) => cookie.startsWith('antinode_session='))!;
  const device = cookies.find((cookie) => cookie.startsWith('antinode_device='))!;
  for (const cookie of [session, device]) expect(cookie).toMatch(/HttpOnly/i);
  for (const cookie of [session, device]) expect(cookie).toMatch(/SameSite=Lax/i);
  for (const cookie of [session, device]) expect(cookie).toMatch(/Secure/i);
  expect(session).toMatch(/Max-Age=2592000/); // 30 days, the session's own lifetime
});
