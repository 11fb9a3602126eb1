import { listDrawerSchedules, saveDrawerSchedule } from '@/db/queries/drawer-schedules';
import { requireJob } from '@/db/queries/parts';
import { idParams, route } from '@/server/api/route';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { sizeOrThrow } from './size-or-throw';

// GET /api/jobs/:id/drawer-schedules – the job's drawer schedules with their inputs
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ scope, params }) => {
  await requireJob(scope, params.id);
  return listDrawerSchedules(scope, params.id);
});

// POST /api/jobs/:id/drawer-schedules – add a schedule and its parts to the cut list, in one transaction
export const POST = route(
  { permission: 'cutlist:write', params: idParams, body: drawerScheduleSchema, status: 201 },
  async ({ scope, db, user, params, body }) => {
    const parts = await sizeOrThrow(db, user.shopId, body);
    return saveDrawerSchedule(scope, params.id, null, body, parts);
  },
);
