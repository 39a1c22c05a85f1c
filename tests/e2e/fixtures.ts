// People for browser tests, written straight into the test database.
import { randomUUID } from 'node:crypto';
import { expect, type Page } from '@playwright/test';
import { hashPassword } from '@/lib/auth/password';
import type { Role } from '@/lib/permissions';
import { Membership, Team, User } from '@/models';

export const PASSWORD = 'e2e password 1234';
let hashed: Promise<string> | null = null;

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}

export async function createTeam(name: string): Promise<Team> {
  return Team.create({ name: `${name} ${randomUUID().slice(0, 4)}` });
}

export async function createPerson(label: string, memberships: { team: Team; role: Role }[]): Promise<{ email: string; user: User }> {
  hashed ??= hashPassword(PASSWORD);
  const email = uniqueEmail(label);
  const user = await User.create({ email, name: `E2E ${label}`, passwordHash: await hashed, emailVerifiedAt: new Date() });
  for (const { team, role } of memberships) await Membership.create({ userId: user.id, teamId: team.id, role });
  return { email, user };
}

export async function signIn(page: Page, email: string, password = PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/projects$/);
}
