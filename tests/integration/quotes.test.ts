import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import * as jobQuotes from '@/app/api/jobs/[id]/quotes/route';
import * as quoteRoute from '@/app/api/quotes/[id]/route';
import * as sendRoute from '@/app/api/quotes/[id]/send/route';
import * as revisionsRoute from '@/app/api/quotes/[id]/revisions/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import * as takeoffRoute from '@/app/api/jobs/[id]/takeoff/route';
import { planTotals } from '@/lib/nesting/figures';
import { DEFAULT_PRICING } from '@/shared/schemas/pricing';
import type { QuoteLine } from '@/shared/schemas/quote';
import { call, jobWithSheet, nestAndSave } from '../support/shop-day';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

const PARTS = [
  { label: 'Side', quantity: 4, length: 720, width: 560 },
  { label: 'Shelf', quantity: 6, length: 760, width: 300 },
];

describe('a quote built from a job and its plan', () => {
  test('material from the takeoff at cost with the spoilage allowance once, saw time from the plan, totals by lib/costing', async () => {
    const { job } = await jobWithSheet(handle.db, fx.mine.id, { parts: PARTS });
    const { id: planId, plan } = await nestAndSave(fx.estimator, job.id);
    const made = await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId } });
    expect(made.status).toBe(201);
    expect(made.body.title).toMatch(/^Q-\d{4} rev A$/);
    const lines: QuoteLine[] = made.body.lines;

    const takeoff = (await call(takeoffRoute.GET, `/api/jobs/${job.id}/takeoff?planId=${planId}`, job.id, fx.estimator)).body;
    const material = lines.filter((l) => l.kind === 'material' && !l.description.startsWith('Spoilage'));
    expect(material.map((l) => [l.quantity, l.unitCostMinor])).toEqual(
      [...takeoff.pull, ...takeoff.buy].map((t: { count: number; costEachCents: number }) => [t.count, t.costEachCents]),
    );
    const allowance = lines.filter((l) => l.description.startsWith('Spoilage'));
    expect(allowance).toHaveLength(1);
    expect(allowance[0].unitCostMinor).toBe(takeoff.totals.allowanceCents);

    // Saw time by hand: cuts × 0.75 min + pieces × 2.5 min, to 0.01 h (the default rates).
    const { cuts, pieces } = planTotals(plan.pieces);
    const saw = lines.find((l) => l.kind === 'labour' && l.description.startsWith('Saw time'))!;
    expect(saw.description).toBe(`Saw time: ${cuts} cuts, ${pieces} stock piece${pieces === 1 ? '' : 's'} handled`);
    expect(saw.quantity).toBeCloseTo(Math.round(((cuts * 0.75 + pieces * 2.5) / 60) * 100) / 100, 10);
    expect(saw.unitCostMinor).toBe(DEFAULT_PRICING.hourlyRateMinor.saw);
    // No drawer schedules: no slides, machining or assembly.
    expect(lines.filter((l) => l.kind === 'hardware' || /Machining|Assembly/.test(l.description))).toEqual([]);

    const t = made.body.totals;
    expect(t.subtotalMinor).toBe(t.lines.reduce((n: number, l: { priceMinor: number }) => n + l.priceMinor, 0));
    expect(t.depositMinor + t.balanceMinor).toBe(t.totalMinor);
    expect(made.body.depositPercent).toBe(50);
  });

  test('numbers run per shop; a draft is edited; sending marks the job quoted; rev B replaces rev A when sent; only the latest is sent', async () => {
    const { job } = await jobWithSheet(handle.db, fx.mine.id, { parts: PARTS, customerEmail: 'ashby@example.com' });
    const first = (await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId: null } })).body;
    const second = (await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId: null } })).body;
    expect(Number(second.number.slice(2))).toBe(Number(first.number.slice(2)) + 1);

    const line: QuoteLine = {
      id: 'o-1',
      kind: 'other',
      description: 'Delivery and install',
      quantity: 1,
      unit: 'trip',
      unitCostMinor: 12500,
      taxable: false,
      note: '',
    };
    const edited = await call(quoteRoute.PATCH, `/api/quotes/${first.id}`, first.id, fx.estimator, {
      method: 'PATCH',
      body: { lines: [line], discount: { kind: 'amount', minor: 500 } },
    });
    expect(edited.status).toBe(200);
    // 125.00 − 5.00 = 120.00; deposit 60.00 (by hand).
    expect(edited.body.totals).toMatchObject({ subtotalMinor: 12500, discountMinor: 500, totalMinor: 12000, depositMinor: 6000, balanceMinor: 6000 });
    const tooMuch = await call(quoteRoute.PATCH, `/api/quotes/${first.id}`, first.id, fx.estimator, {
      method: 'PATCH',
      body: { discount: { kind: 'amount', minor: 99999 } },
    });
    expect(tooMuch.status).toBe(422);
    expect(tooMuch.body.error).toMatch(/more than the subtotal/);

    const sent = await call(sendRoute.POST, `/api/quotes/${first.id}/send`, first.id, fx.estimator, { method: 'POST' });
    expect(sent.body).toMatchObject({ status: 'sent', validUntil: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/) });
    expect((await call(jobRoute.GET, `/api/jobs/${job.id}`, job.id, fx.estimator)).body.status).toBe('quoted');
    expect(
      (await call(quoteRoute.PATCH, `/api/quotes/${first.id}`, first.id, fx.estimator, { method: 'PATCH', body: { taxPercent: 5 } })).status,
    ).toBe(409);

    const revB = await call(revisionsRoute.POST, `/api/quotes/${first.id}/revisions`, first.id, fx.estimator, { method: 'POST' });
    expect(revB.status).toBe(201);
    expect(revB.body).toMatchObject({ revision: 'B', status: 'draft', number: first.number, lines: [line] });
    expect((await call(revisionsRoute.POST, `/api/quotes/${first.id}/revisions`, first.id, fx.estimator, { method: 'POST' })).status).toBe(409);
    expect((await call(sendRoute.POST, `/api/quotes/${first.id}/send`, first.id, fx.estimator, { method: 'POST' })).status).toBe(409);
    expect((await call(sendRoute.POST, `/api/quotes/${revB.body.id}/send`, revB.body.id, fx.estimator, { method: 'POST' })).body.status).toBe('sent');
    expect((await call(quoteRoute.GET, `/api/quotes/${first.id}`, first.id, fx.estimator)).body).toMatchObject({ status: 'replaced', latest: false });
    expect((await call(jobRoute.GET, `/api/jobs/${job.id}`, job.id, fx.estimator)).body.status).toBe('quoted');
  });

  test('a quote with no lines cannot be sent; a cutter cannot read a quote', async () => {
    const { job } = await jobWithSheet(handle.db, fx.mine.id, { parts: PARTS });
    const q = (await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId: null } })).body;
    expect(q.lines).toEqual([]);
    expect((await call(sendRoute.POST, `/api/quotes/${q.id}/send`, q.id, fx.estimator, { method: 'POST' })).status).toBe(422);
    expect((await call(quoteRoute.GET, `/api/quotes/${q.id}`, q.id, fx.cutter)).status).toBe(403);
  });
});

describe('hardware and labour from the drawer schedules', () => {
  test('slides as pairs by length (two banks of one length make one line), boxes, corners and setup cards counted', async () => {
    const schedulesRoute = await import('@/app/api/jobs/[id]/drawer-schedules/route');
    const hardwareRoute = await import('@/app/api/settings/hardware/route');
    const { inches } = await import('@/lib/units/length');
    const { job } = await jobWithSheet(handle.db, fx.mine.id, { parts: PARTS });
    const bank = (label: string, quantity: number, from: 'opening' | 'box') => ({
      label,
      quantity,
      size: { from, width: inches(15), height: inches(6), depth: inches(22.5) },
      slide: { type: 'side-mount', series: 'imperial' },
      joint: { method: 'lock-rabbet' },
      thickness: { front: inches(0.5), side: inches(0.5) },
    });
    for (const [label, n, from] of [
      ['Kitchen bank', 3, 'opening'],
      ['Island bank', 2, 'opening'],
      ['Loose box', 1, 'box'],
    ] as const) {
      const res = await call(schedulesRoute.POST, `/api/jobs/${job.id}/drawer-schedules`, job.id, fx.estimator, {
        method: 'POST',
        body: bank(label, n, from),
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    const made = await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId: null } });
    const lines: QuoteLine[] = made.body.lines;
    const slides = lines.filter((l) => l.kind === 'hardware');
    // The two banks from an opening ride one slide length; the box-sized one names no slide.
    expect(slides).toHaveLength(1);
    expect(slides[0]).toMatchObject({ quantity: 5, unit: 'pair' });
    expect(slides[0].description).toMatch(/^Side-mount slides, \d+″$/);
    // By hand with the default minutes: 6 boxes × 12 min = 72 min = 1.20 h; one setup card (½″ stock throughout)
    // × 20 min + 6 × 4 corners × 1.5 min = 56 min → 0.93 h.
    expect(lines.find((l) => l.description.startsWith('Assembly'))).toMatchObject({ description: 'Assembly: 6 drawer boxes', quantity: 1.2 });
    expect(lines.find((l) => l.description.startsWith('Machining'))).toMatchObject({
      description: 'Machining: 1 setup, 24 joint corners',
      quantity: 0.93,
    });

    // With the slide on the price list, a new quote prices it from there.
    const name = `Side-mount slides, ${slides[0].description.split(', ')[1]}, zinc`;
    expect(
      (await call(hardwareRoute.POST, '/api/settings/hardware', '', fx.owner, { method: 'POST', body: { name, unit: 'pair', priceMinor: 1595 } }))
        .status,
    ).toBe(201);
    const again = (await call(jobQuotes.POST, `/api/jobs/${job.id}/quotes`, job.id, fx.estimator, { method: 'POST', body: { planId: null } })).body;
    expect(again.lines.find((l: QuoteLine) => l.kind === 'hardware')).toMatchObject({ description: name, unitCostMinor: 1595, quantity: 5 });
  });
});
