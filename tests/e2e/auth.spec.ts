import { expect, test } from '@playwright/test';
import { createPerson, createTeam, PASSWORD, signIn, uniqueEmail } from './fixtures';
import { linkFromMail } from './team-inbox';

test('sign up: the mailed link creates the account and its team; then sign out and sign in again', async ({ page }) => {
  const email = uniqueEmail('signup');
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in$/);
  await page.getByRole('link', { name: 'Create an account and team' }).click();
  await page.getByLabel('Your name').fill('Rowan Tessaly');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('a long enough password');
  await page.getByLabel('Team name').fill('Tessaly Sound');
  await page.getByRole('button', { name: 'Create account and team' }).click();
  await expect(page.getByRole('status')).toContainText(`Check the inbox of ${email}`);

  await page.goto(await linkFromMail(email, '/sign-up/confirm'));
  await expect(page.getByRole('heading', { name: 'Confirm your address' })).toBeVisible();
  await page.getByRole('button', { name: 'Create account and team' }).click();
  await expect(page).toHaveURL(/\/projects$/);
  await expect(page.getByRole('heading', { name: 'No projects yet' })).toBeVisible();
  await expect(page.getByTestId('active-role')).toHaveText('Team admin');

  await page.getByRole('button', { name: 'Rowan Tessaly' }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await page.goto('/projects');
  await expect(page).toHaveURL(/\/sign-in$/);

  await signIn(page, email, 'a long enough password');
  await expect(page.getByRole('main').getByText('Tessaly Sound')).toBeVisible();
});

test('sign-up form names what is wrong and keeps what was typed', async ({ page }) => {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill('Short Password');
  await page.getByLabel('Password').fill('short');
  await page.getByRole('button', { name: 'Create account and team' }).click();
  await expect(page.getByText('Use at least 10 characters.')).toBeVisible();
  await expect(page.getByText('Enter your e-mail address.')).toBeVisible();
  await expect(page.getByLabel('Your name')).toHaveValue('Short Password');
});

test('a wrong password says only that the e-mail or password is wrong', async ({ page }) => {
  const team = await createTeam('Wrong password');
  const { email } = await createPerson('wrongpw', [{ team, role: 'acoustician' }]);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('not it');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-alert')).toContainText('The e-mail or password is wrong.');
  await expect(page.getByLabel('E-mail')).toHaveValue(email);
});

test('repeated failures slow the next try and say how long to wait', async ({ page }) => {
  const team = await createTeam('Throttle');
  const { email } = await createPerson('throttle', [{ team, role: 'viewer' }]);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  for (let attempt = 0; attempt < 4; attempt += 1) {
    await page.getByLabel('Password').fill(`wrong ${attempt}`);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByTestId('form-alert')).toContainText('The e-mail or password is wrong.');
  }
  await page.getByLabel('Password').fill('wrong again');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-alert')).toContainText('The e-mail or password is wrong, and there have been too many failed sign-ins. Wait 30 s before the next try; the right password then signs you in.');
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-alert')).toContainText(/Too many failed sign-ins\. Wait \d+ s before the next try/);
  await expect(page).toHaveURL(/\/sign-in$/);
});
