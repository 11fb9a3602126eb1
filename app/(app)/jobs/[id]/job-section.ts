import { scopeOf } from '@/db/scope';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import type { Permission } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';

/**
 * What every section page of a job starts from: the signed-in user (with the section's permission), the job id from
 * the path (404 when it is not a uuid; the layout has already checked the job is this shop's), and the shop's settings.
 */
export async function jobSection(params: Promise<{ id: string }>, permission: Permission) {
  const user = await requirePageUser(permission);
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const shop = await getShopSettings(scopeOf(await getDb(), user));
  return { user, jobId: id.data, shop };
}
