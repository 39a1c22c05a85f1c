import { expect, test } from '@playwright/test';
import { signIn } from './fixtures';
import { linkInMailTo, teamWithRevision } from './review-fixtures';

// The fixture's run has two resonances below 20 Hz, so the lowest listed orders are 3 and 4.

test('the engineer queries a resonance row and the acoustician sees the revision returned with the query', async ({ page }) => {
  const { people, planId } = await teamWithRevision('Flag');
  await signIn(page, people.engineer.email);
  await page.goto(`/plans/${planId}/revisions/1`);
  await expect(page.getByTestId('revision-state').first()).toHaveText(/Waiting for review/);
  await page.getByRole('button', { name: 'Query Supply run 1 order 3', exact: true }).click();
  await page.getByLabel('Query on Supply run 1 order 3').fill('Sits on the fan tone; retune the riser');
  await page.getByRole('button', { name: 'Raise query' }).click();
  const row = page.getByTestId('review-row-Supply run 1-3');
  await expect(row.getByTestId('row-decision')).toHaveText(/Query/);
  await page.getByRole('button', { name: 'Check Supply run 1 order 4', exact: true }).click();
  await expect(page.getByTestId('review-row-Supply run 1-4').getByTestId('row-decision')).toHaveText(/Checked/);
  await page.getByRole('button', { name: 'Finish the review…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Finish the review of revision 1' });
  await expect(dialog.getByRole('radio', { name: /Revise and resubmit/ })).toBeChecked();
  await dialog.getByRole('button', { name: 'Confirm: revise and resubmit' }).click();
  await expect(page.getByTestId('revision-state').first()).toHaveText('↺Revise and resubmit');

  await page.context().clearCookies();
  await signIn(page, people.acoustician.email);
  await page.goto(`/plans/${planId}/revisions`);
  await expect(page.getByRole('list', { name: 'Revisions' })).toContainText('Revise and resubmit');
  await expect(page.getByTestId('plan-revision-state')).toContainText('Revision 1');
  await expect(page.getByTestId('plan-revision-state')).toContainText('Revise and resubmit');
  await page.getByRole('list', { name: 'Revisions' }).getByRole('link', { name: /Revision 1/ }).click();
  const seen = page.getByTestId('review-row-Supply run 1-3');
  await expect(seen).toContainText('Query');
  await expect(seen).toContainText('Sits on the fan tone; retune the riser');
  await expect(page.getByRole('button', { name: /^Query / })).toHaveCount(0);
});

test('the architect pins a comment mentioning the acoustician, who follows the mailed link to it', async ({ page }) => {
  const { people, planId } = await teamWithRevision('Pin');
  await signIn(page, people.architect.email);
  await page.goto(`/plans/${planId}/revisions/1`);
  await page.getByRole('button', { name: 'Place a pin' }).click();
  const canvas = page.getByTestId('plan-canvas');
  await expect(canvas.locator('canvas').first()).toBeVisible();
  const box = (await canvas.boundingBox())!;
  await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
  // Typing "@" offers the team's members; the arrow keys move through them and Enter chooses.
  const textarea = page.getByLabel('Comment', { exact: true });
  await textarea.pressSequentially('@E2E pin-');
  const suggestions = page.getByRole('listbox', { name: 'Team members to mention' });
  await expect(suggestions.getByRole('option')).toHaveText([`@${people.acoustician.name}`, `@${people.engineer.name}`, `@${people.viewer.name}`]);
  await expect(suggestions.getByRole('option', { selected: true })).toHaveText(`@${people.acoustician.name}`);
  await textarea.press('ArrowDown');
  await expect(suggestions.getByRole('option', { selected: true })).toHaveText(`@${people.engineer.name}`);
  await textarea.press('ArrowUp');
  await textarea.press('Enter');
  await expect(suggestions).toBeHidden();
  await textarea.pressSequentially('can this run move 300 mm east?');
  await expect(textarea).toHaveValue(`@${people.acoustician.name} can this run move 300 mm east?`);
  await page.getByRole('button', { name: 'Post comment' }).click();
  await expect(page.getByTestId('comment-pin')).toHaveCount(1);
  await expect(page.getByTestId('comment-thread')).toContainText('can this run move 300 mm east?');

  // The pin stays on its plan point while the plan zooms about another point.
  const pin = page.getByTestId('comment-pin');
  const tip = async () => { const pinBox = (await pin.boundingBox())!; return { x: pinBox.x + pinBox.width / 2, y: pinBox.y + pinBox.height }; };
  const before = await tip();
  const anchor = { x: box.x + box.width / 2 - 150, y: box.y + box.height / 2 };
  await page.mouse.move(anchor.x, anchor.y);
  await page.mouse.wheel(0, -100);
  const expectedX = anchor.x + (before.x - anchor.x) * 1.15; // the canvas zooms by 1.15 per wheel step
  await expect.poll(async () => Math.abs((await tip()).x - expectedX) <= 1.5 && Math.abs((await tip()).y - before.y) <= 1.5).toBe(true);

  const link = await linkInMailTo(people.acoustician.email, `/plans/${planId}/revisions/1?comment=`);
  await page.context().clearCookies();
  await signIn(page, people.acoustician.email);
  await page.goto(link);
  const thread = page.locator('[data-testid="comment-thread"][aria-current="true"]');
  await expect(thread).toContainText(`@${people.acoustician.name} can this run move 300 mm east?`);
  await expect(page.getByTestId('comment-pin')).toHaveCount(1);
  await thread.getByRole('button', { name: 'Close out' }).click();
  await expect(thread).toContainText('Closed out');
});

test('a viewer can neither review nor comment, and the route handlers answer 403', async ({ page }) => {
  const { people, planId, revision } = await teamWithRevision('Viewer');
  await signIn(page, people.viewer.email);
  await page.goto(`/plans/${planId}/revisions/1`);
  await expect(page.getByTestId('review-row-Supply run 1-3')).toContainText('Not checked yet');
  await expect(page.getByRole('button', { name: /^(Check|Query) / })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Place a pin' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Finish the review/ })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Check all clear rows/ })).toHaveCount(0);

  const decide = await page.request.put(`/api/v1/revisions/${revision.id}/decisions`, { data: { target: 'resonance:x:1', decision: 'checked' } });
  expect(decide.status()).toBe(403);
  const comment = await page.request.post('/api/v1/comments', { data: { planId, xPx: 10, yPx: 10, body: 'hello' } });
  expect(comment.status()).toBe(403);
  expect(await comment.json()).toMatchObject({ error: { code: 'forbidden' } });
});
