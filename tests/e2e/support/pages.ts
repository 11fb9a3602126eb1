/**
 * The main pages of the app, each with the permission that opens it and the heading it shows when it is ready, and
 * the demo records they are opened on (the kitchen job, its released plan, one of its parts). The small-screen walk
 * and the accessibility check go through the same list.
 */
import type { Permission } from '@/lib/auth/permissions';
import { expect, type Page } from './test';
import type { DemoRole } from './session';
import { jobId as jobIdByName } from './plans';

export interface Ids {
  jobId: string;
  planId: string;
  partId: string;
}

/** The demo kitchen, its released plan and one of its parts, found through the API as any client would. */
export async function demoIds(page: Page): Promise<Ids> {
  const jobId = await jobIdByName(page, 'Hollis kitchen');
  const list = await (await page.request.get(`/api/jobs/${jobId}/plans`)).json();
  const plans: { id: string; status: string }[] = Array.isArray(list) ? list : list.plans;
  const planId = plans.find((p) => p.status === 'released' || p.status === 'cutting')!.id;
  const partsBody = await (await page.request.get(`/api/jobs/${jobId}/parts`)).json();
  const parts: { id: string }[] = Array.isArray(partsBody) ? partsBody : partsBody.parts;
  return { jobId, planId, partId: parts[0].id };
}

export const PAGES: { slug: string; path: (ids: Ids) => string; permission: Permission; heading: RegExp }[] = [
  { slug: 'jobs', path: () => '/jobs', permission: 'jobs:read', heading: /^Jobs$/ },
  { slug: 'cut-list', path: (i) => `/jobs/${i.jobId}`, permission: 'jobs:read', heading: /Hollis kitchen/ },
  { slug: 'drawers', path: (i) => `/jobs/${i.jobId}/drawers`, permission: 'jobs:read', heading: /Hollis kitchen/ },
  { slug: 'plans', path: (i) => `/jobs/${i.jobId}/plan`, permission: 'plans:read', heading: /Hollis kitchen/ },
  { slug: 'bench', path: (i) => `/jobs/${i.jobId}/plan/${i.planId}`, permission: 'plans:read', heading: /Hollis kitchen/ },
  { slug: 'takeoff', path: (i) => `/jobs/${i.jobId}/takeoff`, permission: 'prices:read', heading: /Hollis kitchen/ },
  { slug: 'customers', path: () => '/customers', permission: 'customers:read', heading: /^Customers$/ },
  { slug: 'setup-cards', path: () => '/setup-cards', permission: 'jobs:read', heading: /^Setup cards$/ },
  { slug: 'stock', path: () => '/stock', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'stock-rack', path: () => '/stock?view=rack', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'stock-history', path: () => '/stock?view=history', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'yield', path: () => '/yield', permission: 'yield:read', heading: /^Yield ledger$/ },
  { slug: 'reports', path: () => '/reports?from=2026-06-01&to=2026-11-30', permission: 'yield:read', heading: /^Reports$/ },
  { slug: 'shop-floor', path: () => '/shop-floor', permission: 'sawsteps:tick', heading: /^Shop floor$/ },
  { slug: 'cutting', path: (i) => `/shop-floor/${i.planId}`, permission: 'sawsteps:tick', heading: /Hollis kitchen/ },
  { slug: 'saw-order', path: (i) => `/plans/${i.planId}/saw-order`, permission: 'plans:read', heading: /Saw order/ },
  { slug: 'tags', path: (i) => `/plans/${i.planId}/tags`, permission: 'plans:read', heading: /^Part tags$/ },
  { slug: 'finish', path: (i) => `/plans/${i.planId}/finish`, permission: 'plans:finish', heading: /^Finish/ },
  { slug: 'part', path: (i) => `/parts/${i.partId}`, permission: 'jobs:read', heading: /Base side/ },
  { slug: 'team', path: () => '/team', permission: 'team:manage', heading: /^Team$/ },
  { slug: 'settings', path: () => '/settings', permission: 'settings:write', heading: /^Shop settings$/ },
];

export const ROLES: DemoRole[] = ['owner', 'estimator', 'cutter'];

export async function settle(page: Page, heading: RegExp) {
  await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
  await expect(page.getByRole('status').filter({ hasText: /Loading/ })).toHaveCount(0);
  await page.waitForLoadState('networkidle');
}

/** Pages the small-screen walk leaves to their own specs, which the accessibility check visits as well. */
export const MORE_PAGES: typeof PAGES = [
  { slug: 'quotes', path: (i) => `/jobs/${i.jobId}/quotes`, permission: 'quotes:read', heading: /Hollis kitchen/ },
  { slug: 'purchase-orders', path: () => '/purchase-orders', permission: 'purchasing:read', heading: /^Purchase orders$/ },
  { slug: 'outbox', path: () => '/outbox', permission: 'mail:manage', heading: /^Outbox$/ },
  { slug: 'sent-mail', path: () => '/sent-mail', permission: 'mail:manage', heading: /^Sent mail$/ },
];
