import { hardwareItems } from '@/db/schema';
import { DEFAULT_PRICING } from '@/shared/schemas/pricing';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

const ITEM = () => ({ name: `Matrix hinge ${nextNumber()}`, unit: 'each', priceMinor: 450 });
const freshItem = async ({ db, mine }: AuthzFixtures) => {
  const [h] = await db
    .insert(hardwareItems)
    .values({ shopId: mine.id, ...ITEM() })
    .returning();
  return { id: h.id };
};

// Prices: owner and estimator read them, the cutter never; the owner alone changes them.
const ownerWrites = { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 };

export const rows: AuthzRow[] = [
  { route: '/api/settings/pricing', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 200 } },
  {
    route: '/api/settings/pricing',
    method: 'PUT',
    body: DEFAULT_PRICING,
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 },
  },
  { route: '/api/settings/hardware', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 200 } },
  {
    route: '/api/settings/hardware',
    method: 'POST',
    get body() {
      return ITEM();
    },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 403, other: 201 },
  },
  {
    route: '/api/settings/hardware/[id]',
    method: 'PUT',
    target: freshItem,
    get body() {
      return ITEM();
    },
    expect: ownerWrites,
  },
  { route: '/api/settings/hardware/[id]', method: 'DELETE', target: freshItem, expect: ownerWrites },
];
