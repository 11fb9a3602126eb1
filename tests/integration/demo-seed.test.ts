import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { jobs, plans, shops, stockItems, users } from '@/db/schema';
import { readPlan, validatePlan } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';

let handle: DbHandle;
beforeAll(async () => {
  handle = await createTestDatabase();
});
afterAll(() => handle.close());

describe('the demo shop', () => {
  test('has one sign-in per role, each with the documented password, plus jobs and stock', async () => {
    const first = await seedDemoShop(handle.db);
    expect(first.seeded).toBe(true);
    const people = await handle.db.select().from(users);
    expect(people.map((p) => p.role).sort()).toEqual(['cutter', 'estimator', 'owner']);
    for (const p of people) expect(await bcrypt.compare(DEMO_PASSWORD, p.passwordHash)).toBe(true);
    expect(people.map((p) => p.email).sort()).toEqual(DEMO_PEOPLE.map((p) => p.email).sort());
    expect((await handle.db.select().from(jobs)).length).toBeGreaterThan(0);
    expect((await handle.db.select().from(stockItems)).length).toBeGreaterThan(0);
  });

  test('has a released plan that passes validatePlan, with exactly its stock reserved', async () => {
    const [plan] = await handle.db.select().from(plans);
    expect(plan.status).toBe('released');
    const request = nestRequestSchema.parse(plan.request);
    const document = readPlan(plan.document);
    expect(validatePlan(request, document)).toEqual([]);
    const reservedSheets = (await handle.db.select().from(stockItems)).reduce((n, s) => n + s.reserved, 0);
    const pulledSheets = document.stockToPull.filter((l) => l.stockId.startsWith('stock:')).reduce((n, l) => n + l.count, 0);
    expect(reservedSheets).toBe(pulledSheets);
    expect(pulledSheets).toBeGreaterThan(0);
  });

  test('is seeded only into an empty database', async () => {
    const again = await seedDemoShop(handle.db);
    expect(again.seeded).toBe(false);
    expect((await handle.db.select().from(shops)).length).toBe(1);
  });
});
