// Integration tests run against a real PostgreSQL database whose name ends in _test
// (npm test creates antinode_test); never against the demo database.
import { sequelize } from '@/lib/db';
import { migrator } from '@/lib/migrations';
import { buildComputeWorker } from '../../scripts/build-worker';

export default async function setup(): Promise<() => Promise<void>> {
  const url = process.env.DATABASE_URL;
  if (!url || !new URL(url).pathname.endsWith('_test')) {
    throw new Error('DATABASE_URL must point at a database whose name ends in _test; run the suite with `npm test`.');
  }
  buildComputeWorker();
  await migrator(sequelize).up();
  await sequelize.close();
  return async () => undefined;
}
