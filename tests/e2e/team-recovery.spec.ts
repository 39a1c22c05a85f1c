import { expect, test } from '@playwright/test';
import { createPerson, createTeam, signIn } from './fixtures';
import { linkFromMail } from './team-inbox';

test('a forgotten password is reset from the mailed link, once', async ({ page }) => {
  const team = await createTeam('Recovery team');
  const { email } = await createPerson('forgetful', [{ team, role: 'engineer' }]);
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgotten your password?' }).click();
  await expect(page.getByRole('heading', { name: 'Forgotten password' })).toBeVisible();
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send the link' }).click();
  await expect(page.getByRole('status')).toHaveText('If an account uses that address, a link to choose a new password is on its way. It works once, within an hour.');

  const link = await linkFromMail(email, '/reset-password');
  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill('short');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByText('Use at least 10 characters.')).toBeVisible();
  await page.getByLabel('New password', { exact: true }).fill('a fresh long password');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByRole('status')).toContainText('Password changed.');

  await signIn(page, email, 'a fresh long password');
  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill('another long password');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByTestId('form-alert')).toContainText('This reset link has already been used.');
});
