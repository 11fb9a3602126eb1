import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import * as pricingRoute from '@/app/api/settings/pricing/route';
import * as hardwareRoute from '@/app/api/settings/hardware/route';
import { DEFAULT_PRICING } from '@/shared/schemas/pricing';
import { request } from '../support/fixtures';
import { nextNumber } from '../support/unique';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
useTwoShopDatabase((app) => ({ handle, fx } = app));
const noParams = { params: Promise.resolve({}) };

describe('pricing settings', () => {
  test('a new shop starts from the defaults; the owner changes them and the estimator reads the change; the other shop keeps its own', async () => {
    const before = await (await pricingRoute.GET(await request('/api/settings/pricing', { user: fx.estimator }), noParams)).json();
    expect(before).toMatchObject({ currency: expect.any(String), pricing: { depositPercent: 50, offcutValuation: 'area-cost' } });
    const changed = { ...DEFAULT_PRICING, taxPercent: 8.25, finishingMinutesPerM2: 9, offcutValuation: 'free' };
    expect((await pricingRoute.PUT(await request('/api/settings/pricing', { method: 'PUT', user: fx.owner, body: changed }), noParams)).status).toBe(
      200,
    );
    expect((await (await pricingRoute.GET(await request('/api/settings/pricing', { user: fx.estimator }), noParams)).json()).pricing).toEqual(
      changed,
    );
    expect(
      (await (await pricingRoute.GET(await request('/api/settings/pricing', { user: fx.otherOwner }), noParams)).json()).pricing.taxPercent,
    ).toBe(0);
  });

  test('a bad figure is refused on its field and nothing changes', async () => {
    const res = await pricingRoute.PUT(
      await request('/api/settings/pricing', { method: 'PUT', user: fx.owner, body: { ...DEFAULT_PRICING, depositPercent: 150, minutesPerCut: -1 } }),
      noParams,
    );
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.fields).toMatchObject({
      depositPercent: ['The deposit over 100 % looks like a typo.'],
      minutesPerCut: ['Minutes per cut cannot be negative.'],
    });
  });

  test('the hardware price list keeps one item per name', async () => {
    const item = { name: `Hinge ${nextNumber()}`, unit: 'each', priceMinor: 475 };
    expect((await hardwareRoute.POST(await request('/api/settings/hardware', { method: 'POST', user: fx.owner, body: item }), noParams)).status).toBe(
      201,
    );
    const again = await hardwareRoute.POST(await request('/api/settings/hardware', { method: 'POST', user: fx.owner, body: item }), noParams);
    expect(again.status).toBe(409);
    const list = await (await hardwareRoute.GET(await request('/api/settings/hardware', { user: fx.estimator }), noParams)).json();
    expect(list.filter((h: { name: string }) => h.name === item.name)).toHaveLength(1);
    expect(
      (
        await hardwareRoute.POST(
          await request('/api/settings/hardware', { method: 'POST', user: fx.owner, body: { ...item, name: 'Pull', priceMinor: 3.5 } }),
          noParams,
        )
      ).status,
    ).toBe(422);
  });
});
