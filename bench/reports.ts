/**
 * `npm run bench:reports` — the owner's reports on a large shop: 10,000 finished plans over two years (three stock
 * pieces and eight parts a plan, an offcut racked by each), 200,000 stock movements and 5,000 quotes (a quarter each
 * accepted with the deposit paid, declined, expired, and still out), in the embedded database
 * (or the PostgreSQL server in BENCH_DATABASE_URL). Prints the median of five runs of each report for a year by
 * month and a quarter by week. Target (issue 15): every report under 300 ms.
 */
import { loadavg } from 'node:os';
import { sql } from 'drizzle-orm';
import { openDatabase } from '@/db/open';
import { offcutUse, oldOffcuts, stockValueReport, yieldOverTime, type ReportFilter } from '@/db/queries/reports';
import { quotingReport } from '@/db/queries/quoting-report';
import { customers, jobs, shops } from '@/db/schema';

const PLANS = 10_000;
const MOVEMENTS = 200_000;
const QUOTES = 5_000;
const TARGET_MS = 300;
const log = (s = '') => process.stdout.write(`${s}\n`);

async function main() {
  const handle = await openDatabase(
    process.env.BENCH_DATABASE_URL ? { url: process.env.BENCH_DATABASE_URL, migrate: true } : { dataDir: 'memory://', migrate: true },
  );
  const { db } = handle;
  const [shop] = await db.insert(shops).values({ name: 'Bench shop', timeZone: 'America/Chicago' }).returning();
  const [customer] = await db.insert(customers).values({ shopId: shop.id, name: 'Bench customer' }).returning();
  const [job] = await db.insert(jobs).values({ shopId: shop.id, name: 'Bench job', customerId: customer.id }).returning();
  const started = performance.now();
  // Deterministic spreads (no randomness): plan i finished i × 6,307 s after 2025-01-01, materials round-robin.
  await db.execute(sql`
    insert into plans (shop_id, job_id, name, status, request, document, finished_at)
    select ${shop.id}, ${job.id}, 'Plan ' || i, 'done', '{}'::jsonb, '{}'::jsonb, timestamptz '2025-01-01T12:00:00Z' + (i * 6307) * interval '1 second'
      from generate_series(1, ${PLANS}) i`);
  await db.execute(sql`
    insert into plan_pieces (shop_id, plan_id, index, material, thickness_mm, length_mm, width_mm, offcut_id)
    select p.shop_id, p.id, k, (array['Maple ply','Baltic birch','MDF','White oak','Walnut ply','Hard maple'])[1 + (k + length(p.name)) % 6], 18, 2440, 1220, null
      from plans p cross join generate_series(0, 2) k where p.shop_id = ${shop.id}`);
  await db.execute(sql`
    insert into placements (shop_id, plan_piece_id, instance, x_mm, y_mm, length_mm, width_mm, damaged)
    select pp.shop_id, pp.id, n, 0, 0, 700 + n * 10, 300 + n * 5, n = 8 and pp.index = 0 and length(pp.plan_id::text) % 7 = 0
      from plan_pieces pp cross join generate_series(1, 8) n where pp.shop_id = ${shop.id}`);
  // As finishing a plan writes them.
  await db.execute(sql`
    update plan_pieces pp set
      part_area_mm2 = coalesce((select sum(pl.length_mm * pl.width_mm) from placements pl where pl.plan_piece_id = pp.id and not pl.damaged), 0),
      spoiled_area_mm2 = coalesce((select sum(pl.length_mm * pl.width_mm) from placements pl where pl.plan_piece_id = pp.id and pl.damaged), 0)
     where pp.shop_id = ${shop.id}`);
  await db.execute(sql`
    insert into offcuts (shop_id, material, thickness_mm, length_mm, width_mm, status, source_plan_id, created_at)
    select p.shop_id, 'Maple ply', 18, 800, 400, (array['available','used','scrapped']::offcut_status[])[1 + (row_number() over (order by p.id))::int % 3], p.id, p.finished_at
      from plans p where p.shop_id = ${shop.id}`);
  await db.execute(sql`
    insert into stock_items (shop_id, kind, material, nominal_thickness, thickness_mm, length_mm, width_mm, on_hand, low_stock_at, cost_cents)
    select ${shop.id}, 'sheet', (array['Maple ply','Baltic birch','MDF','White oak','Walnut ply','Hard maple'])[1 + k % 6], '3/4"', 18, 2440, 1220, 20, 5, 5000 + k * 100
      from generate_series(0, 39) k`);
  await db.execute(sql`
    insert into stock_movements (shop_id, kind, stock_item_id, quantity, reserved_change, created_at)
    select ${shop.id}, (array['received','reserved','consumed']::movement_kind[])[1 + j % 3], s.id,
           case j % 3 when 0 then 3 when 1 then 0 else -1 end, case j % 3 when 1 then 1 when 2 then -1 else 0 end,
           timestamptz '2025-01-01T12:00:00Z' + (j * 315) * interval '1 second'
      from generate_series(1, ${MOVEMENTS}) j
      join lateral (select id from stock_items where shop_id = ${shop.id} order by id offset (j % 40) limit 1) s on true`);
  // Quote i sent i × 12,614 s after 2025-01-01 (two years), answered three days later, the deposit paid the day after.
  const lines = JSON.stringify([
    {
      id: 'm-1',
      kind: 'material',
      description: 'Maple ply ¾″, 96″ × 48″ (from stock)',
      quantity: 3,
      unit: 'sheet',
      unitCostMinor: 9400,
      taxable: true,
      note: '',
    },
    {
      id: 'm-2',
      kind: 'material',
      description: 'Spoilage allowance (15 % of material, once)',
      quantity: 1,
      unit: 'lot',
      unitCostMinor: 4230,
      taxable: true,
      note: '',
    },
    { id: 'l-1', kind: 'labour', description: 'Saw time', quantity: 0.96, unit: 'h', unitCostMinor: 6500, taxable: false, note: '' },
  ]);
  await db.execute(sql`
    insert into quotes (shop_id, job_id, number, created_at)
    select ${shop.id}, ${job.id}, i, timestamptz '2025-01-01T12:00:00Z' + (i * 12614) * interval '1 second' from generate_series(1, ${QUOTES}) i`);
  await db.execute(sql`
    insert into quote_revisions (shop_id, quote_id, job_id, revision, status, currency, lines, markup_material_percent, markup_hardware_percent, discount, tax_percent, deposit_percent, validity_days, terms, sent_at, valid_until, answered_at, accepted_name)
    select q.shop_id, q.id, q.job_id, 0, (array['sent','accepted','declined','expired']::quote_revision_status[])[1 + q.number % 4], 'USD', ${lines}::jsonb, 30, 20, '{"kind":"percent","percent":0}'::jsonb, 8.25, 50, 30, 'Terms.',
           q.created_at, (q.created_at + interval '30 days')::date, case when q.number % 4 in (1, 2) then q.created_at + interval '3 days' end, case when q.number % 4 = 1 then 'Bench customer' end
      from quotes q where q.shop_id = ${shop.id}`);
  await db.execute(sql`
    insert into quote_payments (shop_id, revision_id, job_id, checkout_session_id, amount_minor, currency, status, paid_at)
    select r.shop_id, r.id, r.job_id, 'cs_bench_' || r.id, 25000, 'USD', 'paid', r.answered_at + interval '1 day'
      from quote_revisions r where r.shop_id = ${shop.id} and r.status = 'accepted'`);
  await db.execute(sql`analyze`);
  log(
    `Seeded ${PLANS.toLocaleString('en-US')} finished plans, ${(PLANS * 3).toLocaleString('en-US')} pieces, ${(PLANS * 24).toLocaleString('en-US')} placements, ${PLANS.toLocaleString('en-US')} offcuts and ${MOVEMENTS.toLocaleString('en-US')} movements and ${QUOTES.toLocaleString('en-US')} quotes in ${((performance.now() - started) / 1000).toFixed(1)} s (${process.env.BENCH_DATABASE_URL ? 'PostgreSQL' : 'embedded PGlite'}).`,
  );

  const year: ReportFilter = { shopId: shop.id, timeZone: 'America/Chicago', by: 'month', from: '2026-01-01', to: '2026-12-31' };
  const quarter: ReportFilter = { ...year, by: 'week', from: '2026-07-01', to: '2026-09-30', material: 'Maple ply' };
  const reports: [string, () => Promise<unknown>][] = [
    ['Yield over time, a year by month', () => yieldOverTime(db, year)],
    ['Yield over time, a quarter by week, one material', () => yieldOverTime(db, quarter)],
    ['Offcut use, a year by month', () => offcutUse(db, year)],
    ['Stock value, a year by month', () => stockValueReport(db, year)],
    ['Stock value, a quarter by week, one material', () => stockValueReport(db, quarter)],
    ['Quoting, a year by month', () => quotingReport(db, year)],
    ['Yield over time, a year by month, one customer', () => yieldOverTime(db, { ...year, customerId: customer.id })],
    [
      'Old offcuts (6 months)',
      () => oldOffcuts(db, { shopId: shop.id, timeZone: 'America/Chicago', months: 6, now: new Date('2026-12-03T12:00:00Z') }),
    ],
  ];
  log('');
  log('| report | median of 5 | slowest | target |');
  log('|---|---:|---:|---:|');
  let missed = 0;
  for (const [name, run] of reports) {
    await run(); // warm
    const times: number[] = [];
    for (let i = 0; i < 5; i++) {
      const t = performance.now();
      await run();
      times.push(performance.now() - t);
    }
    times.sort((a, b) => a - b);
    if (times[2] >= TARGET_MS) missed++;
    log(`| ${name} | ${times[2].toFixed(0)} ms | ${times[4].toFixed(0)} ms | < ${TARGET_MS} ms ${times[2] < TARGET_MS ? '✓' : '✗'} |`);
  }
  log('');
  log(
    `Load average ${loadavg()
      .map((l) => l.toFixed(2))
      .join(' / ')}.`,
  );
  await handle.close();
  if (missed) process.exitCode = 1;
}

void main();
