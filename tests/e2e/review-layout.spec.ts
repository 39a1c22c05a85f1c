import { expect, test } from '@playwright/test';
import { createComment } from '@/lib/comments/data';
import { getPlan, savePlanDocument } from '@/lib/plans/data';
import { submitRevision } from '@/lib/revisions/data';
import { signIn } from './fixtures';
import { expectCleanLayout } from './layout-check';
import { teamWithRevision } from './review-fixtures';

// The review screens at the two sizes people use most, with nothing overlapping or cut off. The
// screenshots are kept with the test results (test-results/…/review-*.png) for a person to look at.
for (const size of [{ width: 1440, height: 900 }, { width: 1024, height: 768 }]) {
  test(`the review screens at ${size.width}×${size.height} have nothing overlapping or clipped`, async ({ page }, testInfo) => {
    await page.setViewportSize(size);
    const { team, people, planId, projectId } = await teamWithRevision(`Layout${size.width}`, 'recital');
    // Revision 2 changes the fan and the room's criterion, and carries a pin, so every part of the page shows.
    const acoustician = { id: people.acoustician.id, name: people.acoustician.name };
    const plan = await getPlan(team.id, planId);
    const document = { ...plan.document, runs: plan.document.runs.map((run) => ({ ...run, fan: { blades: 11, rpm: 550 } })), rooms: plan.document.rooms.map((room) => ({ ...room, criterionNc: 25 })) };
    await savePlanDocument(team.id, acoustician.id, planId, { version: plan.version, metresPerPixel: plan.metresPerPixel, document });
    const revision = await submitRevision(team.id, acoustician, planId, 'Eleven blades at 550 rpm: the same tone, less power');
    await createComment(team.id, { id: people.architect.id, name: people.architect.name }, { planId, revisionId: revision.id, parentId: null, xPx: 320, yPx: 410, target: null, body: 'Is there room for a lined bend here?' });
    await signIn(page, people.engineer.email);
    await expectCleanLayout(page, page.getByRole('main'));
    await page.screenshot({ path: testInfo.outputPath(`review-projects-${size.width}.png`), fullPage: true });

    await page.goto(`/projects/${projectId}`);
    await expect(page.getByTestId('waiting-marker')).toBeVisible();
    await expectCleanLayout(page, page.getByRole('main'));
    await page.screenshot({ path: testInfo.outputPath(`review-project-${size.width}.png`), fullPage: true });

    await page.goto(`/plans/${planId}/revisions/2`);
    await expect(page.getByTestId('plan-canvas').locator('canvas').first()).toBeVisible();
    await expect(page.getByTestId('plan-changes')).toContainText('Fan blades');
    await expect(page.getByTestId('pin-place')).toContainText('along');
    await page.getByRole('button', { name: /^Check all clear rows/ }).click();
    await expect(page.getByText(/clear rows checked\./)).toBeVisible();
    const toneRow = page.locator('tr', { hasText: '⚠ meets' }).first();
    await toneRow.getByRole('button', { name: /^Query / }).click();
    await toneRow.getByRole('textbox').fill('Sits on the blade-pass tone: retune the riser');
    await expectCleanLayout(page, page.getByRole('main'));
    await toneRow.getByRole('button', { name: 'Raise query' }).click();
    await expect(toneRow.getByTestId('row-decision')).toHaveText(/Query/);
    await expectCleanLayout(page, page.getByRole('main'));
    await page.screenshot({ path: testInfo.outputPath(`review-revision-top-${size.width}.png`) });
    await page.screenshot({ path: testInfo.outputPath(`review-revision-${size.width}.png`), fullPage: true });

    await page.getByRole('button', { name: 'Finish the review…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Finish the review of revision 2' });
    await dialog.getByLabel(/^Note to /).fill('Retune the riser, then resubmit.');
    const box = (await dialog.boundingBox())!;
    expect(box.x >= 0 && box.y >= 0 && box.x + box.width <= size.width && box.y + box.height <= size.height, 'the dialog fits the window').toBe(true);
    await expectCleanLayout(page, dialog);
    await page.screenshot({ path: testInfo.outputPath(`review-finish-dialog-${size.width}.png`) });
    await dialog.getByRole('button', { name: 'Confirm: revise and resubmit' }).click();
    await expect(page.getByTestId('review-outcome')).toBeVisible();
    await expectCleanLayout(page, page.getByRole('main'));
    await page.screenshot({ path: testInfo.outputPath(`review-finished-${size.width}.png`), fullPage: true });

    await page.goto('/reviews');
    await expectCleanLayout(page, page.getByRole('main'));
  });
}
