// Stands in for the server in the live-backup test: opens an embedded database directory, answers backup requests
// on its socket as the server does (db/server-start.ts), and writes one job with three parts per transaction until
// stdin closes, saying `wrote <n>` after each commit.
import { eq } from 'drizzle-orm';
import { openDatabase } from '@/db/open';
import { serveLiveBackups } from '@/db/live-backup';
import { jobs, parts, shops } from '@/db/schema';

const dir = process.argv[2];
const handle = await openDatabase({ dataDir: dir, migrate: false });
const served = await serveLiveBackups(dir, handle.dump!);
if ('error' in served) throw new Error(served.error);
const [shop] = await handle.db.select({ id: shops.id }).from(shops).limit(1);
let stop = false;
process.stdin.resume();
process.stdin.on('end', () => (stop = true));
process.stdout.write('ready\n');
let n = 0;
while (!stop) {
  n += 1;
  await handle.db.transaction(async (tx) => {
    const [job] = await tx
      .insert(jobs)
      .values({ shopId: shop.id, name: `Live write ${n}` })
      .returning({ id: jobs.id });
    await tx.insert(parts).values(
      [1, 2, 3].map((k) => ({
        shopId: shop.id,
        jobId: job.id,
        label: `Part ${k}`,
        quantity: k,
        length: 600,
        width: 300,
        thickness: 18,
        material: 'Birch ply',
      })),
    );
    await tx.update(jobs).set({ notes: 'three parts' }).where(eq(jobs.id, job.id));
  });
  process.stdout.write(`wrote ${n}\n`);
  await new Promise((r) => setTimeout(r, 5));
}
await served.close();
await handle.close();
process.stdout.write(`done ${n}\n`);
process.exit(0);
