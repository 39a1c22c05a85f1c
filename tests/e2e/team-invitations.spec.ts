import { expect, test } from '@playwright/test';
import { createPerson, createTeam, signIn, uniqueEmail } from './fixtures';
import { linkFromMail } from './team-inbox';

test('an admin invites by e-mail; the invitee accepts from the mail and sees the team with the right role', async ({ page, browser }) => {
  const team = await createTeam('Invite team');
  const { email: adminEmail } = await createPerson('invite-admin', [{ team, role: 'admin' }]);
  await signIn(page, adminEmail);
  await page.getByRole('link', { name: 'Team settings' }).click();
  await expect(page.getByRole('heading', { name: 'Team settings' })).toBeVisible();

  const invitee = uniqueEmail('invitee');
  const form = page.getByRole('form', { name: 'Invite someone' });
  await form.getByLabel('E-mail').fill(invitee);
  await form.getByLabel('Role').selectOption({ label: 'Mechanical engineer' });
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByRole('status')).toContainText(`an invitation is on its way to ${invitee}`);
  await expect(page.getByRole('listitem', { name: `Invitation to ${invitee}` })).toContainText('Waiting for an answer');

  const link = await linkFromMail(invitee, '/invitation');
  const context = await browser.newContext();
  const guest = await context.newPage();
  await guest.goto(link);
  await expect(guest.getByRole('heading', { name: `Join ${team.name}` })).toBeVisible();
  await guest.getByLabel('Your name').fill('Wren Halloway');
  await guest.getByLabel('Choose a password').fill('a long enough password');
  await guest.getByRole('button', { name: `Join ${team.name}` }).click();
  await expect(guest).toHaveURL(/\/projects$/);
  await expect(guest.getByTestId('active-role')).toHaveText('Mechanical engineer');
  await expect(guest.getByRole('main').getByText(team.name)).toBeVisible();

  await guest.goto(link);
  await expect(guest.getByText('This invitation has already been used. Sign in to reach the team.')).toBeVisible();
  await context.close();

  await page.reload();
  await expect(page.getByRole('listitem', { name: 'Wren Halloway' })).toBeVisible();
  await expect(page.getByRole('listitem', { name: `Invitation to ${invitee}` })).toHaveCount(0);
});

test('an invitation beyond the seats is refused with a way to buy more', async ({ page }) => {
  const team = await createTeam('Full team');
  const { email } = await createPerson('full-admin', [{ team, role: 'admin' }]);
  await createPerson('full-two', [{ team, role: 'viewer' }]);
  await createPerson('full-three', [{ team, role: 'architect' }]);
  await signIn(page, email);
  await page.goto('/team');
  await expect(page.getByTestId('seat-usage')).toHaveText('3 of 3 seats in use');

  const form = page.getByRole('form', { name: 'Invite someone' });
  await form.getByLabel('E-mail').fill(uniqueEmail('fourth'));
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByTestId('form-alert')).toContainText('All 3 seats are taken (3 members and 0 pending invitations).');
  await page.getByRole('link', { name: 'Buy seats' }).click();
  await expect(page).toHaveURL(/\/team\/billing$/);
  await expect(page.getByRole('form', { name: 'Change paid seats' })).toBeVisible();
});

test('a member who is not an admin is refused the team settings', async ({ page }) => {
  const team = await createTeam('No admin');
  const { email } = await createPerson('not-admin', [{ team, role: 'acoustician' }]);
  await signIn(page, email);
  await expect(page.getByRole('link', { name: 'Team settings' })).toHaveCount(0);
  await page.goto('/team');
  await expect(page.getByRole('heading', { name: 'Your role cannot manage the team' })).toBeVisible();
});
