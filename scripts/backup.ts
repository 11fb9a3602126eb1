/**
 * `npm run backup [FILE]` writes one backup file; `npm run restore FILE` puts one back. DATABASE_URL picks
 * PostgreSQL (pg_dump / pg_restore); otherwise the embedded database in KERFWISE_DATA_DIR (default ./data): a backup
 * is made by the running server that holds it (over its local socket) or directly when none runs; a restore needs
 * the server stopped.
 */
import path from 'node:path';
import { backupEmbedded, backupPostgres, restoreEmbedded, restorePostgres } from '../db/backup';

const [command, fileArg] = process.argv.slice(2);
const url = process.env.DATABASE_URL || '';
const dataDir = path.join(process.env.KERFWISE_DATA_DIR || './data', 'pglite');
const stamp = new Date().toISOString().replace(/[:.]/g, '-');

async function main() {
  if (command === 'backup') {
    const file = fileArg ?? `kerfwise-backup-${stamp}.${url ? 'pgdump' : 'tar.gz'}`;
    if (url) backupPostgres(url, file);
    else {
      const { live } = await backupEmbedded(dataDir, file);
      if (live) console.log('The running server made the backup (committed transactions up to now, each whole).');
    }
    console.log(`Backed up to ${file}`);
  } else if (command === 'restore') {
    if (!fileArg) throw new Error('Name the backup file: npm run restore FILE');
    if (url) restorePostgres(url, fileArg);
    else {
      const { keptAs } = await restoreEmbedded(dataDir, fileArg);
      if (keptAs) console.log(`The database it replaced is kept at ${keptAs}`);
    }
    console.log(`Restored from ${fileArg}`);
  } else {
    throw new Error('Use: npm run backup [FILE] | npm run restore FILE');
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
