import type { ShopScope } from '../scope';
import { eq, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../open';
import { stockItems } from '../schema';
import { periodsBetween, type ReportPeriod } from '@/lib/dates/shop-time';
import type { OffcutUseFigures } from '@/lib/reports/offcut-report';
import { stockValueOverTime } from '@/lib/reports/stock-value';
import { costEachCents } from './nest-request';

/**
 * The owner's reports, grouped in the database on the shop's own clock (`date_trunc` of the timestamp read in the
 * shop's time zone), so no report loads a shop's rows into the server's memory: each query returns one row per
 * period and material.
 */

export interface ReportFilter {
  shopId: string;
  /** IANA zone the shop's days are read in. */
  timeZone: string;
  by: ReportPeriod;
  /** First and last shop days (`YYYY-MM-DD`), both included. */
  from: string;
  to: string;
  /** Only this material, when given. */
  material?: string;
  /** Only the work of this customer's jobs, or of this job (yield, offcut use and quoting; stock value is the shop's). */
  customerId?: string;
  jobId?: string;
}

/** One period's stock area for one material and thickness, and what became of it (mm²). */
export interface YieldRow {
  period: string;
  material: string;
  thickness: number;
  plans: number;
  stockArea: number;
  partArea: number;
  /** Parts damaged at the saw (they go on the re-cut list). */
  spoiledArea: number;
  /** Offcuts put on the rack. */
  keptArea: number;
  /** Trim, kerf and scraps too small to keep: stock less parts, spoiled parts and kept offcuts. */
  sawWasteArea: number;
}

export const rowsOf = <T>(result: unknown): T[] => (result as { rows?: T[] }).rows ?? (result as T[]);

/** The day after a `YYYY-MM-DD` day. */
const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);

/** The instant a shop day starts, as a timestamptz, from a day read on the shop's clock. */
export const dayStart = (day: string, zone: string) => sql`(${day}::date::timestamp at time zone ${zone})`;
export const periodOf = (column: unknown, f: ReportFilter) => sql`to_char(date_trunc(${f.by}, ${column} at time zone ${f.timeZone}), 'YYYY-MM-DD')`;
export const inRange = (column: unknown, f: ReportFilter) =>
  sql`${column} >= ${dayStart(f.from, f.timeZone)} and ${column} < ${dayStart(f.to, f.timeZone)} + interval '1 day'`;
const materialIs = (column: unknown, f: ReportFilter) => (f.material ? sql`and ${column} = ${f.material}` : sql``);
/** `and <job column> is one of the filter's jobs`, when the filter names a customer or a job (a null job matches none). */
export const jobIs = (column: unknown, f: ReportFilter) => {
  if (!f.customerId && !f.jobId) return sql``;
  const customer = f.customerId ? sql`and j.customer_id = ${f.customerId}` : sql``;
  const job = f.jobId ? sql`and j.id = ${f.jobId}` : sql``;
  return sql`and ${column} in (select j.id from jobs j where j.shop_id = ${f.shopId} ${customer} ${job})`;
};

/**
 * Yield over time: finished plans by the week or month they were finished in, per material and thickness. Yield is
 * the parts' share of the stock area; the saw's waste and the spoiled parts are kept apart.
 */
export async function yieldOverTime(db: Db, f: ReportFilter): Promise<YieldRow[]> {
  const finished = sql.raw('p.finished_at');
  // A piece's part and damaged areas are written when its plan is finished; read from its placements otherwise.
  const partsOf = (damaged: boolean) =>
    sql.raw(`(select sum(pl.length_mm * pl.width_mm) from placements pl where pl.plan_piece_id = pp.id and ${damaged ? '' : 'not '}pl.damaged)`);
  const [stock, kept] = await Promise.all([
    db.execute(sql`
      select ${periodOf(finished, f)} as period, pp.material, pp.thickness_mm as thickness, count(distinct p.id)::int as plans,
             sum(pp.length_mm * pp.width_mm)::float8 as area,
             coalesce(sum(coalesce(pp.part_area_mm2, ${partsOf(false)})), 0)::float8 as parts,
             coalesce(sum(coalesce(pp.spoiled_area_mm2, ${partsOf(true)})), 0)::float8 as spoiled
        from plans p join plan_pieces pp on pp.plan_id = p.id
       where p.shop_id = ${f.shopId} and p.status = 'done' and ${inRange(finished, f)} ${materialIs(sql.raw('pp.material'), f)} ${jobIs(sql.raw('p.job_id'), f)}
       group by 1, 2, 3`),
    db.execute(sql`
      select ${periodOf(finished, f)} as period, o.material, o.thickness_mm as thickness, sum(o.length_mm * o.width_mm)::float8 as area
        from offcuts o join plans p on p.id = o.source_plan_id
       where o.shop_id = ${f.shopId} and p.shop_id = ${f.shopId} and p.status = 'done' and ${inRange(finished, f)} ${materialIs(sql.raw('o.material'), f)} ${jobIs(sql.raw('p.job_id'), f)}
       group by 1, 2, 3`),
  ]);
  const key = (r: { period: string; material: string; thickness: number }) => `${r.period}\u0000${r.material}\u0000${Number(r.thickness)}`;
  const rows = new Map<string, YieldRow>();
  for (const r of rowsOf<{ period: string; material: string; thickness: number; plans: number; area: number; parts: number; spoiled: number }>(
    stock,
  )) {
    rows.set(key(r), {
      period: r.period,
      material: r.material,
      thickness: Number(r.thickness),
      plans: Number(r.plans),
      stockArea: Number(r.area),
      partArea: Number(r.parts),
      spoiledArea: Number(r.spoiled),
      keptArea: 0,
      sawWasteArea: 0,
    });
  }
  for (const r of rowsOf<{ period: string; material: string; thickness: number; area: number }>(kept)) {
    const row = rows.get(key(r));
    if (row) row.keptArea = Number(r.area);
  }
  for (const row of rows.values()) row.sawWasteArea = Math.max(0, row.stockArea - row.partArea - row.spoiledArea - row.keptArea);
  return [...rows.values()].sort((a, b) => a.period.localeCompare(b.period) || a.material.localeCompare(b.material) || a.thickness - b.thickness);
}

/** One period of the rack: what plans took from offcuts against new stock, and what went on, off and out of it. */
export type OffcutUseRow = OffcutUseFigures;

export async function offcutUse(db: Db, f: ReportFilter): Promise<OffcutUseRow[]> {
  const finished = sql.raw('p.finished_at');
  const created = sql.raw('o.created_at');
  const moved = sql.raw('m.created_at');
  const [cut, racked, out] = await Promise.all([
    db.execute(sql`
      select ${periodOf(finished, f)} as period,
             coalesce(sum(pp.length_mm * pp.width_mm) filter (where pp.offcut_id is not null), 0)::float8 as rack,
             coalesce(sum(pp.length_mm * pp.width_mm) filter (where pp.offcut_id is null), 0)::float8 as fresh
        from plans p join plan_pieces pp on pp.plan_id = p.id
       where p.shop_id = ${f.shopId} and p.status = 'done' and ${inRange(finished, f)} ${materialIs(sql.raw('pp.material'), f)} ${jobIs(sql.raw('p.job_id'), f)}
       group by 1`),
    db.execute(sql`
      select ${periodOf(created, f)} as period, count(*)::int as n, sum(o.length_mm * o.width_mm)::float8 as area
        from offcuts o
       where o.shop_id = ${f.shopId} and ${inRange(created, f)} ${materialIs(sql.raw('o.material'), f)} ${jobIs(sql.raw('(select sp.job_id from plans sp where sp.id = o.source_plan_id)'), f)}
       group by 1`),
    // Leaving the rack: cut up in a finished plan (consumed) or thrown out (scrapped), one ledger row each.
    db.execute(sql`
      select ${periodOf(moved, f)} as period, m.kind, count(*)::int as n, sum(o.length_mm * o.width_mm)::float8 as area
        from stock_movements m join offcuts o on o.id = m.offcut_id
       where m.shop_id = ${f.shopId} and m.kind in ('consumed', 'scrapped') and ${inRange(moved, f)} ${materialIs(sql.raw('o.material'), f)} ${jobIs(sql.raw('(select mp.job_id from plans mp where mp.id = m.plan_id)'), f)}
       group by 1, 2`),
  ]);
  const rows = new Map<string, OffcutUseRow>();
  const at = (period: string) => {
    let row = rows.get(period);
    if (!row)
      rows.set(
        period,
        (row = { period, fromRackArea: 0, fromNewStockArea: 0, racked: 0, rackedArea: 0, used: 0, usedArea: 0, scrapped: 0, scrappedArea: 0 }),
      );
    return row;
  };
  for (const r of rowsOf<{ period: string; rack: number; fresh: number }>(cut))
    Object.assign(at(r.period), { fromRackArea: Number(r.rack), fromNewStockArea: Number(r.fresh) });
  for (const r of rowsOf<{ period: string; n: number; area: number }>(racked))
    Object.assign(at(r.period), { racked: Number(r.n), rackedArea: Number(r.area) });
  for (const r of rowsOf<{ period: string; kind: string; n: number; area: number }>(out)) {
    if (r.kind === 'consumed') Object.assign(at(r.period), { used: Number(r.n), usedArea: Number(r.area) });
    else Object.assign(at(r.period), { scrapped: Number(r.n), scrappedArea: Number(r.area) });
  }
  return [...rows.values()].sort((a, b) => a.period.localeCompare(b.period));
}

/** An offcut on the rack longer than the shop's age limit: to use or scrap. */
export interface OldOffcut {
  id: string;
  material: string;
  thickness: number;
  length: number;
  width: number;
  location: string;
  rackedOn: string;
  ageDays: number;
}

export async function oldOffcuts(
  db: Db,
  { shopId, timeZone, months, now = new Date(), material }: { shopId: string; timeZone: string; months: number; now?: Date; material?: string },
): Promise<OldOffcut[]> {
  const result = await db.execute(sql`
    select o.id, o.material, o.thickness_mm, o.length_mm, o.width_mm, o.location,
           to_char(o.created_at at time zone ${timeZone}, 'YYYY-MM-DD') as racked_on,
           floor(extract(epoch from (${now.toISOString()}::timestamptz - o.created_at)) / 86400)::int as age_days
      from offcuts o
     where o.shop_id = ${shopId} and o.status = 'available'
       and o.created_at < ${now.toISOString()}::timestamptz - make_interval(months => ${months}::int)
       ${material ? sql`and o.material = ${material}` : sql``}
     order by o.created_at, o.id
     limit 500`);
  return rowsOf<{
    id: string;
    material: string;
    thickness_mm: number;
    length_mm: number;
    width_mm: number;
    location: string;
    racked_on: string;
    age_days: number;
  }>(result).map((r) => ({
    id: r.id,
    material: r.material,
    thickness: Number(r.thickness_mm),
    length: Number(r.length_mm),
    width: Number(r.width_mm),
    location: r.location,
    rackedOn: r.racked_on,
    ageDays: Number(r.age_days),
  }));
}

/** The customers and jobs the filters offer: those with a finished plan or a quote sent (at most 300 jobs, newest first). */
export async function reportSubjects({
  db,
  shopId,
}: ShopScope): Promise<{ customers: { id: string; name: string }[]; jobs: { id: string; name: string }[] }> {
  const [c, j] = await Promise.all([
    db.execute(sql`select c.id, c.name from customers c where c.shop_id = ${shopId} order by lower(c.name), c.id`),
    db.execute(sql`
      select j.id, j.name from jobs j
       where j.shop_id = ${shopId}
         and (exists (select 1 from plans p where p.job_id = j.id and p.status = 'done') or exists (select 1 from quote_revisions r where r.job_id = j.id and r.sent_at is not null))
       order by j.created_at desc, j.id limit 300`),
  ]);
  return { customers: rowsOf<{ id: string; name: string }>(c), jobs: rowsOf<{ id: string; name: string }>(j) };
}

/** The materials a shop has finished plans or offcuts in, for the report's filter. */
export async function reportMaterials({ db, shopId }: ShopScope): Promise<string[]> {
  const result = await db.execute(sql`
    select material from (
      select distinct pp.material from plan_pieces pp where pp.shop_id = ${shopId}
      union select distinct o.material from offcuts o where o.shop_id = ${shopId}
    ) m order by 1`);
  return rowsOf<{ material: string }>(result).map((r) => r.material);
}

/**
 * Stock value over time: the ledger's net changes per period and piece up to the range's end (a few rows per piece
 * and period, never the movements themselves), valued in `lib/reports/stock-value` at each piece's cost today.
 */
export async function stockValueReport(db: Db, f: ReportFilter) {
  const periods = periodsBetween(f.from, f.to, f.by);
  // The instants the periods start, in the shop's zone, and the first day after the range.
  const starts = [...periods.map((p) => (p < f.from ? f.from : p)), nextDay(f.to)];
  // A sub-select, so the array is built once for the query rather than for every row.
  const bounds = sql`(select array[${sql.join(
    starts.map((d) => dayStart(d, f.timeZone)),
    sql`, `,
  )}])`;
  const [rows, items] = await Promise.all([movementsByPeriod(db, f, bounds), db.select().from(stockItems).where(eq(stockItems.shopId, f.shopId))]);
  // Offcuts enter the ledger as one piece per material whose "count" is already in minor units (cost each 1).
  const offcutKey = (material: string) => `offcuts\u0000${material}`;
  const offcutMaterials = [...new Set(rows.flatMap((r) => (r.offcut_material === null ? [] : [r.offcut_material])))];
  const pieces = [
    ...items.map((i) => ({ id: i.id, material: i.material, costEach: costEachCents(i) })),
    ...offcutMaterials.map((m) => ({ id: offcutKey(m), material: m, costEach: 1 })),
  ].filter((p) => !f.material || p.material === f.material);
  const wanted = new Set(pieces.map((p) => p.id));
  const ledger = rows
    .map((r) => {
      const period = periods[Math.max(0, Number(r.bucket) - 1)];
      return r.item !== null
        ? { period, pieceId: r.item, onHand: Number(r.on_hand), reserved: Number(r.reserved) }
        : { period, pieceId: offcutKey(r.offcut_material ?? ''), onHand: Number(r.offcut_value), reserved: Number(r.offcut_reserved) };
    })
    .filter((r) => wanted.has(r.pieceId));
  const { points, unknownPieces } = stockValueOverTime(periods, ledger, pieces);
  return { points, unknownPieces, low: lowNow(items, f) };
}

/**
 * Each movement put in its period by comparing its time with the periods' starts on the shop's clock
 * (width_bucket: 0 before the range, the opening balance; k for the k-th period), not by converting every row.
 * Sheets and boards by piece (their cost each is worked out below); offcuts, each with a cost of its own, valued
 * here and summed by material, so the shop's whole rack history is never read into memory.
 */
async function movementsByPeriod(db: Db, f: ReportFilter, bounds: SQL) {
  return rowsOf<{
    bucket: number;
    item: string | null;
    offcut_material: string | null;
    on_hand: number;
    reserved: number;
    offcut_value: number;
    offcut_reserved: number;
  }>(
    await db.execute(sql`
    select width_bucket(m.created_at, ${bounds}) as bucket, m.stock_item_id as item, o.material as offcut_material,
           sum(m.quantity)::int as on_hand, sum(m.reserved_change)::int as reserved,
           coalesce(sum(m.quantity * o.cost_cents), 0)::float8 as offcut_value, coalesce(sum(m.reserved_change * o.cost_cents), 0)::float8 as offcut_reserved
      from stock_movements m left join offcuts o on o.id = m.offcut_id
     where m.shop_id = ${f.shopId} and m.created_at < ${dayStart(f.to, f.timeZone)} + interval '1 day'
     group by 1, 2, 3`),
  );
}

/** Sizes low on the rack now: free count at or under the size's low mark. */
function lowNow(items: (typeof stockItems.$inferSelect)[], f: ReportFilter) {
  return items
    .filter((i) => (!f.material || i.material === f.material) && i.lowStockAt > 0 && i.onHand - i.reserved <= i.lowStockAt)
    .map((i) => ({
      id: i.id,
      material: i.material,
      nominalThickness: i.nominalThickness,
      thickness: i.thickness,
      length: i.length,
      width: i.width,
      kind: i.kind,
      free: i.onHand - i.reserved,
      lowStockAt: i.lowStockAt,
    }))
    .sort((a, b) => a.material.localeCompare(b.material) || a.thickness - b.thickness);
}
