import pg from 'pg';
import { ConnectionError, Sequelize } from 'sequelize';

// One Sequelize instance per process. The connection string comes from the environment;
// `npm start` and `npm test` write it for the cluster they start.
const globalForDb = globalThis as unknown as { antinodeSequelize?: Sequelize };

/** Errors that mean the connection, not the query, failed. */
const CONNECTION_LOST = [
  /Connection terminated/i,
  /terminating connection due to administrator command/i,
  /the database system is (starting up|shutting down|in recovery mode)/i,
  /ECONNREFUSED/,
  /ECONNRESET/,
];

/** PostgreSQL's error classes for a lost or refused connection: 08 (connection exception), 57P01–57P03 (shut down, starting). */
const CONNECTION_CODES = /^(08...|57P0[123]|ECONNREFUSED|ECONNRESET|ETIMEDOUT|EHOSTUNREACH)$/;

/** Whether an error means the database could not be reached (not that a query was wrong). */
export function isDatabaseUnreachable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 4) return false;
  if (error instanceof ConnectionError) return true;
  const { message, code, parent, original, cause } = error as { message?: unknown; code?: unknown; parent?: unknown; original?: unknown; cause?: unknown };
  if (typeof code === 'string' && CONNECTION_CODES.test(code)) return true;
  if (typeof message === 'string' && CONNECTION_LOST.some((pattern) => pattern.test(message))) return true;
  return [parent, original, cause].some((inner) => inner !== error && isDatabaseUnreachable(inner, depth + 1));
}

/** A Sequelize instance with the app's settings (the app uses one per process: `sequelize` below). */
export function createSequelize(url = process.env.DATABASE_URL ?? 'postgres://antinode@127.0.0.1:54329/antinode'): Sequelize {
  return new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: process.env.ANTINODE_SQL_LOG === '1' ? console.log : false,
    define: { underscored: true },
    pool: { max: 10, idle: 10_000 },
    // When PostgreSQL restarts under the app, the pooled connections die with it: a query that
    // meets a dead or refused connection is tried again on a fresh one (a few times, backing off),
    // so the app recovers without a restart and the person sees at most a short wait.
    retry: { max: 6, backoffBase: 200, backoffExponent: 1.5, match: CONNECTION_LOST },
  });
}

export const sequelize: Sequelize = globalForDb.antinodeSequelize ?? createSequelize();
globalForDb.antinodeSequelize = sequelize;
