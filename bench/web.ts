/**
 * `npm run bench:web` — the web server under load, on loopback. Builds if there is no build, seeds a fresh embedded
 * data directory with the demo shop grown to 500 jobs and 20,000 parts, starts `next start`, signs in as the owner
 * through the credentials flow (a real session cookie), and measures requests/s, p50 and p99 with autocannon at
 * concurrency 10 and 50 for /api/health, the jobs list API (first page), one plan's API and the Jobs page (HTML).
 * Prints a table with the machine's load average and the targets (issue 11, at concurrency 10: jobs list API and
 * plan ≥ 300 requests/s with p99 ≤ 100 ms; Jobs page ≥ 150 requests/s with p99 ≤ 250 ms).
 *
 * Flags: --duration S (seconds per run, default 10), --port N (default 3411 or PORT), --keep (leave the data
 * directory). BENCH_DATA_DIR picks the data directory (default: a new one in the system's temp directory);
 * KERFWISE_DIST_DIR the build, as for `next start`.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import { and, eq, sql } from 'drizzle-orm';
import { z } from 'zod';
import { openDatabase } from '@/db/open';
import { jobs, parts, plans, users } from '@/db/schema';
import { DEMO_PASSWORD, seedDemoShop } from '@/seeds/demo-shop';
import { buildIfNeeded, startServer, waitForHealth } from './serve';

const JOBS = 500;
const PARTS = 20_000;
const CONCURRENCY = [10, 50] as const;
const log = (s = '') => process.stdout.write(`${s}\n`);

const args = z
  .object({
    duration: z.coerce.number().int('--duration is whole seconds').min(1).max(120).default(10),
    port: z.coerce
      .number()
      .int()
      .min(1024)
      .max(65535)
      .default(Number(process.env.PORT) || 3411),
    keep: z.boolean().default(false),
  })
  .parse(parseFlags(process.argv.slice(2)));

function parseFlags(argv: string[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (let i = 0; i < argv.length; i++) {
    const flag = /^--([a-z-]+)$/.exec(argv[i]);
    if (!flag) throw new Error(`Unknown argument ${argv[i]} (flags: --duration S, --port N, --keep)`);
    if (flag[1] === 'keep') out.keep = true;
    else out[flag[1]] = argv[++i];
  }
  return out;
}

/**
 * The demo shop (people, stock, plans) grown to 500 jobs and 20,000 parts in one transaction of set-based inserts:
 * jobs round-robin over the demo's customers, statuses and due dates, changed over the last year; parts spread
 * evenly over the new jobs, five materials. Deterministic: no randomness.
 */
async function seed(dataDir: string) {
  const started = performance.now();
  const handle = await openDatabase({ dataDir: path.join(dataDir, 'pglite'), migrate: true });
  try {
    const { db } = handle;
    const { shopId } = await seedDemoShop(db);
    const [{ n: haveJobs }] = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(eq(jobs.shopId, shopId));
    const [{ n: haveParts }] = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(parts)
      .where(eq(parts.shopId, shopId));
    const addJobs = JOBS - haveJobs;
    const addParts = PARTS - haveParts;
    await db.transaction(async (tx) => {
      await tx.execute(sql`
        insert into jobs (shop_id, name, customer_id, status, due_date, notes, created_at, updated_at)
        select ${shopId}, 'Bench job ' || lpad(i::text, 3, '0') || ' ' || (array['kitchen','vanity','wardrobe','bookcase','mudroom bench'])[1 + i % 5],
               (select id from customers c where c.shop_id = ${shopId} order by c.name offset (i % (select count(*) from customers where shop_id = ${shopId})) limit 1),
               (array['quoting','quoted','accepted','deposit-paid','cutting','done','declined','expired','archived']::job_status[])[1 + i % 9],
               case when i % 4 = 0 then null else date '2027-01-01' + (i % 120) end, '',
               timestamptz '2025-12-01T12:00:00Z' + i * interval '17 hours', timestamptz '2025-12-01T12:00:00Z' + i * interval '17 hours'
          from generate_series(1, ${addJobs}) i`);
      await tx.execute(sql`
        insert into parts (shop_id, job_id, label, quantity, length_mm, width_mm, thickness_mm, material, sort)
        select ${shopId}, j.id, (array['Side','Top','Bottom','Shelf','Back','Door','Drawer front'])[1 + k % 7], 1 + k % 4,
               300 + (k * 37) % 1800, 100 + (k * 53) % 500, (array[18, 12, 6, 19, 18])[1 + k % 5],
               (array['Maple ply','Baltic birch','MDF','White oak','Walnut ply'])[1 + k % 5], k
          from (select id, row_number() over (order by name) - 1 as r from jobs where shop_id = ${shopId} and name like 'Bench job %') j
          cross join generate_series(0, ${Math.ceil(addParts / addJobs) - 1}) k
         where j.r * ${Math.ceil(addParts / addJobs)} + k < ${addParts}`);
    });
    await db.execute(sql`analyze`);
    const [{ n: jobCount }] = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(eq(jobs.shopId, shopId));
    const [{ n: partCount }] = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(parts)
      .where(eq(parts.shopId, shopId));
    const [owner] = await db
      .select({ email: users.email })
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.role, 'owner')))
      .limit(1);
    const [plan] = await db
      .select({ id: plans.id, name: plans.name, bytes: sql<number>`length(${plans.document}::text)` })
      .from(plans)
      .where(and(eq(plans.shopId, shopId), sql`${plans.status} in ('released', 'cutting')`))
      .orderBy(sql`length(${plans.document}::text) desc`)
      .limit(1);
    log(
      `Seeded ${jobCount} jobs and ${partCount.toLocaleString('en-US')} parts in ${((performance.now() - started) / 1000).toFixed(1)} s (embedded PGlite, ${dataDir}).`,
    );
    return { owner: owner.email, plan };
  } finally {
    await handle.close();
  }
}

/** Signs in as a browser does (CSRF token, then the credentials callback) and returns the session cookie. */
async function signIn(url: string, email: string): Promise<string> {
  const csrf = await fetch(`${url}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = csrf.headers.getSetCookie().map((c) => c.split(';')[0]);
  const res = await fetch(`${url}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', origin: url, cookie: jar.join('; ') },
    body: new URLSearchParams({ email, password: DEMO_PASSWORD, csrfToken, json: 'true' }),
  });
  const session = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('next-auth.session-token='));
  if (!session) throw new Error(`sign-in as ${email} failed (${res.status})`);
  return session;
}

interface Target {
  name: string;
  path: string;
  /** At concurrency 10: at least this many requests/s, p99 at most this many ms. */
  goal?: { rps: number; p99: number };
}

interface Row {
  target: Target;
  connections: number;
  rps: number;
  p50: number;
  p99: number;
  requests: number;
  bad: number;
  load: number;
}

async function measure(url: string, cookie: string, target: Target, connections: number, seconds: number): Promise<Omit<Row, 'target' | 'load'>> {
  const result = await autocannon({ url: `${url}${target.path}`, connections, duration: seconds, headers: { cookie } });
  return {
    connections,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    requests: result.requests.total,
    // Anything but a 2xx (a redirect to sign-in, an error) and any socket error spoils the run.
    bad: result.non2xx + result.errors + result.timeouts,
  };
}

function table(rows: Row[]) {
  const head = ['route', 'conc.', 'req/s', 'p50 ms', 'p99 ms', 'requests', 'not 2xx', 'load 1 min', 'target at c=10', ''];
  const body = rows.map((r) => {
    const goal = r.connections === 10 ? r.target.goal : undefined;
    const ok = r.bad === 0 && (!goal || (r.rps >= goal.rps && r.p99 <= goal.p99));
    return [
      r.target.name,
      String(r.connections),
      r.rps.toFixed(0),
      r.p50.toFixed(0),
      r.p99.toFixed(0),
      r.requests.toLocaleString('en-US'),
      String(r.bad),
      r.load.toFixed(2),
      goal ? `≥ ${goal.rps} req/s, p99 ≤ ${goal.p99} ms` : '',
      goal || r.bad ? (ok ? '✓' : '✗') : '',
    ];
  });
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  const line = (cells: string[]) => `| ${cells.map((c, i) => (i >= 2 && i <= 7 ? c.padStart(widths[i]) : c.padEnd(widths[i]))).join(' | ')} |`;
  log(line(head));
  log(`|${widths.map((w, i) => (i >= 2 && i <= 7 ? `${'-'.repeat(w + 1)}:` : '-'.repeat(w + 2))).join('|')}|`);
  for (const b of body) log(line(b));
}

async function main() {
  buildIfNeeded(log);
  const dataDir = process.env.BENCH_DATA_DIR ? path.resolve(process.env.BENCH_DATA_DIR) : fs.mkdtempSync(path.join(os.tmpdir(), 'kw-bench-web-'));
  if (fs.existsSync(path.join(dataDir, 'pglite')))
    throw new Error(`${dataDir} already holds a database: the benchmark seeds a fresh one (remove it or pick another BENCH_DATA_DIR)`);
  fs.mkdirSync(dataDir, { recursive: true });
  const { owner, plan } = await seed(dataDir);
  const { child, url } = startServer(dataDir, args.port);
  const stop = () => {
    try {
      process.kill(-child.pid!, 'SIGTERM');
    } catch {
      // already gone
    }
  };
  process.on('SIGINT', () => {
    stop();
    process.exit(130);
  });
  try {
    await waitForHealth(url);
    const cookie = await signIn(url, owner);
    const targets: Target[] = [
      { name: 'GET /api/health', path: '/api/health' },
      { name: 'GET /api/jobs (first page)', path: '/api/jobs', goal: { rps: 300, p99: 100 } },
      {
        name: `GET /api/plans/:id (${plan.name}, ${(plan.bytes / 1024).toFixed(0)} kB)`,
        path: `/api/plans/${plan.id}`,
        goal: { rps: 300, p99: 100 },
      },
      { name: 'GET /jobs (page HTML)', path: '/jobs', goal: { rps: 150, p99: 250 } },
    ];
    for (const t of targets) {
      const res = await fetch(`${url}${t.path}`, { headers: { cookie }, redirect: 'manual' });
      if (res.status !== 200) throw new Error(`${t.path} answered ${res.status}, not 200`);
    }
    const first = (await (await fetch(`${url}/api/jobs`, { headers: { cookie } })).json()) as { jobs: unknown[]; total: number };
    log(`Signed in as ${owner}; the jobs list's first page holds ${first.jobs.length} of ${first.total} open jobs.`);
    log(
      `${os.cpus().length} cores, load average before: ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(' ')}; ${args.duration} s a run after a 2 s warm-up.\n`,
    );
    const rows: Row[] = [];
    for (const target of targets) {
      // Warm-up: compile paths, fill caches; not counted.
      await autocannon({ url: `${url}${target.path}`, connections: 10, duration: 2, headers: { cookie } });
      for (const c of CONCURRENCY) {
        const m = await measure(url, cookie, target, c, args.duration);
        rows.push({ target, ...m, load: os.loadavg()[0] });
      }
    }
    table(rows);
    log(
      `\nLoad average after: ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(' ')} (1, 5, 15 min). Server log: ${path.join(dataDir, 'server.log')}`,
    );
  } finally {
    stop();
    await new Promise((r) => setTimeout(r, 1000));
    if (!args.keep && !process.env.BENCH_DATA_DIR) fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
