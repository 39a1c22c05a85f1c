// Test people: a fresh team with one member per role, each able to open sessions.
import { randomUUID } from 'node:crypto';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { hashPassword } from '@/lib/auth/password';
import { ROLES, type Role } from '@/lib/permissions';
import { Membership, Team, User } from '@/models';

export const TEST_PASSWORD = 'correct horse battery';
let cachedHash: Promise<string> | null = null;

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}

export async function addMember(teamId: string, role: Role, label: string = role): Promise<User> {
  cachedHash ??= hashPassword(TEST_PASSWORD);
  const user = await User.create({ email: uniqueEmail(label), name: `Test ${label}`, passwordHash: await cachedHash, emailVerifiedAt: new Date() });
  await Membership.create({ userId: user.id, teamId, role });
  return user;
}

export interface TestTeam {
  team: Team;
  members: Record<Role, User>;
  cookieFor: (role: Role) => Promise<string>;
}

export async function createTestTeam(label = 'team'): Promise<TestTeam> {
  const { user: admin, team } = await createUserWithTeam({
    name: `Test admin ${label}`, email: uniqueEmail(`admin-${label}`), password: TEST_PASSWORD, teamName: `Test ${label} ${randomUUID().slice(0, 4)}`,
  });
  const members = { admin } as Record<Role, User>;
  for (const role of ROLES) if (role !== 'admin') members[role] = await addMember(team.id, role, `${role}-${label}`);
  return {
    team,
    members,
    cookieFor: async (role) => {
      const cookie = await startSession(members[role].id, team.id);
      return `${cookie.name}=${cookie.value}`;
    },
  };
}
