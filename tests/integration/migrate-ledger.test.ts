import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { runMigrations, type DbHandle } from '@/db/open';
import { ledgerMismatches } from '@/db/queries/stock';
import { databaseBefore } from '../support/database-before';

/**
 * The migration that adds `reserved_change` moves existing data to the new shape: the reserved count leaves `quantity` for `reserved_change`,
 * a finish's release-and-cut pair becomes one cut, and job statuses catch up with their plans. Rows are written as
 * the code before it wrote them, then the migration runs over them.
 */
let handle: DbHandle;

beforeAll(async () => {
  handle = await databaseBefore((_tag, sql) => sql.includes('ADD COLUMN "reserved_change"'), 'adds stock_movements.reserved_change');
});
afterAll(async () => {
  await handle?.close();
});

const rows = async <T>(query: ReturnType<typeof sql>) => ((await handle.db.execute(query)) as unknown as { rows: T[] }).rows;

describe('the ledger migration on a ledger written the old way', () => {
  test('keeps every count, merges each finish’s release-and-cut pair into one cut, and moves job statuses along', async () => {
    const db = handle.db;
    const [shop] = await rows<{ id: string }>(sql`insert into shops (name) values ('Old ledger shop') returning id`);
    const job = async (name: string, status: string) =>
      (await rows<{ id: string }>(sql`insert into jobs (shop_id, name, status) values (${shop.id}, ${name}, ${status}::job_status) returning id`))[0]
        .id;
    const [released, finished] = [await job('Released job', 'won'), await job('Finished job', 'quoting')];
    await job('Plain quote', 'quoting');
    const plan = async (jobId: string, status: string) =>
      (
        await rows<{ id: string }>(
          sql`insert into plans (shop_id, job_id, name, status, request, document) values (${shop.id}, ${jobId}, 'P', ${status}::plan_status, '{}', '{}') returning id`,
        )
      )[0].id;
    const [open, done, cancelled] = [await plan(released, 'released'), await plan(finished, 'done'), await plan(finished, 'cancelled')];
    // Five sheets: 2 reserved and cut by the done plan, 1 reserved by the open plan, 1 reserved then given back.
    const [item] = await rows<{ id: string }>(
      sql`insert into stock_items (shop_id, kind, material, nominal_thickness, thickness_mm, length_mm, width_mm, on_hand, reserved) values (${shop.id}, 'sheet', 'Old ply', '18 mm', 18, 2440, 1220, 3, 1) returning id`,
    );
    const move = (kind: string, quantity: number, planId: string | null, reason: string, at: string) =>
      db.execute(
        sql`insert into stock_movements (shop_id, kind, stock_item_id, quantity, plan_id, reason, created_at) values (${shop.id}, ${kind}::movement_kind, ${item.id}, ${quantity}, ${planId}, ${reason}, ${at}::timestamptz)`,
      );
    await move('received', 5, null, 'Opening count', '2026-10-01T08:00:00Z');
    await move('reserved', 2, done, 'Reserved for plan “P”', '2026-10-02T08:00:00Z');
    await move('released', -2, done, 'Cut for plan “P”', '2026-10-03T08:00:00Z');
    await move('consumed', -2, done, 'Cut for plan “P”', '2026-10-03T08:00:00Z');
    await move('reserved', 1, cancelled, 'Reserved for plan “P”', '2026-10-04T08:00:00Z');
    await move('released', -1, cancelled, 'Plan “P” cancelled', '2026-10-05T08:00:00Z');
    await move('reserved', 1, open, 'Reserved for plan “P”', '2026-10-06T08:00:00Z');

    await runMigrations(handle);

    const ledger = await rows<{ kind: string; quantity: number; reserved_change: number }>(
      sql`select kind, quantity, reserved_change from stock_movements where shop_id = ${shop.id} order by created_at`,
    );
    expect(ledger.map((m) => [m.kind, m.quantity, m.reserved_change])).toEqual([
      ['received', 5, 0],
      ['reserved', 0, 2],
      ['consumed', -2, -2],
      ['reserved', 0, 1],
      ['released', 0, -1],
      ['reserved', 0, 1],
    ]);
    expect(await ledgerMismatches({ db, shopId: shop.id })).toEqual([]);

    const jobs = await rows<{ name: string; status: string; accepted_at: Date | null }>(
      sql`select name, status, accepted_at from jobs where shop_id = ${shop.id} order by name`,
    );
    expect(jobs.map((j) => [j.name, j.status, j.accepted_at !== null])).toEqual([
      ['Finished job', 'done', false],
      ['Plain quote', 'quoting', false],
      ['Released job', 'cutting', true],
    ]);
  });
});
