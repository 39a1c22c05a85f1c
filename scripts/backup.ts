// `backup [FOLDER]`: dump the database in DATABASE_URL and copy the stored files into FOLDER
// (default backups/<date-time>); `restore FOLDER`: bring a backup back into an empty installation.
import path from 'node:path';
import { BackupError, backupFolderName, restoreBackup, writeBackup } from '@/lib/ops/backup';
import { storeSettings } from '@/lib/storage/object-store';

async function main(command: string | undefined, folderArgument: string | undefined): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new BackupError('DATABASE_URL is not set; run this through npm run backup / npm run restore');
  const target = { databaseUrl, bucket: storeSettings().bucket };
  if (command === 'backup') {
    const folder = path.resolve(folderArgument ?? path.join(process.env.ANTINODE_BACKUP_DIR ?? 'backups', backupFolderName()));
    const manifest = await writeBackup(target, folder);
    console.log(`    database ${manifest.database.name}: ${(manifest.database.bytes / 1024).toFixed(0)} KB dump`);
    console.log(`    stored files: ${manifest.files.length} (${(manifest.files.reduce((sum, file) => sum + file.bytes, 0) / 1024 / 1024).toFixed(1)} MB)`);
    console.log(`    written to ${folder}`);
  } else if (command === 'restore') {
    if (!folderArgument) throw new BackupError('say which backup to restore: npm run restore backups/<date-time>');
    const manifest = await restoreBackup(path.resolve(folderArgument), target);
    console.log(`    restored database ${manifest.database.name} of ${manifest.createdAt} and ${manifest.files.length} stored files`);
  } else {
    throw new BackupError('command must be backup or restore');
  }
}

main(process.argv[2], process.argv[3]).catch((error: unknown) => {
  console.error(error instanceof BackupError ? error.message : error);
  process.exit(1);
});
