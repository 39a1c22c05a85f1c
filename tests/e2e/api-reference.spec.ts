// The API reference page: reached from the account menu, it shows the example call for analysing a
// run, and every link on it leads somewhere (issue behaviour, no outside source).
import { expect, test } from '@playwright/test';
import { createPerson, createTeam, signIn } from './fixtures';

test('the account menu leads to the API reference, which shows how to analyse a run', async ({ page }) => {
  const team = await createTeam('Reference team');
  const { email } = await createPerson('reference-reader', [{ team, role: 'acoustician' }]);
  await signIn(page, email);
  await page.getByRole('button', { name: 'E2E reference-reader' }).click();
  await page.getByRole('menuitem', { name: 'API reference' }).click();
  await expect(page).toHaveURL(/\/account\/api$/);
  await expect(page.getByRole('heading', { level: 1, name: 'API reference' })).toBeVisible();

  const analyse = page.getByTestId('analyse-example');
  await expect(analyse.getByRole('heading', { name: 'Analyse a run' })).toBeVisible();
  await expect(analyse.locator('pre')).toContainText('curl -X POST');
  await expect(analyse.locator('pre')).toContainText('/api/v1/analyze?envelopes=1');
  await expect(analyse.locator('pre')).toContainText('Authorization: Bearer $ANTINODE_TOKEN');
  await expect(analyse.locator('pre')).toContainText('"flange": "unflanged"');
  await expect(analyse).toContainText('28.0 Hz');
  const results = page.getByTestId('results-example');
  await expect(results.locator('pre').first()).toContainText('/results?runId=run-1');
  await expect(results.locator('pre').nth(1)).toContainText('/risks');

  // every route, grouped by area, each with its example call
  await expect(page.getByRole('heading', { level: 2, name: 'Analysis' })).toBeVisible();
  expect(await page.getByTestId('api-operation').count()).toBeGreaterThanOrEqual(60);
  await expect(page.locator('#postAnalyze')).toContainText('analysis.run');
});

test('every link on the API reference leads somewhere', async ({ page }) => {
  const team = await createTeam('Reference links');
  const { email } = await createPerson('reference-links', [{ team, role: 'viewer' }]);
  await signIn(page, email);
  await page.goto('/account/api');
  const hrefs = await page.getByRole('main').locator('a[href]').evaluateAll((links) => links.map((link) => link.getAttribute('href') ?? ''));
  expect(hrefs.length).toBeGreaterThan(5);
  for (const href of new Set(hrefs)) {
    const [path, fragment] = href.split('#');
    if (path) {
      const answer = await page.request.get(path);
      expect(answer.status(), href).toBe(200);
      if (path === '/api/v1/openapi.json') expect(((await answer.json()) as { openapi: string }).openapi).toBe('3.1.0');
      if (fragment) {
        await page.goto(path);
        await expect(page.locator(`[id="${fragment}"]`), href).toHaveCount(1);
        await page.goto('/account/api');
      }
    } else {
      await expect(page.locator(`[id="${fragment}"]`), href).toHaveCount(1);
    }
  }
  // the JSON link itself, followed as a person would
  await page.getByTestId('openapi-link').click();
  await expect(page).toHaveURL(/\/api\/v1\/openapi\.json$/);
  await expect(page.locator('body')).toContainText('"openapi":"3.1.0"');
});
