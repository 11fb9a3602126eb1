import { HttpError } from '@/lib/api/errors';
import { sizeDrawerSchedule } from '@/lib/joinery';
import type { DrawerPart } from '@/lib/joinery/types';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';

/** The schedule's parts, or 422 with one message per field that makes the box impossible. */
export function sizeOrThrow(schedule: DrawerSchedule): DrawerPart[] {
  const sized = sizeDrawerSchedule(schedule);
  if (sized.ok) return sized.parts;
  const fields: Record<string, string[]> = {};
  for (const e of sized.errors) (fields[e.path || '_'] ??= []).push(e.message);
  throw new HttpError(422, 'This box cannot be built as set: see the marked fields.', fields);
}
