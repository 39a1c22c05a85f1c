import { expect, test } from '@playwright/test';
import { planLabels } from '@/lib/plan/labels';
import { User } from '@/models';
import { fittedPlanToScreen } from './editor-fixtures';
import { signIn } from './fixtures';
import { mailTo, teamWithRevision } from './review-fixtures';

// The demo plan's fan (10 blades at 605 rpm, blade pass 100.8 Hz) sits on a resonance of its run,
// and its run feeds a room with risk flags: those rows must be left for the engineer to check one by one.

test('the engineer checks every clear row in one step, raises a query, and confirms the outcome with a note that reaches the mail', async ({ page }) => {
  const { people, projectId, planId } = await teamWithRevision('Signoff', 'recital');
  await signIn(page, people.engineer.email);

  // A review waiting shows in the header, on the projects list and on the plan's row.
  await expect(page.getByTestId('reviews-waiting')).toContainText('1');
  await expect(page.getByRole('list', { name: 'Projects' }).getByRole('link', { name: /Signoff recital hall/ })).toContainText('1 plan waiting for your review');
  await page.goto(`/projects/${projectId}`);
  await page.getByRole('link', { name: 'Revision 1 of Signoff level 2 supply is waiting for your review' }).click();
  await expect(page).toHaveURL(new RegExp(`/plans/${planId}/revisions/1$`));

  const tally = page.getByTestId('review-tally');
  await expect(tally).toContainText('0 checked');
  const bulk = page.getByRole('button', { name: /^Check all clear rows \((\d+)\)$/ });
  const clear = Number((await bulk.textContent())!.match(/\((\d+)\)/)![1]);
  expect(clear).toBeGreaterThan(0);
  await bulk.click();
  await expect(page.getByRole('status').filter({ hasText: 'clear rows checked' })).toHaveText(`${clear} clear rows checked.`);
  await expect(tally).toContainText(`${clear} checked`);
  await expect(page.getByRole('button', { name: 'Check all clear rows (0)' })).toBeDisabled();

  // The row on the fan tone was left alone; the engineer raises a query on it.
  const toneRow = page.locator('tr', { hasText: '⚠ meets' }).first();
  await expect(toneRow.getByTestId('row-decision')).toHaveText(/Not checked yet/);
  await toneRow.getByRole('button', { name: /^Query / }).click();
  await toneRow.getByRole('textbox').fill('Sits on the blade-pass tone: retune the riser');
  await toneRow.getByRole('button', { name: 'Raise query' }).click();
  await expect(toneRow.getByTestId('row-decision')).toHaveText(/Query/);
  await expect(tally).toContainText('1 query');

  // Finishing asks first; going back changes nothing.
  await page.getByRole('button', { name: 'Finish the review…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Finish the review of revision 1' });
  await expect(dialog.getByTestId('finish-summary')).toContainText(`${clear} rows checked`);
  await expect(dialog.getByTestId('finish-summary')).toContainText('1 query raised');
  await expect(dialog.getByRole('list', { name: 'Queries raised' })).toContainText('Sits on the blade-pass tone: retune the riser');
  await expect(dialog.getByRole('radio', { name: /^Accepted\b(?! with)/ })).toBeDisabled();
  await dialog.getByRole('button', { name: 'Go back to the rows' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByTestId('revision-state').first()).toHaveText(/Waiting for review/);

  await page.getByRole('button', { name: 'Finish the review…' }).click();
  await dialog.getByRole('radio', { name: /Revise and resubmit/ }).check();
  await dialog.getByLabel(/^Note to /).fill('Retune the riser, then resubmit.\nThe rest of the run reads well.');
  await dialog.getByRole('button', { name: 'Confirm: revise and resubmit' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByTestId('revision-state').first()).toHaveText(/Revise and resubmit/);
  await expect(page.getByTestId('review-outcome')).toContainText('Retune the riser, then resubmit.');
  await expect(page.getByTestId('reviews-waiting')).toContainText('0');

  const mail = await mailTo(people.acoustician.email, 'Review finished');
  expect(mail.subject).toBe('Review finished: Signoff recital hall: Signoff level 2 supply, revision 1, revise and resubmit');
  expect(mail.text).toContain('  Retune the riser, then resubmit.\n  The rest of the run reads well.');
  expect(mail.text).toContain('Sits on the blade-pass tone: retune the riser');
});

test('a pin says where it is in plan units and by the nearest labelled segment, in metres or feet and inches', async ({ page }) => {
  const { people, planId, document, metresPerPixel } = await teamWithRevision('Units', 'recital');
  const labels = planLabels(document);
  const segment = labels.segments['corridor-main'];
  const from = labels.nodes['riser-foot'].replace('/', '\\/');
  await signIn(page, people.architect.email);
  await page.goto(`/plans/${planId}/revisions/1`);
  await page.getByRole('button', { name: 'Place a pin' }).click();
  await expect(page.getByTestId('plan-canvas').locator('canvas').first()).toBeVisible();
  await page.getByTestId('plan-canvas').scrollIntoViewIfNeeded();
  // 0.6 m off the middle of the corridor duct (120,380)–(520,380): 4.00 m along it (worked by hand, 0.02 m a pixel)
  const spot = await fittedPlanToScreen(page, { x: 320, y: 410 }, { document, metresPerPixel });
  await page.mouse.click(spot.x, spot.y);
  await expect(page.getByTestId('draft-place')).toHaveText(new RegExp(`^New pin, (3\\.9\\d|4\\.0\\d) m along ${segment} from ${from} \\(6\\.\\d\\d m from the plan's left, 8\\.\\d\\d m from its top\\)$`));
  await expect(page.getByTestId('draft-place')).not.toContainText('px');
  await page.getByLabel('Comment', { exact: true }).fill('Room for a lined bend here?');
  await page.getByRole('button', { name: 'Post comment' }).click();
  await expect(page.getByTestId('pin-place')).toHaveText(new RegExp(`^Pin 1, (3\\.9\\d|4\\.0\\d) m along ${segment} from ${from}$`));

  // An imperial reader sees the same pin in feet and inches (4.00 m = 13 ft 1 1/2 in to the nearest 1/4 in).
  await User.update({ unitSystem: 'imperial' }, { where: { id: people.acoustician.id } });
  await page.context().clearCookies();
  await signIn(page, people.acoustician.email);
  await page.goto(`/plans/${planId}/revisions/1`);
  await expect(page.getByTestId('pin-place')).toHaveText(new RegExp(`^Pin 1, 1[23] ft [\\d /]+ in along ${segment} from ${from}$`));
});
