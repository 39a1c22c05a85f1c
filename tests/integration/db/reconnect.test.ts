// When PostgreSQL restarts under a running app, the app's queries go on without a restart of the
// app: pooled connections die with the server (PostgreSQL documentation, "Shutting Down the
// Server": fast shutdown terminates every session) and the app tries again on fresh ones.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSequelize } from '@/lib/db';
import { startThrowawayCluster, type ThrowawayCluster } from '../helpers/throwaway-cluster';

let cluster: ThrowawayCluster;

beforeAll(async () => { cluster = await startThrowawayCluster('reconnect'); }, 120_000);
afterAll(() => cluster?.remove());

describe('the database restarting under the app', () => {
  it('answers the next queries without restarting the app', async () => {
    const sequelize = createSequelize(cluster.url());
    try {
      // a few pooled connections, all open when the server goes down
      await Promise.all(Array.from({ length: 4 }, () => sequelize.query('select pg_sleep(0.05)')));
      cluster.pgCtl('restart');
      const answers = await Promise.all(Array.from({ length: 4 }, () => sequelize.query('select 1 as one', { plain: true })));
      expect(answers).toEqual(Array.from({ length: 4 }, () => ({ one: 1 })));
    } finally {
      await sequelize.close();
    }
  }, 120_000);
});
