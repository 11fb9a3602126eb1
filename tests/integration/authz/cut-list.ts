import { drawerSchedules, jobs, parts, setupCards } from '@/db/schema';
import { uniqueThickness } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

const freshJob = async ({ db, mine }: AuthzFixtures) => {
  const [job] = await db.insert(jobs).values({ shopId: mine.id, name: 'Cut list target' }).returning();
  return { id: job.id };
};

const freshPart = async (fx: AuthzFixtures) => {
  const { id } = await freshJob(fx);
  const [part] = await fx.db
    .insert(parts)
    .values({ shopId: fx.mine.id, jobId: id, label: 'Shelf', quantity: 1, length: 600, width: 300, thickness: 18, material: 'MDF' })
    .returning();
  return { id, partId: part.id };
};

const SCHEDULE = { label: 'Matrix drawers', quantity: 2, size: { from: 'box', width: 400, height: 120, depth: 500 } };

const freshSchedule = async (fx: AuthzFixtures) => {
  const { id } = await freshJob(fx);
  const [s] = await fx.db.insert(drawerSchedules).values({ shopId: fx.mine.id, jobId: id, label: 'Target drawers', input: SCHEDULE }).returning();
  return { id, scheduleId: s.id };
};

const freshCard = async ({ db, mine }: AuthzFixtures) => {
  const [c] = await db
    .insert(setupCards)
    .values({ shopId: mine.id, joint: 'box-joint', stockThickness: uniqueThickness(), fields: {}, note: '' })
    .returning();
  return { id: c.id };
};

const UPLOAD = {
  columns: ['label', 'quantity', 'length', 'width', 'thickness', 'material'],
  rows: [{ line: 2, cells: ['Shelf', '1', '600', '300', '18', 'MDF'] }],
  unit: 'mm',
};
const PART = { label: 'Shelf', quantity: 1, length: 600, width: 300, thickness: 18, material: 'MDF' };
const CARD = () => ({
  joint: 'rabbet-and-dado',
  stockThickness: uniqueThickness(),
  fields: [{ key: 'dado-depth', label: 'Dado depth', value: 6.35, unit: 'mm' }],
  note: '',
});

const read = { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 };
const write = { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 };
const create = { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 404 };

export const rows: AuthzRow[] = [
  { route: '/api/jobs/[id]/parts', method: 'GET', target: freshJob, expect: read },
  { route: '/api/jobs/[id]/parts', method: 'POST', target: freshJob, body: PART, expect: create },
  { route: '/api/jobs/[id]/parts/[partId]', method: 'PATCH', target: freshPart, body: { quantity: 3 }, expect: write },
  { route: '/api/jobs/[id]/parts/[partId]', method: 'DELETE', target: freshPart, expect: write },
  { route: '/api/jobs/[id]/cut-list/preview', method: 'POST', target: freshJob, body: UPLOAD, expect: write },
  { route: '/api/jobs/[id]/cut-list/import', method: 'POST', target: freshJob, body: UPLOAD, expect: create },
  { route: '/api/jobs/[id]/cut-list/export', method: 'GET', target: freshJob, expect: read },
  { route: '/api/jobs/[id]/drawer-schedules', method: 'GET', target: freshJob, expect: read },
  { route: '/api/jobs/[id]/drawer-schedules', method: 'POST', target: freshJob, body: SCHEDULE, expect: create },
  { route: '/api/jobs/[id]/drawer-schedules/[scheduleId]', method: 'PUT', target: freshSchedule, body: SCHEDULE, expect: write },
  { route: '/api/jobs/[id]/drawer-schedules/[scheduleId]', method: 'DELETE', target: freshSchedule, expect: write },
  { route: '/api/setup-cards', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  // A getter: each actor's call gets its own thickness, since a shop keeps one card per joint and thickness.
  {
    route: '/api/setup-cards',
    method: 'POST',
    get body() {
      return CARD();
    },
    expect: { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 201 },
  },
  {
    route: '/api/setup-cards/[id]',
    method: 'PUT',
    target: freshCard,
    get body() {
      return CARD();
    },
    expect: write,
  },
  { route: '/api/setup-cards/[id]', method: 'DELETE', target: freshCard, expect: write },
  { route: '/api/materials', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
];
