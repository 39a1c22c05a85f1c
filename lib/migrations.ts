// umzug runners for the schema migrations and the demo seeders (separate tracks).
import path from 'node:path';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

const ROOT = path.resolve(__dirname, '..');

interface MigrationModule {
  up: (params: { context: QueryInterface }) => Promise<void>;
  down: (params: { context: QueryInterface }) => Promise<void>;
}

function runner(sequelize: Sequelize, folder: 'migrations' | 'seeders', tableName: string, log: boolean) {
  return new Umzug({
    migrations: {
      glob: [`${folder}/*.ts`, { cwd: ROOT }],
      // Imported from here so that whichever TypeScript loader runs this file (tsx, vitest) loads them.
      resolve: ({ name, path: file, context }) => ({
        name,
        up: async () => ((await import(file!)) as MigrationModule).up({ context }),
        down: async () => ((await import(file!)) as MigrationModule).down({ context }),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName }),
    logger: log
      ? { info: (event) => { if (event.event === 'migrated') console.log(`    applied ${String(event.name)}`); }, warn: console.warn, error: console.error, debug: () => undefined }
      : undefined,
  });
}

export function migrator(sequelize: Sequelize, options: { log?: boolean } = {}) {
  return runner(sequelize, 'migrations', 'schema_migrations', options.log ?? false);
}

export function seeder(sequelize: Sequelize, options: { log?: boolean } = {}) {
  return runner(sequelize, 'seeders', 'seed_runs', options.log ?? false);
}
