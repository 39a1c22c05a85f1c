// Backup and restore: pg_dump's custom-format dump is one consistent snapshot and pg_restore
// brings it back whole (PostgreSQL documentation, "pg_dump" and "pg_restore"); the stored files
// travel beside it with SHA-256 sums (FIPS 180-4) so a damaged backup is refused before any change.
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { CreateBucketCommand, GetObjectCommand } from '@aws-sdk/client-s3';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { BackupError, restoreBackup, writeBackup } from '@/lib/ops/backup';
import { demoRecitalPlan, DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL } from '@/lib/plans/demo/recital-plan';
import { putObject, storeClient, storeSettings } from '@/lib/storage/object-store';
import { Plan, Project } from '@/models';
import { tinyPng } from '../helpers/files';
import { createTestTeam } from '../helpers/people';

const stamp = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const restoredName = `antinode_restore_${stamp}_test`;
const restoredBucket = `antinode-restore-${stamp}`;
const folders: string[] = [];

function urlOf(database: string): string {
  const url = new URL(process.env.DATABASE_URL!);
  url.pathname = `/${database}`;
  return url.toString();
}

async function query<T extends pg.QueryResultRow>(database: string, text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: urlOf(database) });
  await client.connect();
  try {
    return (await client.query<T>(text, values)).rows;
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  await sequelize.query(`drop database if exists "${restoredName}" with (force)`);
  for (const folder of folders) await rm(folder, { recursive: true, force: true });
  await sequelize.close();
});

describe('backup and restore', () => {
  it('brings the database and the stored files back into an empty installation, and refuses a non-empty one or a damaged backup', async () => {
    const { team, members } = await createTestTeam('backup');
    const project = await Project.create({ teamId: team.id, name: 'Backed-up project', site: '', createdById: members.admin.id });
    const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const plan = await Plan.create({ projectId: project.id, name: 'Backed-up plan', document, metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: members.admin.id });
    const drawing = tinyPng(7, 5);
    const key = `backup-test/${stamp}/drawing.png`;
    await putObject(key, drawing, 'image/png');

    const folder = await mkdtemp(path.join(os.tmpdir(), 'antinode-backup-'));
    folders.push(folder);
    const source = new URL(process.env.DATABASE_URL!).pathname.slice(1);
    const manifest = await writeBackup({ databaseUrl: urlOf(source), bucket: storeSettings().bucket }, folder);
    expect(manifest.files.find((file) => file.key === key)).toMatchObject({ bytes: drawing.byteLength });

    await sequelize.query(`create database "${restoredName}"`);
    await storeClient().send(new CreateBucketCommand({ Bucket: restoredBucket }));
    const target = { databaseUrl: urlOf(restoredName), bucket: restoredBucket };
    await restoreBackup(folder, target);

    const [restoredPlan] = await query<{ name: string; document: unknown }>(restoredName, 'select name, document from plans where id = $1', [plan.id]);
    expect(restoredPlan?.name).toBe('Backed-up plan');
    expect(restoredPlan?.document).toEqual(JSON.parse(JSON.stringify(document)));
    const migrations = (database: string) => query<{ name: string }>(database, 'select name from schema_migrations order by name');
    expect(await migrations(restoredName)).toEqual(await migrations(source));
    const stored = await storeClient().send(new GetObjectCommand({ Bucket: restoredBucket, Key: key }));
    expect(Buffer.from(await stored.Body!.transformToByteArray())).toEqual(Buffer.from(drawing));

    // a second restore meets tables: refused, and the database is unchanged
    await expect(restoreBackup(folder, target)).rejects.toThrow(/already has \d+ tables; restore only into an empty installation/);
    expect(await query(restoredName, 'select id from plans where id = $1', [plan.id])).toHaveLength(1);

    // one changed byte in a stored file: refused before anything is touched, naming the file
    const damaged = path.join(folder, 'files', ...key.split('/'));
    const bytes = await readFile(damaged);
    bytes[bytes.length - 1] ^= 0xff;
    await writeFile(damaged, bytes);
    const error = await restoreBackup(folder, { databaseUrl: urlOf(`${restoredName}_never`), bucket: restoredBucket }).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(BackupError);
    expect((error as Error).message).toContain(`files/${key} in ${folder} does not match its checksum`);
  });
});
