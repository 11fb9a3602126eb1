import { and, eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { auditEvents, customers, jobs, parts, plans } from '@/db/schema';
import * as jobsRoute from '@/app/api/jobs/route';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { cancel, call, deleteJob, editJob, finish, jobStatus, jobWithSheet, nestAndSave, release, tick } from '../support/shop-day';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

// A shop's job, as the trade runs it (common practice, no source): quoted, accepted, cut, done, filed away.
const cabinet = [
  { label: 'Side', quantity: 2, length: 720, width: 560 },
  { label: 'Shelf', quantity: 2, length: 560, width: 300, grain: 'any' as const },
];

const job = (values: Parameters<typeof jobWithSheet>[2] = { parts: cabinet }) => jobWithSheet(db, fx.mine.id, values);

describe('a job’s status follows its plans', () => {
  test('quoting → marked accepted by the estimator → cutting at release → done when its plan is finished → archived', async () => {
    const { job: j } = await job();
    expect(await jobStatus(fx.estimator, j.id)).toBe('quoting');
    expect((await editJob(fx.estimator, j.id, { status: 'accepted' })).body).toMatchObject({ status: 'accepted', acceptedAt: expect.any(String) });

    const { id: planId } = await nestAndSave(fx.estimator, j.id);
    expect(await jobStatus(fx.estimator, j.id)).toBe('accepted');
    expect((await release(fx.estimator, planId)).body.jobStatus).toBe('cutting');
    expect(await jobStatus(fx.cutter, j.id)).toBe('cutting');

    expect((await finish(fx.cutter, planId)).body.jobStatus).toBe('done');
    expect(await jobStatus(fx.cutter, j.id)).toBe('done');
    expect((await editJob(fx.estimator, j.id, { status: 'archived' })).status).toBe(200);
    expect(await jobStatus(fx.estimator, j.id)).toBe('archived');

    const moves = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, j.id), eq(auditEvents.action, 'status')));
    expect(moves.map((m) => m.data)).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ from: 'accepted', to: 'cutting' }),
        expect.objectContaining({ from: 'cutting', to: 'done' }),
      ]),
    );
  });

  test('the first saw-order step ticked moves a job to cutting, even one the owner set back to accepted', async () => {
    const { job: j } = await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() });
    const { id: planId, plan } = await nestAndSave(fx.estimator, j.id);
    await release(fx.estimator, planId);
    expect((await editJob(fx.owner, j.id, { status: 'accepted' })).status).toBe(200);
    const ticked = await tick(fx.cutter, planId, { piece: 0, step: plan.pieces[0].sawOrder![0].n });
    expect(ticked.body.status).toBe('cutting');
    expect(await jobStatus(fx.cutter, j.id)).toBe('cutting');
  });

  test('a cancelled plan does not leave the job in cutting: a accepted job goes back to accepted, a quote back to quoting', async () => {
    const accepted = (await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() })).job;
    const quote = (await job()).job;
    for (const [j, before] of [
      [accepted, 'accepted'],
      [quote, 'quoting'],
    ] as const) {
      const { id: planId } = await nestAndSave(fx.estimator, j.id);
      await release(fx.estimator, planId);
      expect(await jobStatus(fx.estimator, j.id)).toBe('cutting');
      expect((await cancel(fx.estimator, planId)).body.jobStatus).toBe(before);
      expect(await jobStatus(fx.estimator, j.id)).toBe(before);
    }
  });

  test('with two released plans the job is done only when both are finished; a cancelled one does not hold it back', async () => {
    const { job: j } = await job({ parts: cabinet, onHand: 8, status: 'accepted', acceptedAt: new Date() });
    const first = await nestAndSave(fx.estimator, j.id, { name: 'First' });
    await release(fx.estimator, first.id);
    const second = await nestAndSave(fx.estimator, j.id, { name: 'Second' });
    await release(fx.estimator, second.id);
    const third = await nestAndSave(fx.estimator, j.id, { name: 'Third' });
    await release(fx.estimator, third.id);
    await finish(fx.cutter, first.id);
    expect(await jobStatus(fx.cutter, j.id)).toBe('cutting');
    await cancel(fx.owner, third.id);
    expect(await jobStatus(fx.cutter, j.id)).toBe('cutting');
    await finish(fx.cutter, second.id);
    expect(await jobStatus(fx.cutter, j.id)).toBe('done');
  });

  test('two plans of one job finished at the same moment leave the job done, not cutting', async () => {
    const { job: j } = await job({ parts: cabinet, onHand: 8, status: 'accepted', acceptedAt: new Date() });
    const a = await nestAndSave(fx.estimator, j.id, { name: 'A' });
    await release(fx.estimator, a.id);
    const b = await nestAndSave(fx.estimator, j.id, { name: 'B' });
    await release(fx.estimator, b.id);
    const results = await Promise.all([finish(fx.cutter, a.id), finish(fx.cutter, b.id)]);
    expect(results.map((r) => r.status)).toEqual([200, 200]);
    expect(await jobStatus(fx.cutter, j.id)).toBe('done');
  });

  test('an archived job stays archived when one of its plans is released or cancelled', async () => {
    const { job: j } = await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() });
    const { id: planId } = await nestAndSave(fx.estimator, j.id);
    expect((await editJob(fx.estimator, j.id, { status: 'archived' })).status).toBe(200);
    await release(fx.estimator, planId);
    expect(await jobStatus(fx.estimator, j.id)).toBe('archived');
    await cancel(fx.estimator, planId);
    expect(await jobStatus(fx.estimator, j.id)).toBe('archived');
  });
});

describe('editing a job by hand', () => {
  test('the estimator changes name, customer, due date and notes; only the fields sent change, each audited from → to', async () => {
    const [ashby] = await db.insert(customers).values({ shopId: fx.mine.id, name: 'R. Ashby' }).returning();
    const [j] = await db
      .insert(jobs)
      .values({ shopId: fx.mine.id, name: 'Ashby pantry', customerId: ashby.id, dueDate: '2027-03-01', notes: 'Paint grade' })
      .returning();
    const renamed = await editJob(fx.estimator, j.id, { name: 'Ashby pantry and mudroom', dueDate: '2027-03-15' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({
      name: 'Ashby pantry and mudroom',
      customer: 'R. Ashby',
      dueDate: '2027-03-15',
      notes: 'Paint grade',
      status: 'quoting',
    });
    // Changing the status alone leaves the rest as it was.
    expect((await editJob(fx.estimator, j.id, { status: 'accepted' })).body).toMatchObject({
      customer: 'R. Ashby',
      dueDate: '2027-03-15',
      notes: 'Paint grade',
      status: 'accepted',
    });
    const edits = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, j.id), eq(auditEvents.action, 'update')));
    expect(edits.map((e) => e.data)).toEqual([
      { changes: { name: { from: 'Ashby pantry', to: 'Ashby pantry and mudroom' }, dueDate: { from: '2027-03-01', to: '2027-03-15' } } },
      { changes: { status: { from: 'quoting', to: 'accepted' } } },
    ]);
  });

  test('a bad field gets its message and nothing changes; a field that does not exist is refused', async () => {
    const [j] = await db.insert(jobs).values({ shopId: fx.mine.id, name: 'Birch desk' }).returning();
    const bad = await editJob(fx.estimator, j.id, { name: ' ', dueDate: '15/03/2027' });
    expect(bad.status).toBe(422);
    expect(bad.body.fields).toMatchObject({ name: ['Give the job a name.'], dueDate: ['Use a date like 2027-01-31.'] });
    expect((await editJob(fx.estimator, j.id, { shopId: fx.theirs.id })).status).toBe(422);
    const [after] = await db.select().from(jobs).where(eq(jobs.id, j.id));
    expect(after).toMatchObject({ name: 'Birch desk', shopId: fx.mine.id });
  });

  test('the estimator may not set cutting or done by hand (told why); the owner may set any status', async () => {
    const [j] = await db.insert(jobs).values({ shopId: fx.mine.id, name: 'Override job' }).returning();
    const refused = await editJob(fx.estimator, j.id, { status: 'cutting' });
    expect(refused.status).toBe(403);
    expect(refused.body.error).toBe(
      'A quoting job cannot be set to Cutting by hand: cutting starts when a plan is released or a saw-order step is ticked. Only the owner can override that.',
    );
    expect((await editJob(fx.estimator, j.id, { status: 'done' })).status).toBe(403);
    expect(await jobStatus(fx.estimator, j.id)).toBe('quoting');
    for (const status of ['cutting', 'done', 'quoting', 'archived', 'accepted'] as const) {
      expect((await editJob(fx.owner, j.id, { status })).body.status).toBe(status);
    }
  });

  test('the estimator cannot move a job that is being cut back to accepted or archive it; the owner can', async () => {
    const { job: j } = await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() });
    const { id: planId } = await nestAndSave(fx.estimator, j.id);
    await release(fx.estimator, planId);
    expect((await editJob(fx.estimator, j.id, { status: 'accepted' })).status).toBe(403);
    expect((await editJob(fx.estimator, j.id, { status: 'archived' })).status).toBe(403);
    expect((await editJob(fx.owner, j.id, { status: 'archived' })).status).toBe(200);
  });

  test('an estimator restores an archived job to what its plans say', async () => {
    const { job: j } = await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() });
    const { id: planId } = await nestAndSave(fx.estimator, j.id);
    await release(fx.estimator, planId);
    await finish(fx.cutter, planId);
    await editJob(fx.estimator, j.id, { status: 'archived' });
    expect((await editJob(fx.estimator, j.id, { status: 'accepted' })).status).toBe(403);
    expect((await editJob(fx.estimator, j.id, { status: 'done' })).body.status).toBe('done');
  });

  test('a new job is a quote or already accepted, never cutting: that follows its plans', async () => {
    const noParams = { params: Promise.resolve({}) };
    const { request } = await import('../support/fixtures');
    const accepted = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', user: fx.estimator, body: { name: 'Agreed job', status: 'accepted' } }),
      noParams,
    );
    expect(accepted.status).toBe(201);
    expect(await accepted.json()).toMatchObject({ status: 'accepted', acceptedAt: expect.any(String) });
    const cutting = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', user: fx.estimator, body: { name: 'Early job', status: 'cutting' } }),
      noParams,
    );
    expect(cutting.status).toBe(422);
    expect((await cutting.json()).fields.status).toEqual(['A new job is quoting or accepted; cutting and done follow its plans.']);
  });
});

describe('deleting or archiving a job', () => {
  test('a job with no history goes, with its cut list and draft plans', async () => {
    const { job: j } = await job();
    await nestAndSave(fx.estimator, j.id);
    expect((await deleteJob(fx.estimator, j.id)).status).toBe(200);
    expect(await db.select().from(jobs).where(eq(jobs.id, j.id))).toEqual([]);
    expect(await db.select().from(parts).where(eq(parts.jobId, j.id))).toEqual([]);
    expect(await db.select().from(plans).where(eq(plans.jobId, j.id))).toEqual([]);
  });

  test('a job with a plan released (even one cancelled since) is refused with a 409 that says to archive it, and kept whole', async () => {
    const { job: j } = await job({ parts: cabinet, status: 'accepted', acceptedAt: new Date() });
    const { id: planId } = await nestAndSave(fx.estimator, j.id);
    await release(fx.estimator, planId);
    for (const step of ['released', 'cancelled']) {
      if (step === 'cancelled') await cancel(fx.estimator, planId);
      const refused = await deleteJob(fx.owner, j.id);
      expect(refused.status).toBe(409);
      expect(refused.body.error).toMatch(/^“Job in Day ply \d+” has history .*archive it instead/);
      expect(await db.select({ id: plans.id }).from(plans).where(eq(plans.jobId, j.id))).toHaveLength(1);
    }
    expect((await editJob(fx.owner, j.id, { status: 'archived' })).body.status).toBe('archived');
  });

  test('archived jobs leave the default jobs list, and the Archived and Any filters list them, marked archived', async () => {
    const [j] = await db.insert(jobs).values({ shopId: fx.mine.id, name: 'Filed away', status: 'archived' }).returning();
    const listed = async (status: string) =>
      (await call(jobsRoute.GET, `/api/jobs?q=Filed+away${status}`, '', fx.estimator)).body.jobs.find((x: { id: string }) => x.id === j.id);
    expect(await listed('')).toBeUndefined();
    expect(await listed('&status=archived')).toMatchObject({ status: 'archived' });
    expect(await listed('&status=all')).toMatchObject({ status: 'archived' });
  });
});
