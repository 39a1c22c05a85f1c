// Migrations run forward on an existing database without losing rows, and each down
// undoes its own up. Uses a scratch database next to the test database.
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrator } from '@/lib/migrations';

const scratchName = `antinode_scratch_${randomUUID().slice(0, 8)}_test`;
let admin: Sequelize;
let scratch: Sequelize;

beforeAll(async () => {
  admin = new Sequelize(process.env.DATABASE_URL!, { dialect: 'postgres', dialectModule: pg, logging: false });
  await admin.query(`create database "${scratchName}"`);
  const url = new URL(process.env.DATABASE_URL!);
  url.pathname = `/${scratchName}`;
  scratch = new Sequelize(url.toString(), { dialect: 'postgres', dialectModule: pg, logging: false });
});

afterAll(async () => {
  await scratch.close();
  await admin.query(`drop database if exists "${scratchName}" with (force)`);
  await admin.close();
});

describe('migrations', () => {
  it('apply forward over existing rows and keep them', async () => {
    const umzug = migrator(scratch);
    const all = await umzug.pending();
    expect(all.length).toBeGreaterThan(1);
    await umzug.up({ to: all[0].name });
    const now = new Date();
    const userId = randomUUID();
    await scratch.getQueryInterface().bulkInsert('users', [
      { id: userId, email: 'kept@example.test', name: 'Kept', password_hash: 'x', unit_system: 'si', created_at: now, updated_at: now },
    ]);
    await umzug.up();
    expect(await umzug.pending()).toHaveLength(0);
    const [rows] = await scratch.query(`select email from users where id = '${userId}'`);
    expect(rows).toEqual([{ email: 'kept@example.test' }]);
  });

  it('go all the way down and up again', async () => {
    const umzug = migrator(scratch);
    await umzug.down({ to: 0 });
    const [tables] = await scratch.query(`select table_name from information_schema.tables where table_schema = 'public' and table_name <> 'schema_migrations'`);
    expect(tables).toEqual([]);
    await umzug.up();
    expect(await umzug.pending()).toHaveLength(0);
  });
});
