import { fromRepoRoot } from '../config/paths.js';
import { envSchema } from '../config/env.validation.js';
import { backupDatabase } from './backup.js';

/**
 * `npm run db:backup`: an online backup of DATABASE_PATH into BACKUP_DIR (default
 * server/data/backups), safe while the server runs. Restoring is in docs/operations.md.
 */
async function backup(): Promise<void> {
  // Only the database path matters here, so a backup never needs the server's other settings.
  const databasePath = envSchema.shape.DATABASE_PATH.parse(process.env.DATABASE_PATH || undefined);
  const directory = fromRepoRoot(process.env.BACKUP_DIR || 'server/data/backups');
  const { file, bytes } = await backupDatabase(fromRepoRoot(databasePath), directory);
  console.log(`Backed up ${fromRepoRoot(databasePath)} to ${file} (${(bytes / 1024).toFixed(0)} KiB).`);
}

backup().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
