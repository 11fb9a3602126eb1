import { z } from 'zod';
import { deleteDrawerSchedule, saveDrawerSchedule } from '@/db/queries/drawer-schedules';
import { route } from '@/server/api/route';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { sizeOrThrow } from '../size-or-throw';

const params = z.object({ id: z.uuid(), scheduleId: z.uuid() });

// PUT /api/jobs/:id/drawer-schedules/:scheduleId – change a schedule; its cut-list rows are replaced in step
export const PUT = route({ permission: 'cutlist:write', params, body: drawerScheduleSchema }, async ({ scope, db, user, params, body }) => {
  const parts = await sizeOrThrow(db, user.shopId, body);
  return saveDrawerSchedule(scope, params.id, params.scheduleId, body, parts);
});

// DELETE /api/jobs/:id/drawer-schedules/:scheduleId – delete a schedule and its cut-list rows
export const DELETE = route({ permission: 'cutlist:write', params }, async ({ scope, params }) => {
  await deleteDrawerSchedule(scope, params.id, params.scheduleId);
  return { ok: true };
});
