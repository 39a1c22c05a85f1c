import { expect, test } from '@playwright/test';
import { Plan } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../unit/plan/room-plan-fixture';
import { acousticianWithProject, waitForSaved } from './editor-fixtures';
import { signIn } from './fixtures';

test('a fan tone meeting a resonance of the run feeding a room is flagged with its dB over the operating envelope; a chosen retune clears it and the list shows before and after', async ({ page }, testInfo) => {
  const { email, user, project } = await acousticianWithProject('rooms-risk');
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);

  // The risk drawer lists the blade-pass flag, with its severity in words.
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  const toneRow = drawer.locator('[data-testid="risk-row"][data-subject="tone:h1"]');
  await expect(toneRow).toBeVisible();
  await expect(toneRow).toContainText(/Low|Medium|High/);
  await expect(toneRow).toContainText('blade-pass tone');
  await expect(toneRow).toContainText('Recital room');
  // the envelope: 868 rpm ± 2 % belt slip (no speed range entered), supply air 18 ± 5 °C
  await expect(toneRow).toContainText('fan 851–885 rpm (belt slip), air 13–23 °C');
  await expect(toneRow).toContainText(/the run adds [+−]\d+\.\d dB/);
  await expect(drawer.getByTestId('risk-rules')).toContainText('operating envelope');

  // The room's results: mode chart with the run's resonances and fan tones, reflectogram, spectrum.
  await drawer.getByRole('tab', { name: /^Rooms/ }).click();
  await drawer.getByRole('button', { name: 'Open Recital room' }).click();
  const roomPanel = page.getByTestId('room-panel');
  await expect(roomPanel.getByRole('img', { name: /^Mode chart from/ })).toBeVisible();
  await expect(roomPanel.getByRole('img', { name: /^Reflectogram/ })).toBeVisible();
  await expect(roomPanel.getByRole('img', { name: /^Spectrum against NC 25/ })).toBeVisible();
  await roomPanel.getByTestId('room-results').screenshot({ path: testInfo.outputPath('room-results.png') });

  // With the outlet's sound power the spectrum is predicted and rated against the criterion.
  const soundPower = page.getByLabel(/Outlet sound power/);
  await soundPower.fill('70, 66, 62, 58, 54, 50, 46, 42');
  await soundPower.press('Enter');
  await waitForSaved(page);
  const spectrum = roomPanel.getByRole('img', { name: /^Spectrum against NC 25: predicted NC \d+/ });
  await expect(spectrum).toBeVisible();
  await spectrum.scrollIntoViewIfNeeded();
  await spectrum.screenshot({ path: testInfo.outputPath('spectrum.png') });

  // Candidate treatments, each re-run through the engine; choose the retune.
  await drawer.getByRole('tab', { name: /^Risks/ }).click();
  await toneRow.getByRole('button', { name: /^Treatments for/ }).click();
  const retune = drawer.locator('[data-testid="treatment-option"][data-kind="retune-length"]');
  await expect(retune).toContainText(/(Lengthen|Shorten) A1 by \d+ mm/);
  await expect(retune).toContainText('✓ yes');
  await expect(retune.getByTestId('option-effect')).toContainText(/clearance at the envelope's edges \+\d+\.\d Hz/);
  const branch = drawer.locator('[data-testid="treatment-option"][data-kind="side-branch-resonator"]');
  await expect(branch.getByTestId('option-effect')).toContainText(/insertion loss at the tone/);
  await expect(drawer.getByRole('complementary', { name: 'Cautions' })).toContainText('fire and smoke');
  await page.screenshot({ path: testInfo.outputPath('treatment-options.png') });
  await retune.getByRole('button', { name: 'Add to plan' }).click();
  await waitForSaved(page);

  // The treatment list shows the flagged quantity before and after.
  const row = drawer.getByTestId('treatment-row');
  await expect(row).toHaveCount(1);
  await expect(row.getByTestId('treatment-before')).toContainText(/resonance 115\.\d Hz/);
  await expect(row.getByTestId('treatment-before')).toContainText(/sweeps 112\.\d–119\.\d Hz/);
  await expect(row.getByTestId('treatment-after')).toContainText(/the run adds [+−]\d+\.\d dB/);
  await expect(row.getByTestId('treatment-standing')).toContainText('Holds');

  // On the next results from the saved plan, the tone flag is gone.
  await drawer.getByRole('tab', { name: /^Risks/ }).click();
  await expect(drawer.getByRole('status').filter({ hasText: 'updating' })).toHaveCount(0);
  await expect(drawer.locator('[data-testid="risk-row"][data-subject="tone:h1"]')).toHaveCount(0);
  await page.screenshot({ path: testInfo.outputPath('after-retune.png') });

  // The retune is a length override on the drawn segment.
  const saved = await Plan.findByPk(plan.id);
  const document = saved?.document as ReturnType<typeof roomPlanDocument>;
  expect(document.segments.find((segment) => segment.id === 'main')?.lengthOverrideM).toBeGreaterThan(0);
});

test('the Room tool draws a room at the plan scale and its form takes any unit', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('rooms-draw');
  const plan = await Plan.create({ projectId: project.id, name: 'Meeting rooms', document: roomPlanDocument(null), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  const box = await page.locator('.konvajs-content canvas').first().boundingBox();
  if (!box) throw new Error('no canvas');
  await page.getByRole('button', { name: /^Room/ }).click();
  await page.mouse.click(box.x + box.width - 300, box.y + 60);
  await page.mouse.click(box.x + box.width - 150, box.y + 160);
  const roomPanel = page.getByTestId('room-panel');
  await expect(roomPanel).toBeVisible();
  await expect(page.getByLabel('Name')).toHaveValue('Room 2');
  await page.getByLabel('Height', { exact: true }).fill('9 ft 10 in');
  await page.getByLabel('Height', { exact: true }).press('Enter');
  await expect(roomPanel.getByText(/Read as/)).toBeVisible();
  await page.getByLabel("Corner from the plan's left").fill('2 m');
  await page.getByLabel("Corner from the plan's left").press('Enter');
  await page.getByLabel('Floor').selectOption('carpet-on-concrete');
  await expect(roomPanel.getByText(/check them against the maker’s published data/).first()).toBeVisible();
  await waitForSaved(page);
  const saved = await Plan.findByPk(plan.id);
  const rooms = (saved?.document as ReturnType<typeof roomPlanDocument>).rooms;
  expect(rooms).toHaveLength(2);
  expect(rooms[1].heightM).toBeCloseTo(2.997, 3);
  expect(rooms[1].surfaces.floor.finishId).toBe('carpet-on-concrete');
  // 2 m at 20 mm per pixel
  expect(rooms[1].x).toBeCloseTo(100, 6);
});
