// Opens an embedded database directory and holds it until stdin closes (used by the lock test).
import { openDatabase } from '@/db/open';

const handle = await openDatabase({ dataDir: process.argv[2], migrate: false });
process.stdout.write('ready\n');
process.stdin.resume();
process.stdin.on('end', async () => {
  await handle.close();
  process.exit(0);
});
