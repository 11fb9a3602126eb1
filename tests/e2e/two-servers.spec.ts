/**
 * Two app servers (`next start` twice, on two ports) on one PostgreSQL: nothing that matters lives in one process's
 * memory. Exactly one of two releases racing for the last sheet wins, a demotion made on one server is seen by the
 * other on its next request, and the sign-in throttle counts attempts made on both.
 */
import { randomBytes } from 'node:crypto';
import type { APIRequestContext, Page } from '@playwright/test';
import { openDatabase } from '../../db/open';
import { DEMO_PASSWORD, seedDemoShop } from '../../seeds/demo-shop';
import { startAppServer, startPostgres, type AppServer, type Cluster } from './support/cluster';
import { saveDraftPlan } from './support/plans';
import { person } from './support/session';
import { E2E_PORT } from './support/server';
import { expect, test } from './support/test';

test.describe.configure({ mode: 'serial' });

let pg: Cluster;
let a: AppServer;
let b: AppServer;

test.beforeAll(async () => {
  test.setTimeout(180_000);
  pg = await startPostgres();
  const db = await openDatabase({ url: pg.url });
  try {
    await seedDemoShop(db.db);
  } finally {
    await db.close();
  }
  const env = { DATABASE_URL: pg.url, NEXTAUTH_SECRET: randomBytes(32).toString('base64url'), KERFWISE_DATA_DIR: '' };
  [a, b] = await Promise.all([startAppServer(E2E_PORT + 1, env), startAppServer(E2E_PORT + 2, env)]);
});

test.afterAll(async () => {
  await Promise.all([a?.stop(), b?.stop()]);
  pg?.stop();
});

type Playwright = Parameters<Parameters<typeof test>[2]>[0]['playwright'];

/** An API client on one server, signed in through next-auth's credentials callback as a browser's page would. */
async function client(playwright: Playwright, server: AppServer): Promise<APIRequestContext> {
  return playwright.request.newContext({ baseURL: server.url, extraHTTPHeaders: { origin: server.url } });
}

async function signInOn(ctx: APIRequestContext, email: string, password: string, address = '198.18.0.1') {
  const { csrfToken } = await (await ctx.get('/api/auth/csrf')).json();
  return ctx.post('/api/auth/callback/credentials', { form: { email, password, csrfToken, json: 'true' }, headers: { 'x-forwarded-for': address } });
}

test('both servers answer from the one database', async ({ playwright }) => {
  const onA = await client(playwright, a);
  const onB = await client(playwright, b);
  expect((await signInOn(onA, person('owner').email, DEMO_PASSWORD)).status()).toBe(200);
  expect((await signInOn(onB, person('owner').email, DEMO_PASSWORD)).status()).toBe(200);
  const job = await (await onA.post('/api/jobs', { data: { name: `Made on A ${Date.now()}` } })).json();
  expect((await onB.get(`/api/jobs/${job.id}`)).status()).toBe(200);
});

test('two releases racing for the last sheet, one on each server: exactly one wins', async ({ playwright }) => {
  const onA = await client(playwright, a);
  const onB = await client(playwright, b);
  await signInOn(onA, person('owner').email, DEMO_PASSWORD);
  await signInOn(onB, person('owner').email, DEMO_PASSWORD);
  const material = `Race ply ${Date.now().toString(36)}`;
  const stock = await onA.post('/api/stock', {
    data: { kind: 'sheet', material, nominalThickness: '18 mm', thickness: 18, length: 2440, width: 1220, onHand: 1, costCents: 5000 },
  });
  expect(stock.status(), await stock.text()).toBe(201);
  const job = await (await onA.post('/api/jobs', { data: { name: `Race job ${material}` } })).json();
  const part = await onA.post(`/api/jobs/${job.id}/parts`, {
    data: { label: 'Side', quantity: 1, length: 700, width: 500, thickness: 18, material },
  });
  expect(part.status(), await part.text()).toBe(201);
  const asPage = { request: onA } as unknown as Page;
  const first = await saveDraftPlan(asPage, job.name, 'Race plan one');
  const second = await saveDraftPlan(asPage, job.name, 'Race plan two');

  const [r1, r2] = await Promise.all([onA.post(`/api/plans/${first}/release`), onB.post(`/api/plans/${second}/release`)]);
  expect([r1.status(), r2.status()].sort()).toEqual([200, 409]);
  const items: { items: { material: string; onHand: number; reserved: number }[] } = await (await onB.get('/api/stock')).json();
  expect(items.items.find((i) => i.material === material)).toMatchObject({ onHand: 1, reserved: 1 });
});

test('a demotion made on one server is seen by the other on its next request', async ({ playwright }) => {
  const ownerOnA = await client(playwright, a);
  await signInOn(ownerOnA, person('owner').email, DEMO_PASSWORD);
  const email = `demoted.${Date.now()}@larkspur.example`;
  const password = 'a-long-enough-password';
  const made = await (await ownerOnA.post('/api/team', { data: { name: 'Dana Voss', email, role: 'estimator', password } })).json();

  const estimatorOnB = await client(playwright, b);
  expect((await signInOn(estimatorOnB, email, password)).status()).toBe(200);
  expect((await estimatorOnB.post('/api/jobs', { data: { name: `Estimate ${Date.now()}` } })).status()).toBe(201);

  expect((await ownerOnA.patch(`/api/team/${made.id}`, { data: { role: 'cutter' } })).status()).toBe(200);
  // The old session is refused on B at once; signed in again, the person is a cutter there.
  expect((await estimatorOnB.post('/api/jobs', { data: { name: 'After the demotion' } })).status()).toBe(401);
  expect((await signInOn(estimatorOnB, email, password)).status()).toBe(200);
  expect((await estimatorOnB.post('/api/jobs', { data: { name: 'As a cutter' } })).status()).toBe(403);
});

test('the sign-in throttle counts wrong passwords made on both servers', async ({ playwright }) => {
  const onA = await client(playwright, a);
  const onB = await client(playwright, b);
  const email = person('cutter').email;
  const address = '198.18.0.77';
  for (let i = 0; i < 5; i++) expect((await signInOn(onA, email, `wrong-a-${i}`, address)).status()).toBe(401);
  for (let i = 0; i < 5; i++) expect((await signInOn(onB, email, `wrong-b-${i}`, address)).status()).toBe(401);
  const onAgain = await signInOn(onA, email, DEMO_PASSWORD, address);
  expect(onAgain.status()).toBe(429);
  expect(Number(onAgain.headers()['retry-after'])).toBeGreaterThan(0);
  expect((await signInOn(onB, email, DEMO_PASSWORD, '198.18.0.78')).status()).toBe(429);
});
