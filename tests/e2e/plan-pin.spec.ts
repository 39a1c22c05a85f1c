import { expect, test } from '@playwright/test';
import { signIn } from './fixtures';
import { teamWithRevision } from './review-fixtures';

// Read-only roles open the live plan in the Pan tool; placing a pin must still take the click.
test('the architect places a pin on the live plan while the Pan tool is chosen', async ({ page }) => {
  const { people, planId } = await teamWithRevision('PlanPin');
  await signIn(page, people.architect.email);
  await page.goto(`/plans/${planId}`);
  await expect(page.getByRole('button', { name: /^Pan/ })).toHaveAttribute('aria-pressed', 'true');
  await page.getByRole('tab', { name: 'Comments' }).click();
  await page.getByRole('button', { name: 'Place a pin' }).click();
  const canvas = page.getByTestId('plan-canvas');
  await expect(canvas.locator('canvas').first()).toBeVisible();
  const box = (await canvas.boundingBox())!;
  await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
  const textarea = page.getByLabel('Comment', { exact: true });
  await textarea.fill('Is there room for a lined bend here?');
  await page.getByRole('button', { name: 'Post comment' }).click();
  await expect(page.getByTestId('comment-pin')).toHaveCount(1);
  await expect(page.getByTestId('comment-thread')).toContainText('Is there room for a lined bend here?');
});
