import { createHash } from 'node:crypto';
import { expect, test } from '@playwright/test';
import { signIn } from './fixtures';
import { teamWithRevision } from './review-fixtures';

test('the acoustician issues the treatment schedule and downloads the same bytes twice', async ({ page }) => {
  const { people, planId } = await teamWithRevision('Issue');
  await signIn(page, people.acoustician.email);
  await page.goto(`/plans/${planId}/revisions`);
  await page.getByRole('link', { name: 'Issue schedule' }).click();
  await expect(page.getByRole('heading', { name: /Treatment schedule: .*revision 1/ })).toBeVisible();
  await expect(page.getByText('the schedule is issued as a draft, watermarked as such')).toBeVisible();
  await page.getByRole('button', { name: 'Issue schedule' }).click();
  const issued = page.getByRole('list', { name: 'Issued schedules' });
  await expect(issued).toContainText(`Issued by ${people.acoustician.name}`, { timeout: 30_000 });
  const href = (await issued.getByRole('link', { name: 'Download PDF' }).getAttribute('href'))!;
  const first = await page.request.get(href);
  const second = await page.request.get(href);
  expect(first.headers()['content-type']).toBe('application/pdf');
  const bytes = await first.body();
  expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(Buffer.compare(bytes, await second.body())).toBe(0);
  expect(createHash('sha256').update(bytes).digest('hex')).toBe(first.headers()['x-content-sha256']);
  await expect(issued).toContainText(first.headers()['x-content-sha256']);
});
