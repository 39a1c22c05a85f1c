// The demo: an invented practice, its people (one per role) and an invented building.
// Every name, address and number here is made up.
import { randomUUID } from 'node:crypto';
import type { QueryInterface } from 'sequelize';
import { hashPassword } from '@/lib/auth/password';

export const DEMO_PASSWORD = 'antinode-demo';

const PEOPLE = [
  { email: 'admin@antinode.test', name: 'Imogen Vale', role: 'admin' },
  { email: 'acoustician@antinode.test', name: 'Tomasz Reyne', role: 'acoustician' },
  { email: 'engineer@antinode.test', name: 'Priya Castellane', role: 'engineer' },
  { email: 'architect@antinode.test', name: 'Olu Marchetti', role: 'architect' },
  { email: 'viewer@antinode.test', name: 'Sam Ellery', role: 'viewer' },
] as const;

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  const now = new Date();
  const stamp = { created_at: now, updated_at: now };
  const practiceId = randomUUID();
  const sandboxId = randomUUID();
  await queryInterface.bulkInsert('teams', [
    { id: practiceId, name: 'Fernhollow Acoustics', ...stamp },
    { id: sandboxId, name: 'Fernhollow training sandbox', ...stamp },
  ]);
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const users = PEOPLE.map((person) => ({ id: randomUUID(), ...person }));
  await queryInterface.bulkInsert(
    'users',
    users.map((user) => ({ id: user.id, email: user.email, name: user.name, password_hash: passwordHash, unit_system: 'si', email_verified_at: stamp.created_at, ...stamp })),
  );
  await queryInterface.bulkInsert('memberships', [
    ...users.map((user) => ({ id: randomUUID(), user_id: user.id, team_id: practiceId, role: user.role, ...stamp })),
    { id: randomUUID(), user_id: users[0].id, team_id: sandboxId, role: 'admin', ...stamp },
    { id: randomUUID(), user_id: users[1].id, team_id: sandboxId, role: 'viewer', ...stamp },
  ]);
  await queryInterface.bulkInsert('projects', [
    {
      id: randomUUID(), team_id: practiceId, created_by_id: users[1].id,
      name: 'Marrowgate Arts Centre', site: 'Kiln Lane, Eastmarch (recital room and meeting rooms, roof plant)',
      archived: false, ...stamp,
    },
  ]);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.bulkDelete('teams', { name: ['Fernhollow Acoustics', 'Fernhollow training sandbox'] });
  await queryInterface.bulkDelete('users', { email: PEOPLE.map((person) => person.email) });
}
