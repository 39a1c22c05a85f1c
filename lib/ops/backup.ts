// Backups: a consistent dump of the database (pg_dump's snapshot) and a copy of every stored file,
// written into one dated folder with a manifest of sizes and SHA-256 sums; restore checks the
// manifest, refuses a database that already holds tables, then brings both back.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { listObjects, storeClient } from '@/lib/storage/object-store';
import { pgProgram } from './pg-programs';

export const BACKUP_FORMAT = 1;
const DUMP_FILE = 'database.dump';
const FILES_FOLDER = 'files';
const MANIFEST_FILE = 'manifest.json';

export interface BackupManifest {
  format: number;
  createdAt: string;
  database: { name: string; file: string; bytes: number; sha256: string };
  files: { key: string; bytes: number; sha256: string }[];
}

export interface BackupTarget {
  /** postgres://… of the database to dump or restore into. */
  databaseUrl: string;
  /** The object store's bucket holding the stored files. */
  bucket: string;
}

export class BackupError extends Error {
  override name = 'BackupError';
}

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

function run(program: string, args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(program, args, { stdio: ['ignore', 'ignore', 'pipe'] });
    let errors = '';
    child.stderr.on('data', (chunk: Buffer) => { errors += chunk.toString(); });
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve() : reject(new BackupError(`${path.basename(program)} failed (exit ${code}): ${errors.trim()}`))));
  });
}

/** A folder name from the time, sortable: 2026-12-02T15-04-05Z. */
export function backupFolderName(at = new Date()): string {
  return at.toISOString().replace(/\.\d+Z$/, 'Z').replaceAll(':', '-');
}

/** Dumps the database (custom format, one snapshot) and copies every stored file into `folder`. */
export async function writeBackup(target: BackupTarget, folder: string): Promise<BackupManifest> {
  await mkdir(path.join(folder, FILES_FOLDER), { recursive: true });
  const dumpPath = path.join(folder, DUMP_FILE);
  // The dump first: files are never changed once stored, so every file the dump refers to is in the store by now.
  await run(pgProgram('pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${dumpPath}`, `--dbname=${target.databaseUrl}`]);
  const dump = await readFile(dumpPath);
  const files: BackupManifest['files'] = [];
  for (const { key } of await listObjects(target.bucket)) {
    const answer = await storeClient().send(new GetObjectCommand({ Bucket: target.bucket, Key: key }));
    const bytes = await answer.Body!.transformToByteArray();
    const filePath = path.join(folder, FILES_FOLDER, ...key.split('/'));
    if (!filePath.startsWith(path.join(folder, FILES_FOLDER) + path.sep)) throw new BackupError(`stored file key ${JSON.stringify(key)} leaves the backup folder`);
    await mkdir(path.dirname(filePath), { recursive: true });
    await writeFile(filePath, bytes);
    files.push({ key, bytes: bytes.byteLength, sha256: sha256(bytes) });
  }
  const manifest: BackupManifest = {
    format: BACKUP_FORMAT,
    createdAt: new Date().toISOString(),
    database: { name: new URL(target.databaseUrl).pathname.slice(1), file: DUMP_FILE, bytes: dump.byteLength, sha256: sha256(dump) },
    files,
  };
  await writeFile(path.join(folder, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}

/** Reads the folder's manifest and checks every file against it; the first mismatch is an error naming the file. */
export async function checkBackup(folder: string): Promise<BackupManifest> {
  const manifestPath = path.join(folder, MANIFEST_FILE);
  const text = await readFile(manifestPath, 'utf8').catch(() => { throw new BackupError(`${manifestPath} was not found: is ${folder} a backup folder?`); });
  const manifest = JSON.parse(text) as BackupManifest;
  if (manifest.format !== BACKUP_FORMAT) throw new BackupError(`${manifestPath} is backup format ${manifest.format}; this version reads format ${BACKUP_FORMAT}`);
  const entries = [{ file: path.join(folder, manifest.database.file), sha256: manifest.database.sha256, label: manifest.database.file },
    ...manifest.files.map((entry) => ({ file: path.join(folder, FILES_FOLDER, ...entry.key.split('/')), sha256: entry.sha256, label: `files/${entry.key}` }))];
  for (const entry of entries) {
    const bytes = await readFile(entry.file).catch(() => { throw new BackupError(`${entry.label} is missing from ${folder}`); });
    if (sha256(bytes) !== entry.sha256) throw new BackupError(`${entry.label} in ${folder} does not match its checksum in the manifest: the backup is damaged`);
  }
  return manifest;
}

async function tableCount(databaseUrl: string): Promise<number> {
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const answer = await client.query<{ count: string }>("select count(*) from information_schema.tables where table_schema = 'public'");
    return Number(answer.rows[0]?.count ?? 0);
  } finally {
    await client.end();
  }
}

/** Restores a checked backup into an empty database and bucket: the dump in one transaction, then the files. */
export async function restoreBackup(folder: string, target: BackupTarget): Promise<BackupManifest> {
  const manifest = await checkBackup(folder);
  const tables = await tableCount(target.databaseUrl);
  if (tables > 0) {
    const name = new URL(target.databaseUrl).pathname.slice(1);
    throw new BackupError(`database ${name} already has ${tables} tables; restore only into an empty installation (nothing was changed)`);
  }
  await run(pgProgram('pg_restore'), ['--no-owner', '--no-privileges', '--single-transaction', '--exit-on-error', `--dbname=${target.databaseUrl}`, path.join(folder, manifest.database.file)]);
  for (const entry of manifest.files) {
    const body = await readFile(path.join(folder, FILES_FOLDER, ...entry.key.split('/')));
    await storeClient().send(new PutObjectCommand({ Bucket: target.bucket, Key: entry.key, Body: body }));
  }
  return manifest;
}
