import { and, desc, eq, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { jobs, parts } from '../schema';
import type { JobInput, JobPatch, JobSummary } from '@/shared/schemas/job';
import { recordAudit } from './audit';

/** Per job: its pieces (quantities summed) and its materials, once each. */
const partStats = (db: Db, shopId: string) =>
  db
    .select({
      jobId: parts.jobId,
      partCount: sql<number>`sum(${parts.quantity})::int`.as('part_count'),
      materials: sql<string[]>`array_agg(distinct ${parts.material})`.as('materials'),
    })
    .from(parts)
    .where(eq(parts.shopId, shopId))
    .groupBy(parts.jobId)
    .as('part_stats');

/** Job summaries of one shop; callers add their own filter on `jobs`. */
function selectSummaries(db: Db, shopId: string) {
  const stats = partStats(db, shopId);
  return db
    .select({
      id: jobs.id,
      name: jobs.name,
      customer: jobs.customer,
      status: jobs.status,
      dueDate: jobs.dueDate,
      notes: jobs.notes,
      createdAt: jobs.createdAt,
      updatedAt: jobs.updatedAt,
      partCount: sql<number>`coalesce(${stats.partCount}, 0)`,
      materials: sql<string[] | null>`${stats.materials}`,
    })
    .from(jobs)
    .leftJoin(stats, eq(stats.jobId, jobs.id));
}

type SummaryRow = { createdAt: Date; updatedAt: Date; materials: string[] | null } & Omit<JobSummary, 'createdAt' | 'updatedAt' | 'materials'>;

const toSummary = (row: SummaryRow): JobSummary => ({
  ...row,
  partCount: Number(row.partCount),
  materials: row.materials ?? [],
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

export async function listJobs(db: Db, shopId: string): Promise<JobSummary[]> {
  const rows = await selectSummaries(db, shopId).where(eq(jobs.shopId, shopId)).orderBy(desc(jobs.updatedAt));
  return rows.map(toSummary);
}

export async function getJob(db: Db, shopId: string, id: string): Promise<JobSummary | null> {
  const [row] = await selectSummaries(db, shopId).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
  return row ? toSummary(row) : null;
}

export async function createJob(db: Db, shopId: string, userId: string, input: JobInput): Promise<JobSummary> {
  const id = await db.transaction(async (tx) => {
    const [row] = await tx.insert(jobs).values({ ...input, shopId, createdBy: userId }).returning({ id: jobs.id });
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'job', entityId: row.id, data: { name: input.name } });
    return row.id;
  });
  return (await getJob(db, shopId, id))!;
}

export async function updateJob(db: Db, shopId: string, userId: string, id: string, patch: JobPatch) {
  const updated = await db.transaction(async (tx) => {
    const rows = await tx
      .update(jobs)
      .set({ ...patch, updatedAt: new Date() })
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)))
      .returning({ id: jobs.id });
    if (rows.length) await recordAudit(tx, { shopId, userId, action: 'update', entity: 'job', entityId: id, data: patch });
    return rows.length > 0;
  });
  return updated ? getJob(db, shopId, id) : null;
}

export async function deleteJob(db: Db, shopId: string, userId: string, id: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    const rows = await tx.delete(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id))).returning({ name: jobs.name });
    if (rows.length) await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'job', entityId: id, data: rows[0] });
    return rows.length > 0;
  });
}
