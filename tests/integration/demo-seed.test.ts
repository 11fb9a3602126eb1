import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { jobs, plans, shops, stockItems, users } from '@/db/schema';
import { readPlan, validatePlan } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';
import { stockOffers } from '@/app/api/materials/stock-offers';
import { emptySchedule, scheduleFormSchema, toScheduleInput } from '@/components/drawer-schedules/schedule-form-values';
import { stockMatchWarning } from '@/lib/cut-list/stock-match';
import { sizeDrawerSchedule } from '@/lib/joinery';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;

let handle: DbHandle;
let first: Awaited<ReturnType<typeof seedDemoShop>>;
beforeAll(async () => {
  handle = await createTestDatabase();
  first = await seedDemoShop(handle.db);
});
afterAll(() => handle.close());

describe('the demo shop', () => {
  test('has one sign-in per role, each with the documented password, plus jobs and stock', async () => {
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

  test('stocks every part a new drawer schedule takes with the form’s defaults (¾″, ½″, ¼″ Baltic birch)', async () => {
    const offers = await stockOffers(handle.db, first.shopId);
    const text = { ...emptySchedule(IMPERIAL, offers), label: 'Defaults', width: '15', height: '7', depth: '21' };
    const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(toScheduleInput(scheduleFormSchema('in').parse(text))));
    expect(sized.ok).toBe(true);
    if (!sized.ok) return;
    expect(sized.parts.map((p) => [p.role, stockMatchWarning(p, offers, IMPERIAL)])).toEqual(sized.parts.map((p) => [p.role, null]));
  });

  test('is seeded only into an empty database', async () => {
    const again = await seedDemoShop(handle.db);
    expect(again.seeded).toBe(false);
    expect((await handle.db.select().from(shops)).length).toBe(1);
  });
});
