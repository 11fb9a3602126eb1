/**
 * The quoting report against figures worked by hand from the rows seeded here (a shop on UTC, by month).
 */
import { eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { plans, quotePayments, quoteRevisions } from '@/db/schema';
import * as quotingRoute from '@/app/api/reports/quoting/route';
import { quotingReport } from '@/db/queries/quoting-report';
import { request } from '../support/fixtures';
import { jobWithDraftQuote } from '../support/quote-fixture';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
useTwoShopDatabase((app) => ({ handle, fx } = app));

const at = (iso: string) => new Date(`${iso}Z`);

async function quote(shopId: string, set: Partial<typeof quoteRevisions.$inferInsert>, lines?: Parameters<typeof jobWithDraftQuote>[2]) {
  const made = await jobWithDraftQuote(handle.db, shopId, lines);
  await handle.db.update(quoteRevisions).set(set).where(eq(quoteRevisions.id, made.revision.id));
  return made;
}

describe('the quoting report', () => {
  test('counts sent, accepted, declined and expired per month, the value won and the deposits, and material quoted against used', async () => {
    const shop = fx.mine.id;
    await quote(shop, { status: 'declined', sentAt: at('2026-10-05T10:00:00'), validUntil: '2026-11-04', answeredAt: at('2026-10-07T16:00:00') });
    const won = await quote(
      shop,
      {
        status: 'accepted',
        sentAt: at('2026-10-20T09:00:00'),
        validUntil: '2026-11-19',
        answeredAt: at('2026-11-02T18:30:00'),
        acceptedName: 'Lena Marsh',
      },
      [
        { id: 'm-1', kind: 'material', description: 'Maple ply ¾″', quantity: 2, unit: 'sheet', unitCostMinor: 2000, taxable: false, note: '' },
        { id: 'o-1', kind: 'other', description: 'Delivery', quantity: 1, unit: 'trip', unitCostMinor: 7500, taxable: false, note: '' },
      ],
    );
    await quote(shop, { status: 'expired', sentAt: at('2026-11-10T09:00:00'), validUntil: '2026-11-20' });
    await quote(shop, { status: 'sent', sentAt: at('2026-11-25T09:00:00'), validUntil: '2026-12-25' });
    // Another shop's quote in the same months counts for that shop only.
    await quote(fx.theirs.id, {
      status: 'accepted',
      sentAt: at('2026-11-01T09:00:00'),
      validUntil: '2026-12-01',
      answeredAt: at('2026-11-03T09:00:00'),
    });
    // By hand: material 2 × 20.00 = 40.00, +30 % = 52.00; delivery 75.00; total 127.00; deposit 50 % = 63.50.
    await handle.db
      .insert(quotePayments)
      .values({
        shopId: shop,
        revisionId: won.revision.id,
        jobId: won.job.id,
        checkoutSessionId: `cs_test_report_${won.revision.id}`,
        amountMinor: 6350,
        currency: 'USD',
        status: 'paid',
        paidAt: at('2026-11-03T12:00:00'),
      });
    await handle.db
      .insert(plans)
      .values({
        shopId: shop,
        jobId: won.job.id,
        name: 'Cut',
        status: 'done',
        request: {},
        document: {},
        costCents: 5000,
        finishedAt: at('2026-11-20T15:00:00'),
      } as typeof plans.$inferInsert);

    const report = await quotingReport(handle.db, { shopId: shop, timeZone: 'UTC', by: 'month', from: '2026-10-01', to: '2026-11-30' });
    expect(report.periods).toEqual([
      { period: '2026-10-01', sent: 2, accepted: 0, declined: 1, expired: 0, wonMinor: 0, depositsMinor: 0 },
      // The expired quote ran out at the start of 2026-11-21, the day after its last valid day.
      { period: '2026-11-01', sent: 2, accepted: 1, declined: 0, expired: 1, wonMinor: 12700, depositsMinor: 6350 },
    ]);
    expect(report.jobs).toEqual([
      {
        jobId: won.job.id,
        jobName: won.job.name,
        title: expect.stringMatching(/^Q-\d+ rev A$/),
        acceptedOn: '2026-11-02',
        quotedMaterialMinor: 4000,
        usedMaterialMinor: 5000,
        finishedPlans: 1,
      },
    ]);

    // One customer's work only: the won job's quote, sent in October, accepted and paid in November.
    const theirs = await quotingReport(handle.db, {
      shopId: shop,
      timeZone: 'UTC',
      by: 'month',
      from: '2026-10-01',
      to: '2026-11-30',
      customerId: won.customer.id,
    });
    expect(theirs.periods).toEqual([
      { period: '2026-10-01', sent: 1, accepted: 0, declined: 0, expired: 0, wonMinor: 0, depositsMinor: 0 },
      { period: '2026-11-01', sent: 0, accepted: 1, declined: 0, expired: 0, wonMinor: 12700, depositsMinor: 6350 },
    ]);
    expect(
      (await quotingReport(handle.db, { shopId: shop, timeZone: 'UTC', by: 'month', from: '2026-10-01', to: '2026-11-30', jobId: fx.myJob.id }))
        .periods,
    ).toEqual([]);

    // The CSV carries the same figures, won as a share of those answered or run out (1 of 2 = 50 % in November: one accepted, one expired).
    const res = await quotingRoute.GET(await request('/api/reports/quoting?from=2026-10-01&to=2026-11-30', { user: fx.estimator }), {
      params: Promise.resolve({}),
    });
    const csv = (await res.text())
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(csv).toEqual([
      'Period from,Sent,Accepted,Declined,Expired,Won (%),Value won (USD),Deposits collected (USD)',
      '2026-10-01,2,0,1,0,0.0,0.00,0.00',
      '2026-11-01,2,1,0,1,50.0,127.00,63.50',
    ]);
  });
});
