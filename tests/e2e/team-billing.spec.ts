import { expect, test, type Page } from '@playwright/test';
import { createPerson, createTeam, signIn } from './fixtures';
import { paymentFake } from './team-inbox';

async function expectAfterReload(page: Page, testId: string, text: string): Promise<void> {
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId(testId)).toHaveText(text, { timeout: 1000 });
  }).toPass();
}

// The team's billing as stored, without the page's reconciling (GET /api/v1/team/billing reads
// only what webhooks and page visits have written).
async function storedPaidSeats(page: Page): Promise<number> {
  const answer = await page.request.get('/api/v1/team/billing');
  expect(answer.ok()).toBe(true);
  return ((await answer.json()) as { billing: { paidSeats: number } }).billing.paidSeats;
}

test('buying seats: the payment service’s webhook sets the count', async ({ page }) => {
  const team = await createTeam('Buying team');
  const { email } = await createPerson('buyer', [{ team, role: 'admin' }]);
  await signIn(page, email);
  await page.goto('/team/billing');
  await expect(page.getByTestId('billing-state')).toHaveText('Included seats only');
  await expect(page.getByTestId('total-seats')).toHaveText('3');

  await page.getByLabel('Paid seats', { exact: true }).fill('2');
  await page.getByRole('button', { name: 'Change paid seats' }).click();
  await expect.poll(() => storedPaidSeats(page), { timeout: 60_000, message: 'the webhook sets 2 paid seats' }).toBe(2);
  await page.reload();
  await expect(page.getByTestId('paid-seats')).toHaveText('2');
  await expect(page.getByTestId('total-seats')).toHaveText('5');
  await expect(page.getByTestId('billing-state')).toHaveText('Paid up');
  await expect(page.getByTestId('seat-change-pending')).toHaveCount(0);

  await page.goto('/team/audit?area=billing');
  await expect(page.getByRole('table', { name: 'Audit log' })).toContainText('0 → 2 paid seats');
});

test('webhooks that never arrive: the billing page asks the payment service, and late ones change nothing', async ({ page }) => {
  const team = await createTeam('Lost webhooks team');
  const { email } = await createPerson('lost-hooks', [{ team, role: 'admin' }]);
  await signIn(page, email);
  await page.goto('/team/billing');
  await paymentFake('hold', { email });
  await page.getByLabel('Paid seats', { exact: true }).fill('2');
  await page.getByRole('button', { name: 'Change paid seats' }).click();
  // The page drawn again after the request asks the payment service, as does every opening of it.
  await expect(page.getByTestId('paid-seats')).toHaveText('2');
  await page.reload();
  await expect(page.getByTestId('paid-seats')).toHaveText('2');
  await expect(page.getByTestId('total-seats')).toHaveText('5');
  await expect(page.getByTestId('seat-change-pending')).toHaveCount(0);

  // Released late, the webhooks arrive (the paid invoice is theirs alone to record) and change nothing more.
  await paymentFake('release', { email });
  await page.goto('/team/audit?area=billing');
  await expect(async () => {
    await page.reload();
    await expect(page.getByRole('table', { name: 'Audit log' })).toContainText('Invoice', { timeout: 1000 });
  }).toPass({ timeout: 60_000 });
  await expect(page.getByRole('table', { name: 'Audit log' }).getByRole('row').filter({ hasText: 'Paid seats changed' })).toHaveCount(1);
  expect(await storedPaidSeats(page)).toBe(2);
});

test('the first webhook deliveries fail: they are sent again and the team still ends with the right seats', async ({ page }) => {
  const team = await createTeam('Failing deliveries team');
  const { email } = await createPerson('failing-hooks', [{ team, role: 'admin' }]);
  await signIn(page, email);
  await page.goto('/team/billing');
  await paymentFake('fail', { email, count: '2' }); // the next two tries fail as if the app had not answered
  await page.getByLabel('Paid seats', { exact: true }).fill('3');
  await page.getByRole('button', { name: 'Change paid seats' }).click();
  // Not the page's reconciling: the stored count, written only by the retried webhooks.
  await expect.poll(() => storedPaidSeats(page), { timeout: 60_000, message: 'the retried webhooks set 3 paid seats' }).toBe(3);
  await page.goto('/team/audit?area=billing');
  await expect(page.getByRole('table', { name: 'Audit log' })).toContainText('0 → 3 paid seats');
});

test('a failed payment makes the team read-only with a banner; a paid invoice lifts it', async ({ page }) => {
  const team = await createTeam('Grace team');
  const { email } = await createPerson('grace-admin', [{ team, role: 'admin' }]);
  await signIn(page, email);
  await page.goto('/team/billing');
  await page.getByLabel('Paid seats', { exact: true }).fill('1');
  await page.getByRole('button', { name: 'Change paid seats' }).click();
  await expectAfterReload(page, 'paid-seats', '1');

  await paymentFake('invoices', { email, outcome: 'failed' });
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId('read-only-banner')).toBeVisible({ timeout: 1000 });
  }).toPass();
  await expect(page.getByTestId('billing-state')).toHaveText('Payment failed: read-only');
  const refused = await page.request.post('/api/v1/projects', { data: { name: 'During grace' } });
  expect(refused.status()).toBe(403);
  expect(await refused.json()).toMatchObject({ error: { message: expect.stringContaining('read-only because its last payment failed') } });

  await paymentFake('invoices', { email, outcome: 'paid' });
  await expectAfterReload(page, 'billing-state', 'Paid up');
  await expect(page.getByTestId('read-only-banner')).toHaveCount(0);
});
