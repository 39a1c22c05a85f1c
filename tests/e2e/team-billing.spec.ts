import { expect, test, type Page } from '@playwright/test';
import { createPerson, createTeam, signIn } from './fixtures';
import { paymentFake } from './team-inbox';

async function expectAfterReload(page: Page, testId: string, text: string): Promise<void> {
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId(testId)).toHaveText(text, { timeout: 1000 });
  }).toPass();
}

test('buying a seat changes the count only when the payment service’s webhook arrives', async ({ page }) => {
  const team = await createTeam('Buying team');
  const { email } = await createPerson('buyer', [{ team, role: 'admin' }]);
  await signIn(page, email);
  await page.goto('/team/billing');
  await expect(page.getByTestId('billing-state')).toHaveText('Included seats only');
  await expect(page.getByTestId('total-seats')).toHaveText('3');

  await paymentFake('hold', { email });
  await page.getByLabel('Paid seats', { exact: true }).fill('2');
  await page.getByRole('button', { name: 'Change paid seats' }).click();
  await expect(page.getByTestId('seat-change-pending')).toContainText('2 paid seats asked of the payment service');
  await page.reload();
  await expect(page.getByTestId('paid-seats')).toHaveText('0');
  await expect(page.getByTestId('total-seats')).toHaveText('3');

  await paymentFake('release', { email });
  await expectAfterReload(page, 'paid-seats', '2');
  await expect(page.getByTestId('total-seats')).toHaveText('5');
  await expect(page.getByTestId('billing-state')).toHaveText('Paid up');
  await expect(page.getByTestId('seat-change-pending')).toHaveCount(0);

  await page.goto('/team/audit?area=billing');
  await expect(page.getByRole('table', { name: 'Audit log' })).toContainText('0 → 2 paid seats');
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
