import type { Db } from '../open';
import { auditEvents } from '../schema';
export async function recordAudit(
  db: Db,
  event: { shopId: string; userId: string | null; action: string; entity: string; entityId?: string; data?: unknown },
) {
  await db.insert(auditEvents).values({ ...event, entityId: event.entityId ?? null, data: event.data ?? null });
}
