import { expect, test } from '@playwright/test';
import { emptyDocument, initialEditorState, performCommand, type PlanDocument } from '@/lib/plan';
import { Plan } from '@/models';
import { signIn } from './fixtures';
import { acousticianWithProject, canvasBox, waitForSaved } from './editor-fixtures';

// One straight run across the middle of the blank grid (4000 × 3000 px), so its midpoint is
// the centre of the canvas whatever the window size.
function middleRun(): PlanDocument {
  return performCommand('draw-segment', emptyDocument(), initialEditorState(), { from: { point: { x: 1500, y: 1500 } }, to: { point: { x: 2500, y: 1500 } } }).doc;
}

test('a stale save gets the conflict prompt and the person’s edit survives', async ({ page, browser }) => {
  const { email, project } = await acousticianWithProject('conflict');
  const plan = await Plan.create({ projectId: project.id, name: 'Shared plan', document: middleRun() });

  const other = await browser.newPage();
  for (const tab of [page, other]) {
    await signIn(tab, email);
    await tab.goto(`/plans/${plan.id}`);
    await expect(tab.locator('canvas').first()).toBeVisible();
  }

  async function setDiameter(tab: typeof page, text: string) {
    const box = await canvasBox(tab);
    await tab.getByRole('button', { name: /^Select/ }).click();
    await tab.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
    const diameter = tab.getByLabel('Diameter');
    await diameter.fill(text);
    await diameter.press('Enter');
  }

  // The other tab saves first.
  await setDiameter(other, '300 mm');
  await waitForSaved(other);

  // This tab still holds version 1: its save is refused and the choice is offered.
  await setDiameter(page, '160 mm');
  await expect(page.getByRole('alertdialog', { name: 'This plan changed elsewhere' })).toBeVisible();
  await expect(page.getByTestId('save-status')).toContainText('Not saved');
  await expect(page.getByLabel('Diameter')).toHaveValue('160 mm');

  await page.getByRole('button', { name: 'Overwrite with mine' }).click();
  await waitForSaved(page);
  await plan.reload();
  const saved = plan.document as PlanDocument;
  expect(saved.segments[0].section).toEqual({ shape: 'round', diameterM: 0.16 });
  expect(plan.version).toBe(3);
  await other.close();
});
