import { eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { auditEvents, users } from '@/db/schema';
import * as jobsRoute from '@/app/api/jobs/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import * as teamMemberRoute from '@/app/api/team/[id]/route';
import * as settingsRoute from '@/app/api/settings/route';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request } from '../support/fixtures';

let handle: DbHandle;
let fx: TwoShops;
const noParams = { params: Promise.resolve({}) };
const withId = (id: string) => ({ params: Promise.resolve({ id }) });

setUpTwoShopDatabase((app) => ({ handle, fx } = app));

describe('every shop is a tenant', () => {
  test("a shop's job list never shows another shop's jobs", async () => {
    const mine = (await (await jobsRoute.GET(await request('/api/jobs?status=all&size=100', { user: fx.owner }), noParams)).json()).jobs;
    const theirs = (await (await jobsRoute.GET(await request('/api/jobs?status=all&size=100', { user: fx.otherOwner }), noParams)).json()).jobs;
    expect(mine.map((j: { name: string }) => j.name)).toContain('Birchwood pantry');
    expect(mine.map((j: { name: string }) => j.name)).not.toContain('Elm Street library');
    expect(theirs.map((j: { name: string }) => j.name)).toEqual(['Elm Street library']);
  });

  test("another shop's job id is a 404, the same as a missing one, and it is left unchanged", async () => {
    const res = await jobRoute.PATCH(
      await request(`/api/jobs/${fx.theirJob.id}`, { method: 'PATCH', body: { name: 'Taken over' }, user: fx.owner }),
      withId(fx.theirJob.id),
    );
    expect(res.status).toBe(404);
    const still = await (await jobRoute.GET(await request(`/api/jobs/${fx.theirJob.id}`, { user: fx.otherOwner }), withId(fx.theirJob.id))).json();
    expect(still.name).toBe('Elm Street library');
  });

  test('a malformed id is a 404, not a server error', async () => {
    const res = await jobRoute.GET(await request('/api/jobs/not-a-uuid', { user: fx.owner }), withId('not-a-uuid'));
    expect(res.status).toBe(404);
  });
});

describe('bad input', () => {
  test('gets a 422 with a message on each bad field, and nothing is written', async () => {
    const before = (await (await jobsRoute.GET(await request('/api/jobs?status=all', { user: fx.owner }), noParams)).json()).total;
    const res = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', body: { name: '', dueDate: '31/01/2027' }, user: fx.owner }),
      noParams,
    );
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.fields.name).toEqual(['Give the job a name.']);
    expect(body.fields.dueDate).toEqual(['Use a date like 2027-01-31.']);
    const after = (await (await jobsRoute.GET(await request('/api/jobs?status=all', { user: fx.owner }), noParams)).json()).total;
    expect(after).toBe(before);
  });

  test('a body that is not JSON gets a 422 saying so', async () => {
    const res = await jobsRoute.POST(await request('/api/jobs', { method: 'POST', rawBody: '{"name": ', user: fx.owner }), noParams);
    expect(res.status).toBe(422);
    expect((await res.json()).error).toMatch(/not valid JSON/);
  });

  test('settings saved with nothing changed answer the settings as they are, and write no audit entry', async () => {
    const before = await (await settingsRoute.GET(await request('/api/settings', { user: fx.owner }), noParams)).json();
    const audits = async () =>
      (await handle.db.select().from(auditEvents)).filter((e) => e.entity === 'shop-settings' && e.shopId === fx.mine.id).length;
    const logged = await audits();
    const res = await settingsRoute.PATCH(await request('/api/settings', { method: 'PATCH', body: {}, user: fx.owner }), noParams);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual(before);
    expect(await audits()).toBe(logged);
  });

  test('settings refuse a zero kerf with the reason', async () => {
    const res = await settingsRoute.PATCH(await request('/api/settings', { method: 'PATCH', body: { kerf: 0 }, user: fx.owner }), noParams);
    expect(res.status).toBe(422);
    expect((await res.json()).fields.kerf).toEqual(['Kerf must be more than zero.']);
  });
});

describe('role changes take effect on the next request', () => {
  test('a demoted estimator keeps nothing: their old session is refused, and the change is audited', async () => {
    const [victim] = await handle.db
      .insert(users)
      .values({ shopId: fx.mine.id, email: 'temp.est@birchwood.example', name: 'Temp Estimator', role: 'estimator', passwordHash: 'x' })
      .returning();
    const session = { id: victim.id, shopId: victim.shopId, role: victim.role, tokenVersion: victim.tokenVersion };
    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(200);

    const res = await teamMemberRoute.PATCH(
      await request(`/api/team/${victim.id}`, { method: 'PATCH', body: { role: 'cutter' }, user: fx.owner }),
      withId(victim.id),
    );
    expect(res.status).toBe(200);
    expect((await res.json()).role).toBe('cutter');

    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(401);
    const audit = await handle.db.select().from(auditEvents).where(eq(auditEvents.entityId, victim.id));
    expect(audit.map((a) => a.action)).toContain('update');
  });

  test('the last active owner cannot be demoted or deactivated', async () => {
    for (const body of [{ role: 'estimator' }, { active: false }]) {
      const res = await teamMemberRoute.PATCH(
        await request(`/api/team/${fx.owner.id}`, { method: 'PATCH', body, user: fx.owner }),
        withId(fx.owner.id),
      );
      expect(res.status).toBe(409);
      expect((await res.json()).error).toMatch(/at least one active owner/);
    }
    const [owner] = await handle.db.select().from(users).where(eq(users.id, fx.owner.id));
    expect(owner.role).toBe('owner');
    expect(owner.active).toBe(true);
  });
});
