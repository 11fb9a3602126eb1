import type { Db } from '@/db/open';
import { getShopSettings } from '@/db/queries/shops';
import { invalid } from '@/server/api/errors';
import { formatLength } from '@/lib/units/format-length';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { sizeDrawerSchedule } from '@/lib/joinery';
import type { DrawerPart } from '@/lib/joinery/types';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';

/**
 * The schedule's parts (machining notes in the shop's unit), or 422 with one message per field that makes the box
 * impossible.
 */
export async function sizeOrThrow(db: Db, shopId: string, schedule: DrawerSchedule): Promise<DrawerPart[]> {
  const shop = await getShopSettings({ db, shopId });
  const sized = sizeDrawerSchedule(
    schedule,
    shop ? { lengthText: (mm) => formatLength(mm, shop.units), exactText: (mm) => exactLengthText(mm, shop.units) } : {},
  );
  if (sized.ok) return sized.parts;
  const fields: Record<string, string[]> = {};
  for (const e of sized.errors) (fields[e.path || '_'] ??= []).push(e.message);
  throw invalid('This box cannot be built as set: see the marked fields.', fields);
}
