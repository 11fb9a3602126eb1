import { z } from 'zod';
import { deleteDrawerSchedule, saveDrawerSchedule } from '@/db/queries/drawer-schedules';
import { notFound } from '@/server/api/errors';
import { route } from '@/server/api/route';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { sizeOrThrow } from '../size-or-throw';

const params = z.object({ id: z.uuid(), scheduleId: z.uuid() });

// PUT /api/jobs/:id/drawer-schedules/:scheduleId – change a schedule; its cut-list rows are replaced in step
export const PUT = route({ permission: 'cutlist:write', params, body: drawerScheduleSchema }, async ({ scope, db, user, params, body }) => {
  const parts = await sizeOrThrow(db, user.shopId, body);
  return (await saveDrawerSchedule(scope, params.id, params.scheduleId, body, parts)) ?? Promise.reject(notFound('That drawer schedule'));
});

// DELETE /api/jobs/:id/drawer-schedules/:scheduleId – delete a schedule and its cut-list rows
export const DELETE = route({ permission: 'cutlist:write', params }, async ({ scope, params }) => {
  if (!(await deleteDrawerSchedule(scope, params.id, params.scheduleId))) throw notFound('That drawer schedule');
  return { ok: true };
});
