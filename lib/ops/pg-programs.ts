// PostgreSQL's own programs (pg_dump, pg_restore) from Debian's package, matching the server.
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';

/** The newest /usr/lib/postgresql/<version>/bin holding the program, or ANTINODE_PG_BIN when set. */
export function pgProgram(name: 'pg_dump' | 'pg_restore' | 'psql' | 'initdb' | 'pg_ctl'): string {
  const configured = process.env.ANTINODE_PG_BIN;
  if (configured) return path.join(configured, name);
  const root = '/usr/lib/postgresql';
  const versions = existsSync(root) ? readdirSync(root).filter((entry) => existsSync(path.join(root, entry, 'bin', name))) : [];
  versions.sort((a, b) => Number(a) - Number(b));
  const newest = versions.at(-1);
  if (!newest) throw new Error(`${name} was not found under ${root}; install Debian's postgresql package`);
  return path.join(root, newest, 'bin', name);
}
