import pg from 'pg';
import { Sequelize } from 'sequelize';

// One Sequelize instance per process. The connection string comes from the environment;
// `npm start` and `npm test` write it for the cluster they start.
const globalForDb = globalThis as unknown as { antinodeSequelize?: Sequelize };

function createSequelize(): Sequelize {
  const url = process.env.DATABASE_URL ?? 'postgres://antinode@127.0.0.1:54329/antinode';
  return new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: process.env.ANTINODE_SQL_LOG === '1' ? console.log : false,
    define: { underscored: true },
    pool: { max: 10, idle: 10_000 },
  });
}

export const sequelize: Sequelize = globalForDb.antinodeSequelize ?? createSequelize();
globalForDb.antinodeSequelize = sequelize;
