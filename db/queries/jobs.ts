import { and, desc, eq, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { jobs, parts } from '../schema';
import type { JobInput, JobPatch, JobSummary } from '@/shared/schemas/job';
import { recordAudit } from './audit';

const summaryColumns = {
  id: jobs.id,
  name: jobs.name,
  customer: jobs.customer,
  status: jobs.status,
  dueDate: jobs.dueDate,
  notes: jobs.notes,
  createdAt: jobs.createdAt,
  updatedAt: jobs.updatedAt,
  partCount: sql<number>`coalesce((select sum(${parts.quantity}) from ${parts} where ${parts.jobId} = ${jobs.id}), 0)::int`,
  materials: sql<string[]>`coalesce((select array_agg(distinct ${parts.material}) from ${parts} where ${parts.jobId} = ${jobs.id}), '{}')`,
};

type SummaryRow = { createdAt: Date; updatedAt: Date } & Omit<JobSummary, 'createdAt' | 'updatedAt'>;

const toSummary = (row: SummaryRow): JobSummary => ({
  ...row,
  partCount: Number(row.partCount),
  materials: row.materials ?? [],
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

export async function listJobs(db: Db, shopId: string): Promise<JobSummary[]> {
  const rows = await db.select(summaryColumns).from(jobs).where(eq(jobs.shopId, shopId)).orderBy(desc(jobs.updatedAt));
  return rows.map(toSummary);
}

export async function getJob(db: Db, shopId: string, id: string): Promise<JobSummary | null> {
  const [row] = await db.select(summaryColumns).from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
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
