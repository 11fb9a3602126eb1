import bcrypt from 'bcryptjs';
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { jobs, offcuts, placements, planPieces, plans, shops, slideModels, stockItems, users } from '@/db/schema';
import { offcutUse, oldOffcuts, stockValueReport, yieldOverTime } from '@/db/queries/reports';
import { quotingReport } from '@/db/queries/quoting-report';
import { ledgerMismatches } from '@/db/queries/stock';
import { HISTORY_BIN } from '@/seeds/demo-history';
import { readPlan, validatePlan } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';
import { stockOffers } from '@/app/api/materials/stock-offers';
import { emptySchedule, scheduleFormSchema, toScheduleInput } from '@/components/drawer-schedules/schedule-form-values';
import { stockMatchWarning } from '@/lib/cut-list/stock-match';
import { sizeDrawerSchedule } from '@/lib/joinery';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { listSlideModels } from '@/db/queries/slide-models';
import { listSaws } from '@/db/queries/saws';
import { buildNestRequest } from '@/db/queries/nest-request';
import { optimize } from '@/lib/nesting';
import { inches } from '@/lib/units/length';

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
    const released = await handle.db.select().from(plans).where(eq(plans.status, 'released'));
    expect(released).toHaveLength(1);
    const [plan] = released;
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

  test('keeps a table saw (3 stages rip first, 30″ = 762 mm rip capacity, ⅛″ kerf) and a track saw, and nests the kitchen within both', async () => {
    const list = await listSaws({ db: handle.db, shopId: first.shopId });
    // 30″ × 25.4 = 762 mm and ⅛″ = 3.175 mm (1 in = 25.4 mm exactly).
    expect(list.map((s) => [s.kind, s.ripCapacity, s.maxStages, s.firstStage, s.kerf])).toEqual([
      ['table-saw', 762, 3, 'rip', 3.175],
      ['track-saw', null, null, 'rip', inches(3 / 32)],
    ]);
    const [kitchen] = await handle.db.select().from(jobs).where(eq(jobs.name, 'Hollis kitchen'));
    const [table, track] = list;
    const request = nestRequestSchema.parse(
      await buildNestRequest({ db: handle.db, shopId: first.shopId }, kitchen.id, { timeBudgetMs: 0, sawId: table.id, breakdownSawId: track.id }),
    );
    expect(request.settings.saw?.name).toBe('Cabinet saw');
    const plan = await optimize(request);
    expect(plan.pieces.length).toBeGreaterThan(0);
    expect(validatePlan(request, plan)).toEqual([]);
    const used = new Set(plan.pieces.flatMap((p) => p.sawOrder!.map((s) => s.saw)));
    expect([...used].sort()).toEqual(['Cabinet saw', 'Track saw']);
    // The table saw alone cannot crosscut the 34″ (863.6 mm) wide parts' strips on its 24″ sled: validatePlan says so.
    const alone = nestRequestSchema.parse(
      await buildNestRequest({ db: handle.db, shopId: first.shopId }, kitchen.id, { timeBudgetMs: 0, sawId: table.id }),
    );
    const problems = validatePlan(alone, await optimize(alone));
    expect(problems.some((p) => p.code === 'crosscut-capacity' && p.message.includes('863.6 mm crosscut'))).toBe(true);
  });

  test('keeps two invented undermount slide models, each sizing a box the way its rule says (worked by hand)', async () => {
    const models = await listSlideModels({ db: handle.db, shopId: first.shopId });
    expect(models.map((m) => [m.name, m.widthRule])).toEqual([
      ['Halbrook UM-58 full extension', 'inside'],
      ['Tessel T-16 soft close', 'outside'],
    ]);
    expect((await handle.db.select().from(slideModels)).length).toBe(2);
    const size = (name: string, opening: { width: number; height: number; depth: number }) => {
      const { id, updatedAt, ...rule } = models.find((m) => m.name === name)!;
      void updatedAt;
      const sized = sizeDrawerSchedule({
        label: 'Demo',
        quantity: 1,
        size: { from: 'opening', ...opening },
        slide: { type: 'undermount', model: { ...rule, id } },
        thickness: { front: 12, side: 12 },
      });
      if (!sized.ok) throw new Error(JSON.stringify(sized.errors));
      return sized.box;
    };
    // Inside rule: 15″ − 1-5/8″ = 13-3/8″ inside + 2 × 12 mm sides; 22″ − ⅝″ = 21-3/8″ of room takes the 21″ slide.
    expect(size('Halbrook UM-58 full extension', { width: inches(15), height: inches(7), depth: inches(22) })).toMatchObject({
      width: expect.closeTo(inches(13 + 3 / 8) + 24, 9),
      height: expect.closeTo(inches(6.25), 9),
      depth: expect.closeTo(inches(21), 9),
    });
    // Outside rule: 564 − 10 = 554 mm; 540 − 10 = 530 mm of room takes the 500 mm slide.
    expect(size('Tessel T-16 soft close', { width: 564, height: 180, depth: 540 })).toMatchObject({
      width: 554,
      height: 160,
      depth: 500,
    });
  });

  test('is seeded only into an empty database', async () => {
    const again = await seedDemoShop(handle.db);
    expect(again.seeded).toBe(false);
    expect((await handle.db.select().from(shops)).length).toBe(1);
  });

  test('has six months of past jobs for the reports: each plan valid and finished on its day, the ledger matching the counts', async () => {
    const db = handle.db;
    const done = await db.select().from(plans).where(eq(plans.status, 'done'));
    expect(done).toHaveLength(6);
    for (const p of done) expect(validatePlan(nestRequestSchema.parse(p.request), readPlan(p.document)), p.name).toEqual([]);
    // Cut from the rack or bought for each job: the stock room's counts and its ledger agree.
    expect(await ledgerMismatches({ db, shopId: first.shopId })).toEqual([]);
    const months = await yieldOverTime(db, { shopId: first.shopId, timeZone: 'America/Chicago', by: 'month', from: '2026-06-01', to: '2026-11-30' });
    expect([...new Set(months.map((r) => r.period))]).toEqual(['2026-06-01', '2026-07-01', '2026-08-01', '2026-09-01', '2026-10-01', '2026-11-01']);
    // The last job ended at 23:30 on 19 November in Chicago (05:30 UTC on the 20th): the 19th's week, Monday the 16th.
    const weeks = await yieldOverTime(db, { shopId: first.shopId, timeZone: 'America/Chicago', by: 'week', from: '2026-11-01', to: '2026-11-30' });
    expect([...new Set(weeks.map((r) => r.period))]).toEqual(['2026-11-16']);
    expect(months.filter((r) => r.spoiledArea > 0).map((r) => r.period)).toEqual(['2026-08-01']);
    for (const r of months) expect(r.partArea + r.spoiledArea + r.keptArea + r.sawWasteArea).toBeCloseTo(r.stockArea, 3);
    // Finishing wrote each piece's part and damaged area, equal to its placements' (what the reports read).
    const pieces = await db
      .select()
      .from(planPieces)
      .where(
        inArray(
          planPieces.planId,
          done.map((p) => p.id),
        ),
      );
    for (const piece of pieces) {
      const on = await db.select().from(placements).where(eq(placements.planPieceId, piece.id));
      expect(piece.partAreaMm2).toBeCloseTo(
        on.filter((p) => !p.damaged).reduce((n, p) => n + p.length * p.width, 0),
        6,
      );
      expect(piece.spoiledAreaMm2).toBeCloseTo(
        on.filter((p) => p.damaged).reduce((n, p) => n + p.length * p.width, 0),
        6,
      );
    }
    expect(pieces.some((p) => (p.spoiledAreaMm2 ?? 0) > 0)).toBe(true);
    const use = await offcutUse(db, { shopId: first.shopId, timeZone: 'America/Chicago', by: 'month', from: '2026-06-01', to: '2026-11-30' });
    expect(use.reduce((n, r) => n + r.racked, 0)).toBeGreaterThan(0);
    const left = await db.select().from(offcuts).where(eq(offcuts.location, HISTORY_BIN));
    expect(left.filter((o) => o.status === 'available')).toHaveLength(1);
    const old = await oldOffcuts(db, { shopId: first.shopId, timeZone: 'America/Chicago', months: 1, now: new Date('2026-12-03T12:00:00Z') });
    expect(old.map((o) => o.location)).toEqual([HISTORY_BIN]);
    // The rack's opening counts came before the past jobs, so its value never runs below zero in their months.
    const value = await stockValueReport(db, {
      shopId: first.shopId,
      timeZone: 'America/Chicago',
      by: 'month',
      from: '2026-06-01',
      to: '2026-11-30',
    });
    expect(value.points).toHaveLength(6);
    for (const p of value.points) expect(p.onHandCents, p.period).toBeGreaterThan(0);
    // Each past job was won by a quote accepted online with its deposit paid; one more was declined and one ran out.
    const quoting = await quotingReport(db, { shopId: first.shopId, timeZone: 'America/Chicago', by: 'month', from: '2026-06-01', to: '2026-11-30' });
    const sum = (k: 'sent' | 'accepted' | 'declined' | 'expired') => quoting.periods.reduce((n, q) => n + q[k], 0);
    expect([sum('sent'), sum('accepted'), sum('declined'), sum('expired')]).toEqual([8, 6, 1, 1]);
    expect(quoting.jobs).toHaveLength(6);
    for (const j of quoting.jobs) expect(j.usedMaterialMinor, j.jobName).not.toBeNull();
  });
});
