// `up` / `down`: schema migrations; `seed`: the demo, only into an empty database and
// never with NODE_ENV=production. Works on the database in DATABASE_URL.
import { sequelize } from '@/lib/db';
import { migrator, seeder } from '@/lib/migrations';

async function main(command: string | undefined): Promise<void> {
  if (command === 'up') {
    const done = await migrator(sequelize, { log: true }).up();
    console.log(done.length ? `    ${done.length} migration(s) applied` : '    schema is up to date');
  } else if (command === 'down') {
    await migrator(sequelize, { log: true }).down();
  } else if (command === 'seed') {
    if (process.env.NODE_ENV === 'production') throw new Error('the demo is never seeded with NODE_ENV=production');
    const [rows] = await sequelize.query('select count(*)::int as n from users');
    const users = (rows as { n: number }[])[0]?.n ?? 0;
    if (users > 0) {
      console.log(`    the database already has ${users} user(s): the demo is not seeded again`);
      return;
    }
    const done = await seeder(sequelize, { log: true }).up();
    console.log(`    ${done.length} seeder(s) applied`);
  } else {
    throw new Error(`unknown command "${command ?? ''}": use up, down or seed`);
  }
}

main(process.argv[2])
  .then(() => sequelize.close())
  .catch(async (error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    await sequelize.close();
    process.exit(1);
  });
