import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { runMigrations, type DbHandle } from '@/db/open';
import { databaseBefore } from '../support/database-before';

/**
 * The migration that adds customers turns each job's free-text customer into a customer row (its hand-written SQL at
 * the end of the file). Jobs are written as the code before it wrote them, then the rest of the migrations run.
 */
let handle: DbHandle;

beforeAll(async () => {
  handle = await databaseBefore((_tag, sql) => sql.includes('CREATE TABLE "customers"'), 'creates customers');
});
afterAll(async () => {
  await handle?.close();
});

const rows = async <T>(query: ReturnType<typeof sql>) => ((await handle.db.execute(query)) as unknown as { rows: T[] }).rows;

describe('the customers migration on jobs with free-text customers', () => {
  test('one customer per distinct name of a shop (spaces and case aside); each job points at its own; blank names get none', async () => {
    const shop = async (name: string) => (await rows<{ id: string }>(sql`insert into shops (name) values (${name}) returning id`))[0].id;
    const a = await shop('Old shop A');
    const b = await shop('Old shop B');
    const job = async (shopId: string, name: string, customer: string) =>
      (await rows<{ id: string }>(sql`insert into jobs (shop_id, name, customer) values (${shopId}, ${name}, ${customer}) returning id`))[0].id;
    const kitchen = await job(a, 'Kitchen', 'Priya Hollis');
    const pantry = await job(a, 'Pantry', '  priya   hollis ');
    const vanity = await job(a, 'Vanity', 'Gail Pemberton');
    const shelf = await job(a, 'Shelf', '   ');
    const other = await job(b, 'Their kitchen', 'Priya Hollis');

    await runMigrations(handle);

    const customers = await rows<{ id: string; shop_id: string; name: string }>(sql`select id, shop_id, name from customers order by shop_id, name`);
    expect(
      customers
        .filter((c) => c.shop_id === a)
        .map((c) => c.name)
        .sort(),
    ).toEqual(['Gail Pemberton', 'Priya Hollis']);
    expect(customers.filter((c) => c.shop_id === b).map((c) => c.name)).toEqual(['Priya Hollis']);
    const jobs = new Map(
      (await rows<{ id: string; customer_id: string | null }>(sql`select id, customer_id from jobs`)).map((j) => [j.id, j.customer_id]),
    );
    const named = (shopId: string, name: string) => customers.find((c) => c.shop_id === shopId && c.name === name)!.id;
    expect(jobs.get(kitchen)).toBe(named(a, 'Priya Hollis'));
    expect(jobs.get(pantry)).toBe(named(a, 'Priya Hollis'));
    expect(jobs.get(vanity)).toBe(named(a, 'Gail Pemberton'));
    expect(jobs.get(shelf)).toBeNull();
    // Another shop's customer of the same name is its own row: tenants never share.
    expect(jobs.get(other)).toBe(named(b, 'Priya Hollis'));
    const columns = await rows<{ column_name: string }>(sql`select column_name from information_schema.columns where table_name = 'jobs'`);
    expect(columns.map((c) => c.column_name)).not.toContain('customer');

    // A shop that goes takes its customers and their jobs with it (the job's link is checked at the statement's end).
    await handle.db.execute(sql`delete from shops where id = ${a}`);
    expect(await rows(sql`select id from customers where shop_id = ${a}`)).toEqual([]);
    expect(await rows(sql`select id from jobs where shop_id = ${a}`)).toEqual([]);
  });
});
