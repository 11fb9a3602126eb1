import { customers } from '@/db/schema';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

const freshCustomer = async ({ db, mine }: AuthzFixtures) => {
  const [c] = await db
    .insert(customers)
    .values({ shopId: mine.id, name: `Matrix customer ${nextNumber()}` })
    .returning();
  return { id: c.id };
};

// Customers are the office's: owner and estimator; the cutter never sees them.
const office = (ok: number) => ({ anonymous: 401, owner: ok, estimator: ok, cutter: 403, other: 404 });

export const rows: AuthzRow[] = [
  { route: '/api/customers', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 200 } },
  {
    route: '/api/customers',
    method: 'POST',
    body: { name: 'Matrix customer' },
    expect: { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 201 },
  },
  { route: '/api/customers/[id]', method: 'GET', target: freshCustomer, expect: office(200) },
  { route: '/api/customers/[id]', method: 'PATCH', target: freshCustomer, body: { phone: '(555) 010-0000' }, expect: office(200) },
  { route: '/api/customers/[id]', method: 'DELETE', target: freshCustomer, expect: office(200) },
];
