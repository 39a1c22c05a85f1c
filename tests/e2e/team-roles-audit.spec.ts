import { expect, test } from '@playwright/test';
import { createPerson, createTeam, signIn } from './fixtures';
import { expectCleanLayout } from './layout-check';

test('a role change says it was saved, and the audit log shows it under the kind and person filters', async ({ page }) => {
  const team = await createTeam('Roles team');
  const { email: adminEmail, user: admin } = await createPerson('roles-admin', [{ team, role: 'admin' }]);
  const { user: member } = await createPerson('roles-member', [{ team, role: 'viewer' }]);
  await signIn(page, adminEmail);
  await page.goto('/team');
  const row = page.getByRole('listitem', { name: member.name });
  await row.getByLabel(`Role of ${member.name}`).selectOption({ label: 'Architect' });
  await expect(row.getByRole('status')).toHaveText(`✓ Saved: ${member.name} is now architect.`);

  await page.goto('/team/audit');
  await page.getByLabel('Kind of event').selectOption({ label: 'Role changed' });
  await page.getByLabel('Person').selectOption({ label: admin.name });
  await page.getByRole('button', { name: 'Filter' }).click();
  await expect(page).toHaveURL(/kind=member\.role_changed/);
  const table = page.getByRole('table', { name: 'Audit log' });
  await expect(table.getByRole('row')).toHaveCount(2); // the header and the one change
  await expect(table).toContainText(`${member.email}: Viewer → Architect`);
  for (const size of [{ width: 1440, height: 900 }, { width: 1024, height: 768 }]) {
    await page.setViewportSize(size);
    await expectCleanLayout(page);
  }

  // The admin's own sign-in is in the log too, under its own kind.
  await page.getByLabel('Kind of event').selectOption({ label: 'Sign-in: everything' });
  await page.getByRole('button', { name: 'Filter' }).click();
  await expect(table).toContainText('Signed in');
  await expect(table).not.toContainText('Role changed');
});
