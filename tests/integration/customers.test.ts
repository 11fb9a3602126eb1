import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import * as customersRoute from '@/app/api/customers/route';
import * as customerRoute from '@/app/api/customers/[id]/route';
import * as jobsRoute from '@/app/api/jobs/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import { request } from '../support/fixtures';
import { nextNumber } from '../support/unique';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
useTwoShopDatabase((app) => ({ handle, fx } = app));

const noParams = { params: Promise.resolve({}) };
const idOf = (id: string) => ({ params: Promise.resolve({ id }) });
const call = async (res: Promise<Response>) => {
  const r = await res;
  return { status: r.status, body: await r.json() };
};

describe('customers', () => {
  test('the estimator adds a customer, finds them by name, company, e-mail or phone (any case), and edits them', async () => {
    const tag = `Q${nextNumber()}`;
    const made = await call(
      customersRoute.POST(
        await request('/api/customers', {
          method: 'POST',
          user: fx.estimator,
          body: { name: `Wren ${tag}`, company: `Fennel ${tag} & Co`, email: `wren.${tag}@example.com`, phone: '(555) 010-2233' },
        }),
        noParams,
      ),
    );
    expect(made.status).toBe(201);
    for (const q of [`wren ${tag.toLowerCase()}`, `fennel ${tag}`, `WREN.${tag}@EXAMPLE`]) {
      const found = await call(customersRoute.GET(await request(`/api/customers?q=${encodeURIComponent(q)}`, { user: fx.estimator }), noParams));
      expect(
        found.body.map((c: { id: string }) => c.id),
        q,
      ).toEqual([made.body.id]);
    }
    // LIKE's wildcards are searched for as they are.
    expect((await call(customersRoute.GET(await request('/api/customers?q=%25', { user: fx.estimator }), noParams))).body).toEqual([]);
    const edited = await call(
      customerRoute.PATCH(
        await request(`/api/customers/${made.body.id}`, { method: 'PATCH', user: fx.estimator, body: { siteAddress: '9 Mill Lane' } }),
        idOf(made.body.id),
      ),
    );
    expect(edited.body).toMatchObject({ name: `Wren ${tag}`, siteAddress: '9 Mill Lane', jobCount: 0 });
  });

  test('a bad e-mail or an empty name is refused on its field', async () => {
    const bad = await call(
      customersRoute.POST(
        await request('/api/customers', { method: 'POST', user: fx.estimator, body: { name: ' ', email: 'not an address' } }),
        noParams,
      ),
    );
    expect(bad.status).toBe(422);
    expect(bad.body.fields).toMatchObject({ name: ['Give the customer a name.'], email: ['That does not look like an e-mail address.'] });
  });

  test('a job picks a customer by id, or by name (the existing one, any case, or a new one); the customer lists its jobs and cannot be deleted while it has them', async () => {
    const tag = `J${nextNumber()}`;
    const job = await call(
      jobsRoute.POST(
        await request('/api/jobs', {
          method: 'POST',
          user: fx.estimator,
          body: { name: `Mudroom ${tag}`, customer: { name: `Orla  Quist ${tag}` } },
        }),
        noParams,
      ),
    );
    expect(job.status).toBe(201);
    expect(job.body.customer).toBe(`Orla Quist ${tag}`);
    const again = await call(
      jobsRoute.POST(
        await request('/api/jobs', { method: 'POST', user: fx.estimator, body: { name: `Porch ${tag}`, customer: `orla quist ${tag}` } }),
        noParams,
      ),
    );
    expect(again.body.customerId).toBe(job.body.customerId);
    const customer = await call(
      customerRoute.GET(await request(`/api/customers/${job.body.customerId}`, { user: fx.estimator }), idOf(job.body.customerId)),
    );
    expect(customer.body.jobs.map((j: { name: string }) => j.name).sort()).toEqual([`Mudroom ${tag}`, `Porch ${tag}`]);
    expect(customer.body.jobCount).toBe(2);
    const kept = await call(
      customerRoute.DELETE(
        await request(`/api/customers/${job.body.customerId}`, { method: 'DELETE', user: fx.estimator }),
        idOf(job.body.customerId),
      ),
    );
    expect(kept.status).toBe(409);

    // Another shop's customer cannot be picked.
    const theirs = await call(
      customersRoute.POST(await request('/api/customers', { method: 'POST', user: fx.otherOwner, body: { name: `Theirs ${tag}` } }), noParams),
    );
    const refused = await call(
      jobRoute.PATCH(
        await request(`/api/jobs/${job.body.id}`, { method: 'PATCH', user: fx.estimator, body: { customer: { id: theirs.body.id } } }),
        idOf(job.body.id),
      ),
    );
    expect(refused.status).toBe(422);
    expect(refused.body.fields.customer).toEqual(['Pick one of the shop’s customers.']);
    // Clearing the customer leaves the job without one.
    const cleared = await call(
      jobRoute.PATCH(await request(`/api/jobs/${job.body.id}`, { method: 'PATCH', user: fx.estimator, body: { customer: null } }), idOf(job.body.id)),
    );
    expect(cleared.body).toMatchObject({ customer: '', customerId: null });
  });

  test('the cutter sees no customers', async () => {
    expect((await customersRoute.GET(await request('/api/customers', { user: fx.cutter }), noParams)).status).toBe(403);
  });
});
