import { expect, test } from '@playwright/test';
import { Project } from '@/models';
import { createPerson, createTeam, signIn } from './fixtures';

test('a viewer is refused the new-project page and its route handler answers 403 JSON', async ({ page }) => {
  const team = await createTeam('Viewer team');
  const { email } = await createPerson('viewer', [{ team, role: 'viewer' }]);
  await signIn(page, email);
  await expect(page.getByRole('link', { name: 'New project' })).toHaveCount(0);

  await page.goto('/projects/new');
  await expect(page.getByRole('heading', { name: 'Your role cannot create projects' })).toBeVisible();

  const answer = await page.request.post('/api/v1/projects', { data: { name: 'Sneaky' } });
  expect(answer.status()).toBe(403);
  expect(await answer.json()).toMatchObject({ error: { code: 'forbidden', message: expect.any(String) } });
  expect(await Project.count({ where: { teamId: team.id } })).toBe(0);
});

test('an acoustician creates a project from the empty state', async ({ page }) => {
  const team = await createTeam('Acoustician team');
  const { email } = await createPerson('acoustician', [{ team, role: 'acoustician' }]);
  await signIn(page, email);
  await expect(page.getByRole('heading', { name: 'No projects yet' })).toBeVisible();
  await page.getByRole('link', { name: 'Create the first project' }).click();
  await page.getByLabel('Project name').fill('Thornbury Music School');
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { name: 'Thornbury Music School' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'No plans in this project' })).toBeVisible();
  await page.goto('/projects');
  await expect(page.getByRole('list', { name: 'Projects' })).toContainText('Thornbury Music School');
});

test('team switch shows the other team’s projects and role', async ({ page }) => {
  const first = await createTeam('First practice');
  const second = await createTeam('Second practice');
  await Project.create({ teamId: second.id, name: 'Only in the second team', site: '' });
  const { email } = await createPerson('switcher', [{ team: first, role: 'engineer' }, { team: second, role: 'acoustician' }]);
  await signIn(page, email);
  await expect(page.getByTestId('active-role')).toHaveText('Mechanical engineer');
  await expect(page.getByText('Only in the second team')).toHaveCount(0);

  await page.getByLabel('Team').selectOption({ label: second.name });
  await expect(page.getByTestId('active-role')).toHaveText('Acoustician');
  await expect(page.getByRole('list', { name: 'Projects' })).toContainText('Only in the second team');
});

test('unknown pages get the product’s own 404', async ({ page }) => {
  const response = await page.goto('/no-such-page');
  expect(response?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
});
