// A token made on the account page lets a script call the API as its person, and stops working once
// revoked (issue behaviour, no outside source). The script is played by Playwright's own HTTP client,
// which sends no cookie.
import { expect, request as httpClient, test } from '@playwright/test';
import { ROLE_LABELS } from '@/lib/permissions';
import { createPerson, createTeam, signIn } from './fixtures';

test('a token created in the browser lets a script analyse a run, and is refused after it is revoked', async ({ page, baseURL }) => {
  const team = await createTeam('Token team');
  const { email } = await createPerson('token-engineer', [{ team, role: 'engineer' }]);
  await signIn(page, email);
  await page.goto('/account');
  const section = page.getByRole('region', { name: 'API tokens' });
  await section.getByLabel('Name').fill('fan data script');
  await section.getByLabel(/^Role/).selectOption({ label: ROLE_LABELS.viewer });
  await section.getByLabel(/^Role/).selectOption({ label: ROLE_LABELS.engineer });
  await section.getByRole('button', { name: 'Create token' }).click();
  const token = (await section.getByTestId('api-token-value').textContent())?.trim() ?? '';
  expect(token).toMatch(/^ant_/);
  await expect(section.getByTestId('api-token-row')).toContainText('fan data script');

  const script = await httpClient.newContext({ baseURL });
  const run = { segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }], start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, maxHz: 300 };
  const analysed = await script.post('/api/v1/analyze', { data: run, headers: { authorization: `Bearer ${token}` } });
  expect(analysed.status()).toBe(200);
  expect(((await analysed.json()) as { resonances: unknown[] }).resonances.length).toBeGreaterThan(0);
  // an engineer's token may not edit a plan: the same permission map as a session
  const projects = await script.post('/api/v1/projects', { data: { name: 'Scripted', site: '' }, headers: { authorization: `Bearer ${token}` } });
  expect(projects.status()).toBe(403);

  await section.getByRole('button', { name: 'Revoke' }).click();
  await expect(section.getByTestId('api-token-row')).toContainText('revoked');
  const refused = await script.post('/api/v1/analyze', { data: run, headers: { authorization: `Bearer ${token}` } });
  expect(refused.status()).toBe(401);
  expect(((await refused.json()) as { error: { message: string } }).error.message).toContain('was revoked');
  await script.dispose();
});
