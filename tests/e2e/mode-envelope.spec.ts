// The mode overlay draws the engine's pressure envelope of the resonance chosen in the results, asked
// for on its own: the plan's results come without envelopes, and choosing a row fetches that one
// resonance's (runId and envelopes=<order>), which the overlay draws with a point for every sample.
// (Product behaviour, no outside source; the envelope itself is checked against the standing-wave
// formula in tests/unit/acoustic/resonances/pressure-envelope.test.ts.)
import { expect, test } from '@playwright/test';
import type { Resonance } from '@/lib/acoustic';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import type { PlanResultsAnswer } from '@/lib/plans/results-answer';
import { Plan } from '@/models';
import { acousticianWithProject } from './editor-fixtures';
import { signIn } from './fixtures';

interface KonvaLine { name(): string; points(): number[] }
interface KonvaStage { find(selector: string): KonvaLine[] }

test('choosing a resonance fetches its envelope alone, and the overlay draws every sample of it', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('mode-envelope');
  const plan = await Plan.create({
    projectId: project.id, name: 'Recital supply', document: demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }),
    metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id,
  });
  await signIn(page, email);
  const resultsPath = `/api/v1/plans/${plan.id}/results`;
  const plainAnswer = page.waitForResponse((response) => new URL(response.url()).pathname === resultsPath && new URL(response.url()).search === '');
  await page.goto(`/plans/${plan.id}`);
  const plain = (await (await plainAnswer).json()) as PlanResultsAnswer;
  expect(plain.runs.length).toBeGreaterThan(0);
  expect(JSON.stringify(plain)).not.toContain('pressureEnvelope');

  const row = page.getByRole('table', { name: 'Resonances' }).locator('tbody tr').nth(2);
  await expect(row).toBeVisible();
  const order = Number((await row.locator('td').first().innerText()).replace(/\D/g, ''));
  const envelopeAnswer = page.waitForResponse((response) => new URL(response.url()).pathname === resultsPath && new URL(response.url()).searchParams.get('envelopes') === String(order));
  await row.click();
  const answer = (await (await envelopeAnswer).json()) as PlanResultsAnswer;
  const carrying = answer.runs.flatMap((run) => (run.analysis?.resonances ?? []).filter((resonance: Resonance) => resonance.pressureEnvelope));
  expect(carrying.map((resonance) => resonance.order)).toEqual([order]);
  const samples = carrying[0].pressureEnvelope!.length;
  expect(samples).toBeGreaterThan(8);

  // Both sides of the envelope, drawn from the engine's samples, one point per sample.
  await expect.poll(() => page.evaluate(() => {
    const stages = (window as unknown as { Konva: { stages: KonvaStage[] } }).Konva.stages;
    return stages.flatMap((stage) => stage.find('.mode-envelope')).map((line) => [line.name(), line.points().length / 2]);
  })).toEqual([['mode-envelope engine', samples], ['mode-envelope engine', samples]]);
});
