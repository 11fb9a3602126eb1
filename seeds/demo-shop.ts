import bcrypt from 'bcryptjs';
import type { Db } from '@/db/open';
import { buildNestRequest } from '@/db/queries/nest-request';
import { releasePlan } from '@/db/queries/plan-lifecycle';
import { recordOpeningCounts } from '@/db/queries/stock';
import { customers, hardwareItems, jobs, offcuts, parts, plans, saws, shops, slideModels, stockItems, suppliers, users } from '@/db/schema';
import { sawSchema, type SawInput } from '@/shared/schemas/saw';
import { slideModelSchema, type SlideModelInput } from '@/shared/schemas/slide-model';
import { optimize } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { inches } from '@/lib/units/length';
import { seedDemoHistory } from './demo-history';

/**
 * An invented shop for trying Kerfwise: Larkspur Cabinet Works, a four-person shop building kitchens, vanities
 * and built-ins. Names, customers and stock are made up.
 */
export const DEMO_PASSWORD = 'larkspur-demo';

export const DEMO_PEOPLE = [
  { name: 'Maren Okafor', email: 'maren@larkspur.example', role: 'owner' },
  { name: 'Teodor Vance', email: 'teo@larkspur.example', role: 'estimator' },
  { name: 'Ines Halvorsen', email: 'ines@larkspur.example', role: 'cutter' },
] as const;

/**
 * The demo shop's saws: a 10″ cabinet saw with a 30″ (762 mm) rip capacity and a 24″ crosscut sled, used for 3 stages
 * of cuts rips first, and a track saw on a 110″ rail for breaking full sheets down. Figures are invented, in the
 * range such saws have (common practice, no source); a real shop copies its own from the saw's manual.
 */
export const DEMO_SAWS: SawInput[] = [
  {
    kind: 'table-saw',
    name: 'Cabinet saw',
    kerf: inches(1 / 8),
    ripCapacity: inches(30),
    crosscutCapacity: inches(24),
    maxStages: 3,
    firstStage: 'rip',
    minFenceWidth: inches(1),
  },
  {
    kind: 'track-saw',
    name: 'Track saw',
    kerf: inches(3 / 32),
    crosscutCapacity: inches(110),
    maxStages: null,
    firstStage: 'rip',
    minFenceWidth: 0,
  },
];

/**
 * Two undermount slides the demo shop hangs drawers on. The makers, model names and figures are invented, written the
 * two ways slide makers give them: an inside width (opening − 1-5/8″, for sides up to ⅝″) and an outside width
 * (opening − 10 mm, for sides up to 16 mm).
 */
export const DEMO_SLIDE_MODELS: SlideModelInput[] = [
  {
    kind: 'undermount',
    name: 'Halbrook UM-58 full extension',
    lengths: [12, 15, 18, 21].map(inches),
    widthRule: 'inside',
    widthDeduction: inches(1 + 5 / 8),
    maxSideThickness: inches(5 / 8),
    bottomRecess: inches(1 / 2),
    heightClearance: inches(3 / 4),
    rearClearance: inches(5 / 8),
  },
  {
    kind: 'undermount',
    name: 'Tessel T-16 soft close',
    lengths: [250, 300, 350, 400, 450, 500, 550],
    widthRule: 'outside',
    widthDeduction: 10,
    maxSideThickness: 16,
    bottomRecess: 13,
    heightClearance: 20,
    rearClearance: 10,
  },
];

// A US shop buys 4 × 8 ft sheets; Baltic birch comes metric (1525 mm square) and shows as ≈60″.
const SHEET = { l: inches(96), w: inches(48) };

export async function seedDemoShop(db: Db): Promise<{ seeded: boolean; shopId: string }> {
  const existing = await db.select({ id: shops.id }).from(shops).limit(1);
  if (existing.length) return { seeded: false, shopId: existing[0].id };

  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  return db
    .transaction(async (tx) => {
      const [shop] = await tx
        .insert(shops)
        .values({
          name: 'Larkspur Cabinet Works',
          units: { system: 'imperial', precision: 16, feet: false },
          currency: 'USD',
          kerf: inches(1 / 8),
          edgeTrim: 6,
          minOffcutLength: inches(12),
          minOffcutWidth: inches(4),
          wastePercent: 15,
          timeZone: 'America/Chicago',
          offcutAgeMonths: 3,
          purchaseOrderDetails: '412 Foundry Lane, Larkspur\nDeliveries to the back dock, 7 am to 3 pm',
        })
        .returning({ id: shops.id });
      const shopId = shop.id;

      const people = await tx
        .insert(users)
        .values(DEMO_PEOPLE.map((p) => ({ ...p, shopId, passwordHash })))
        .returning({ id: users.id, role: users.role });
      const estimator = people.find((p) => p.role === 'estimator')!.id;

      await tx.insert(stockItems).values([
        {
          shopId,
          kind: 'sheet',
          material: 'Baltic birch',
          nominalThickness: '1/2"',
          thickness: 12,
          length: 1525,
          width: 1525,
          grain: 'along-length',
          onHand: 14,
          lowStockAt: 4,
          costCents: 6850,
          supplier: 'Cedar Run Plywood',
          location: 'Rack A2',
          buyable: true,
        },
        {
          shopId,
          kind: 'sheet',
          material: 'Baltic birch',
          nominalThickness: '1/4"',
          thickness: 6,
          length: 1525,
          width: 1525,
          grain: 'along-length',
          onHand: 10,
          lowStockAt: 3,
          costCents: 3900,
          supplier: 'Cedar Run Plywood',
          location: 'Rack A1',
          buyable: true,
        },
        {
          shopId,
          kind: 'sheet',
          material: 'Baltic birch',
          nominalThickness: '3/4"',
          thickness: 18,
          length: 1525,
          width: 1525,
          grain: 'along-length',
          onHand: 8,
          lowStockAt: 3,
          costCents: 8900,
          supplier: 'Cedar Run Plywood',
          location: 'Rack A3',
          buyable: true,
        },
        {
          shopId,
          kind: 'sheet',
          material: 'Maple ply',
          nominalThickness: '3/4"',
          thickness: inches(23 / 32),
          length: SHEET.l,
          width: SHEET.w,
          grain: 'along-length',
          onHand: 22,
          lowStockAt: 6,
          costCents: 9400,
          supplier: 'Cedar Run Plywood',
          location: 'Rack B1',
          buyable: true,
        },
        {
          shopId,
          kind: 'sheet',
          material: 'Maple ply',
          nominalThickness: '1/4"',
          thickness: 6,
          length: SHEET.l,
          width: SHEET.w,
          grain: 'along-length',
          onHand: 9,
          lowStockAt: 3,
          costCents: 4200,
          supplier: 'Cedar Run Plywood',
          location: 'Rack B4',
          buyable: true,
        },
        {
          shopId,
          kind: 'sheet',
          material: 'MDF',
          nominalThickness: '3/4"',
          thickness: 18,
          length: SHEET.l,
          width: SHEET.w,
          grain: 'none',
          onHand: 5,
          lowStockAt: 2,
          costCents: 4600,
          supplier: 'Hollow Creek Supply',
          location: 'Rack C1',
          buyable: true,
        },
        {
          shopId,
          kind: 'board',
          material: 'White oak',
          nominalThickness: '4/4',
          thickness: inches(13 / 16),
          length: inches(96),
          width: inches(6.5),
          grain: 'along-length',
          surfacing: 'S2S',
          grade: 'FAS',
          onHand: 30,
          lowStockAt: 10,
          costCents: 925,
          supplier: 'Millbrook Hardwoods',
          location: 'Lumber rack 1',
          buyable: true,
        },
        {
          shopId,
          kind: 'board',
          material: 'Hard maple',
          nominalThickness: '4/4',
          thickness: inches(13 / 16),
          length: inches(96),
          width: inches(5.5),
          grain: 'along-length',
          surfacing: 'S2S',
          grade: '1 Common',
          onHand: 18,
          lowStockAt: 8,
          costCents: 640,
          supplier: 'Millbrook Hardwoods',
          location: 'Lumber rack 2',
          buyable: true,
        },
      ]);
      // The suppliers' order desks (invented addresses), so a purchase order knows where to go; Hollow Creek has none
      // on file yet, and its first order asks for one.
      await tx.insert(suppliers).values([
        { shopId, name: 'Cedar Run Plywood', email: 'orders@cedarrun.example' },
        { shopId, name: 'Millbrook Hardwoods', email: 'sales@millbrook.example' },
      ]);
      await tx.insert(offcuts).values([
        { shopId, material: 'Baltic birch', thickness: 12, length: inches(30), width: inches(16), location: 'Offcut bin 1', costCents: 900 },
        {
          shopId,
          material: 'Maple ply',
          thickness: inches(23 / 32),
          length: inches(46.5),
          width: inches(15),
          location: 'Offcut bin 2',
          costCents: 1100,
        },
        {
          shopId,
          material: 'Maple ply',
          thickness: inches(23 / 32),
          length: inches(25.25),
          width: inches(23.25),
          location: 'Offcut bin 2',
          costCents: 800,
        },
      ]);

      await tx.insert(hardwareItems).values([
        { shopId, name: 'Side-mount slides, 18″, full extension', unit: 'pair', priceMinor: 1495 },
        { shopId, name: 'Side-mount slides, 20″, full extension', unit: 'pair', priceMinor: 1650 },
        { shopId, name: 'Side-mount slides, 22″, full extension', unit: 'pair', priceMinor: 1795 },
        { shopId, name: 'Hinge, 110° soft-close', unit: 'each', priceMinor: 475 },
        { shopId, name: 'Pull, 128 mm, brushed steel', unit: 'each', priceMinor: 385 },
        { shopId, name: 'Confirmat screws, box of 100', unit: 'box', priceMinor: 1290 },
      ]);

      await tx.insert(slideModels).values(DEMO_SLIDE_MODELS.map((m) => ({ shopId, ...slideModelSchema.parse(m) })));
      await tx.insert(saws).values(DEMO_SAWS.map((m, position) => ({ shopId, ...sawSchema.parse(m), position })));

      const [hollis, pemberton, arden] = await tx
        .insert(customers)
        .values([
          {
            shopId,
            name: 'Priya & Sam Hollis',
            email: 'hollis.family@example.com',
            phone: '(555) 014-2231',
            billingAddress: '18 Larch Row, Millbrook',
            siteAddress: '18 Larch Row, Millbrook',
          },
          {
            shopId,
            name: 'Gail Pemberton',
            email: 'gail.pemberton@example.com',
            phone: '(555) 014-8870',
            billingAddress: '4 Quarry Lane, Millbrook',
            siteAddress: '4 Quarry Lane, Millbrook',
          },
          {
            shopId,
            name: 'Arden Books',
            company: 'Arden Books Ltd',
            email: 'shop@arden-books.example.com',
            phone: '(555) 014-5090',
            billingAddress: '221 High Street, Millbrook',
            siteAddress: '221 High Street, Millbrook',
            notes: 'Deliveries before 10 am, by the back door.',
          },
        ])
        .returning({ id: customers.id });

      const [kitchen, vanity] = await tx
        .insert(jobs)
        .values([
          {
            shopId,
            name: 'Hollis kitchen',
            customerId: hollis.id,
            status: 'accepted',
            acceptedAt: new Date('2026-11-02T15:00:00Z'),
            dueDate: '2027-01-22',
            notes: 'Maple ply carcasses, Baltic birch drawer boxes, full-extension side-mount slides.',
            createdBy: estimator,
          },
          {
            shopId,
            name: 'Pemberton vanity',
            customerId: pemberton.id,
            status: 'quoting',
            dueDate: '2027-02-05',
            notes: 'Floating vanity, two drawers, white oak face frame.',
            createdBy: estimator,
          },
          {
            shopId,
            name: 'Arden Books wall units',
            customerId: arden.id,
            status: 'quoting',
            dueDate: null,
            notes: 'Six open bookcases, MDF painted.',
            createdBy: estimator,
          },
        ])
        .returning({ id: jobs.id });

      const ply = { material: 'Maple ply', thickness: inches(23 / 32) };
      await tx.insert(parts).values([
        {
          shopId,
          jobId: kitchen.id,
          label: 'Base side',
          quantity: 8,
          length: inches(34.5),
          width: inches(23),
          ...ply,
          grain: 'along-length',
          sort: 1,
        },
        {
          shopId,
          jobId: kitchen.id,
          label: 'Base bottom',
          quantity: 4,
          length: inches(34),
          width: inches(23),
          ...ply,
          grain: 'along-length',
          sort: 2,
        },
        { shopId, jobId: kitchen.id, label: 'Stretcher', quantity: 8, length: inches(34), width: inches(4), ...ply, grain: 'any', sort: 3 },
        {
          shopId,
          jobId: kitchen.id,
          label: 'Back',
          quantity: 4,
          length: inches(34.5),
          width: inches(34),
          material: 'Maple ply',
          thickness: 6,
          grain: 'any',
          sort: 4,
        },
        {
          shopId,
          jobId: vanity.id,
          label: 'Vanity side',
          quantity: 2,
          length: inches(21),
          width: inches(18),
          ...ply,
          grain: 'along-length',
          sort: 1,
        },
        {
          shopId,
          jobId: vanity.id,
          label: 'Face frame stile',
          quantity: 2,
          length: inches(21),
          width: inches(1.5),
          material: 'White oak',
          thickness: inches(13 / 16),
          grain: 'along-length',
          sort: 2,
        },
        {
          shopId,
          jobId: vanity.id,
          label: 'Face frame rail',
          quantity: 3,
          length: inches(33),
          width: inches(1.5),
          material: 'White oak',
          thickness: inches(13 / 16),
          grain: 'along-length',
          sort: 3,
        },
      ]);
      const cutter = people.find((p) => p.role === 'cutter')!.id;
      return { seeded: true, shopId, kitchenJobId: kitchen.id, estimatorId: estimator, cutterId: cutter };
    })
    .then(async (result) => {
      if (result.seeded) {
        await seedReleasedPlan(db, result.shopId, result.kitchenJobId, result.estimatorId);
        await seedDemoHistory(db, { shopId: result.shopId, estimatorId: result.estimatorId, cutterId: result.cutterId });
      }
      return { seeded: true, shopId: result.shopId };
    });
}

/**
 * The kitchen's carcass plan, nested by the real engine (no time budget, so the same plan every time) and
 * released through the stock room's own release, so its sheets and offcuts are reserved exactly as a person's
 * release would reserve them. The rack's opening counts go into the ledger first.
 */
async function seedReleasedPlan(db: Db, shopId: string, jobId: string, userId: string) {
  // A size running low, so the stock room has a marker to show.
  await db.insert(stockItems).values({
    shopId,
    kind: 'sheet',
    material: 'MDF',
    nominalThickness: '1/2"',
    thickness: 12,
    length: SHEET.l,
    width: SHEET.w,
    grain: 'none',
    onHand: 2,
    lowStockAt: 3,
    costCents: 3400,
    supplier: 'Hollow Creek Supply',
    location: 'Rack C2',
    buyable: true,
  });
  await recordOpeningCounts({ db, shopId, userId: null });
  const request = nestRequestSchema.parse(await buildNestRequest({ db, shopId }, jobId, { timeBudgetMs: 0 }));
  const plan = await optimize(request);
  const [row] = await db
    .insert(plans)
    .values({
      shopId,
      jobId,
      name: 'Carcasses and backs',
      status: 'draft',
      version: plan.version,
      request,
      document: plan,
      yieldRatio: plan.totals?.yield ?? null,
      costCents: Math.round(plan.totals?.cost ?? 0),
      createdBy: userId,
    })
    .returning({ id: plans.id });
  await releasePlan({ db, shopId, userId }, row.id);
}
