// The backup round trip of a whole installation: the demo data and an issued treatment schedule
// are backed up (pg_dump's one consistent snapshot and a copy of the stored files), the
// installation is wiped, restored, and the schedule downloads with the same SHA-256 as before
// (PostgreSQL documentation, "pg_dump" and "pg_restore"; SHA-256: FIPS 180-4).
import { createHash } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { restoreBackup, writeBackup } from '@/lib/ops/backup';
import { listObjects } from '@/lib/storage/object-store';
import { freePort } from '../integration/helpers/throwaway-cluster';
import { emptyBucket, emptyDatabase, seededInstallation, signInDemo, type Installation } from './helpers/installation';
import { startWeb, startWorker, stopProcess, type Instance } from './helpers/instances';
import { until } from '../integration/helpers/until';

let installation: Installation;
let web: Instance | undefined;
let worker: Instance | undefined;
let folder: string;

beforeAll(async () => {
  installation = await seededInstallation('backup');
  folder = await mkdtemp(path.join(os.tmpdir(), 'antinode-round-trip-'));
}, 180_000);

afterAll(async () => {
  await Promise.all([stopProcess(web), stopProcess(worker)]);
  installation?.cluster.remove();
  if (folder) await rm(folder, { recursive: true, force: true });
});

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

async function download(baseUrl: string, cookie: string, scheduleId: string): Promise<Buffer> {
  const answer = await fetch(`${baseUrl}/api/v1/schedules/${scheduleId}`, { headers: { cookie } });
  expect(answer.status).toBe(200);
  return Buffer.from(await answer.arrayBuffer());
}

describe('backup and restore of a whole installation', () => {
  it('brings back the demo and an issued schedule, byte for byte, into a wiped installation', async () => {
    web = await startWeb('web-backup', await freePort(), installation.env);
    worker = await startWorker('worker-backup', installation.env);
    const cookie = await signInDemo(web.url, 'acoustician@antinode.test');
    const planId = (await installation.query<{ id: string }>('select id from plans order by created_at limit 1'))[0]!.id;
    const submitted = await fetch(`${web.url}/api/v1/plans/${planId}/revisions`, {
      method: 'POST', headers: { cookie, 'content-type': 'application/json' }, body: JSON.stringify({ note: 'For the backup' }),
    });
    expect(submitted.status).toBe(201);
    const { revision } = (await submitted.json()) as { revision: { id: string } };
    const asked = await fetch(`${web.url}/api/v1/revisions/${revision.id}/schedules`, { method: 'POST', headers: { cookie } });
    const { schedule } = (await asked.json()) as { schedule: { id: string } };
    const issued = await until('the schedule being issued', async () => (
      await installation.query<{ sha256: string }>(`select sha256 from schedules where id = $1 and status = 'issued'`, [schedule.id])
    )[0], 90_000);
    const before = await download(web.url, cookie, schedule.id);
    expect(sha256(before)).toBe(issued.sha256);
    const projectsBefore = await installation.query('select id, name from projects order by id');
    await Promise.all([stopProcess(web), stopProcess(worker)]);

    const manifest = await writeBackup({ databaseUrl: installation.databaseUrl, bucket: installation.bucket }, folder);
    expect(manifest.files.some((file) => file.sha256 === issued.sha256)).toBe(true);

    await emptyDatabase(installation.cluster);
    await emptyBucket(installation.bucket);
    expect(await installation.query(`select table_name from information_schema.tables where table_schema = 'public'`)).toEqual([]);
    expect(await listObjects(installation.bucket)).toEqual([]);

    await restoreBackup(folder, { databaseUrl: installation.databaseUrl, bucket: installation.bucket });
    expect(await installation.query('select id, name from projects order by id')).toEqual(projectsBefore);
    web = await startWeb('web-restored', await freePort(), installation.env);
    const again = await signInDemo(web.url, 'acoustician@antinode.test');
    const after = await download(web.url, again, schedule.id);
    expect(sha256(after)).toBe(issued.sha256);
    expect(after.equals(before)).toBe(true);
  }, 240_000);
});
