// The demo project's plan: the rooftop air handler's supply run to the recital room, its fan at high
// speed with the blade-pass tone on one of the run's resonances, so the risk list opens with a flag.
// Every name and number is invented.
import { randomUUID } from 'node:crypto';
import type { QueryInterface } from 'sequelize';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, DEMO_PLAN_NAME, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';

const PROJECT_NAME = 'Marrowgate Arts Centre';

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  const [projects] = await queryInterface.sequelize.query('select id from projects where name = :name', { replacements: { name: PROJECT_NAME } });
  const project = (projects as { id: string }[])[0];
  if (!project) return;
  const [users] = await queryInterface.sequelize.query("select id from users where email = 'acoustician@antinode.test'");
  const author = (users as { id: string }[])[0];
  const now = new Date();
  await queryInterface.bulkInsert('plans', [{
    id: randomUUID(), project_id: project.id, name: DEMO_PLAN_NAME, background_upload_id: null, metres_per_pixel: DEMO_METRES_PER_PIXEL, version: 1,
    document: JSON.stringify(demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high })), archived: false,
    updated_by_id: author?.id ?? null, created_at: now, updated_at: now,
  }]);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.bulkDelete('plans', { name: DEMO_PLAN_NAME });
}
