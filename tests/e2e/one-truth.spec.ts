// One truth per plan version, from an acoustician's steps: a plan of three segments with a tee, a
// lined corridor leg and one room fed from the branch. The level flag's lining is offered on the
// branch that feeds the room, named by the label the plan shows; added, it does what it said;
// removed, the drawing is as before; and after undo restores the submitted content the header says
// so. Issue items 1, 2, 5 and 8 (product behaviour, no outside source).
import { expect, test, type Page } from '@playwright/test';
import { newRoom, type PlanDocument } from '@/lib/plan';
import { Plan } from '@/models';
import { acousticianWithProject, fittedPlanToScreen, waitForSaved } from './editor-fixtures';
import { signIn } from './fixtures';

const METRES_PER_PIXEL = 0.02;

function teePlan(): PlanDocument {
  const room = newRoom('meeting', { name: 'Meeting room 2', x: 300, y: 400, lengthM: 8, widthM: 6, heightM: 3 });
  return {
    schemaVersion: 1,
    nodes: [{ id: 'fan', x: 100, y: 100 }, { id: 'tee', x: 400, y: 100 }, { id: 'corridor-end', x: 1000, y: 100 }, { id: 'branch-end', x: 400, y: 460 }],
    segments: [
      { id: 'fan-leg', from: 'fan', to: 'tee', section: { shape: 'rect', widthM: 0.5, heightM: 0.3 } },
      { id: 'corridor-leg', from: 'tee', to: 'corridor-end', section: { shape: 'rect', widthM: 0.4, heightM: 0.3 }, lining: { thicknessM: 0.025, absorption: 0.6 } },
      { id: 'branch-leg', from: 'tee', to: 'branch-end', section: { shape: 'round', diameterM: 0.25 } },
    ],
    runs: [{
      id: 'supply', name: 'Level 2 supply', startNodeId: 'fan', endNodeId: null, temperatureC: 18, fan: null,
      terminations: { fan: { kind: 'closed' }, 'corridor-end': { kind: 'open', flange: 'unflanged' }, 'branch-end': { kind: 'open', flange: 'flanged' } },
    }],
    rooms: [{ ...room, criterionNc: 25, outlet: { nodeId: 'branch-end', xM: 2, yM: 1.2, zM: 2.8 }, listener: { xM: 6, yM: 4, zM: 1.2 }, outletSoundPowerDb: [70, 68, 66, 64, 60, 56, 50, 44] }],
    outlets: [],
    listeners: [],
    treatments: [],
  };
}

async function clickSegment(page: Page, document: PlanDocument, from: { x: number; y: number }, to: { x: number; y: number }): Promise<void> {
  const at = await fittedPlanToScreen(page, { x: (from.x + to.x) / 2 + (to.x - from.x) * 0.1, y: (from.y + to.y) / 2 + (to.y - from.y) * 0.1 }, { document, metresPerPixel: METRES_PER_PIXEL });
  await page.mouse.click(at.x, at.y);
}

test('the level flag offers lining on the branch that feeds the room, named as the plan names it; it holds once added and removing it restores the drawing', async ({ page }, testInfo) => {
  const { email, user, project } = await acousticianWithProject('one-truth');
  const document = teePlan();
  const plan = await Plan.create({ projectId: project.id, name: 'Level 2 supply', document, metresPerPixel: METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);

  // Every segment is labelled on the plan and in its panel.
  await clickSegment(page, document, { x: 400, y: 100 }, { x: 400, y: 460 });
  await expect(page.getByTestId('segment-label')).toHaveText('A3');
  await page.keyboard.press('Escape');

  // The room's loudest band is over its criterion; its treatments line the branch that feeds the room.
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  const levelRow = drawer.locator('[data-testid="risk-row"][data-subject^="band:"]').first();
  await expect(levelRow).toBeVisible();
  const subject = await levelRow.getAttribute('data-subject');
  await levelRow.getByRole('button', { name: /^Treatments for/ }).click();
  const lining = drawer.locator('[data-testid="treatment-option"][data-kind="line-segment"]');
  await expect(lining).toContainText('Line A3');
  const promised = (await lining.getByTestId('option-after').textContent())?.trim() ?? '';
  expect(promised).toMatch(/dB/);
  await page.screenshot({ path: testInfo.outputPath('options.png') });
  await lining.getByRole('button', { name: 'Add to plan' }).click();
  await waitForSaved(page);

  // Added, it holds: the saved plan's analysis gives the level it promised.
  const row = drawer.getByTestId('treatment-row');
  await expect(row.getByTestId('treatment-standing')).toContainText(/Holds/);
  await expect(row.getByTestId('treatment-after')).toHaveText(promised);
  let saved = (await Plan.findByPk(plan.id))?.document as PlanDocument;
  expect(saved.segments.find((segment) => segment.id === 'branch-leg')?.lining).toEqual({ thicknessM: 0.05 }); // fibrous liner by band for its thickness
  await drawer.getByRole('tab', { name: /^Risks/ }).click();
  const still = drawer.locator(`[data-testid="risk-row"][data-subject="${subject}"]`);
  if (await still.count()) await expect(still).toContainText(promised.split(' (')[0]);
  await page.screenshot({ path: testInfo.outputPath('after-adding.png') });

  // Removed, the branch is unlined again and the corridor keeps its own lining.
  await drawer.getByRole('tab', { name: /^Treatments/ }).click();
  await row.getByRole('button', { name: 'Remove', exact: true }).click();
  await waitForSaved(page);
  await expect(drawer.getByTestId('treatment-row')).toHaveCount(0);
  saved = (await Plan.findByPk(plan.id))?.document as PlanDocument;
  expect(saved.segments.find((segment) => segment.id === 'branch-leg')?.lining).toBeUndefined();
  expect(saved.segments.find((segment) => segment.id === 'corridor-leg')?.lining).toEqual({ thicknessM: 0.025, absorption: 0.6 });
});

test('after undo brings back exactly the submitted content, the header says the plan is that revision again', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('one-truth-draft');
  const document = teePlan();
  const plan = await Plan.create({ projectId: project.id, name: 'Level 2 supply', document, metresPerPixel: METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  const state = page.getByTestId('plan-revision-state');
  await expect(state).toContainText('Draft, never submitted');

  await page.getByRole('button', { name: 'Submit for review' }).click();
  await page.getByRole('button', { name: 'Submit', exact: true }).click();
  await page.waitForURL(/\/revisions\/1$/);
  await page.goto(`/plans/${plan.id}`);
  await expect(state).toContainText('Revision 1');

  // An edit makes it a draft; undo brings the same content back and the header follows.
  await clickSegment(page, document, { x: 100, y: 100 }, { x: 400, y: 100 });
  await expect(page.getByTestId('segment-label')).toHaveText('A1');
  await page.keyboard.press('Delete');
  await waitForSaved(page);
  await expect(state).toContainText('Draft: changed since revision 1');
  await page.getByRole('button', { name: 'Undo' }).click();
  await waitForSaved(page);
  await expect(state).toContainText('Revision 1');
  await expect(state).not.toContainText('Draft');
});
