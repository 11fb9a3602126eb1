import { and, asc, desc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../open';
import { customers, jobs, parts, plans, stockMovements } from '../schema';
import { HttpError } from '@/lib/api/errors';
import type { Role } from '@/lib/auth/permissions';
import { refuseManualStatus, wonAtAfter } from '@/lib/jobs/status';
import { JOB_STATUSES, type JobInput, type JobPatch, type JobSummary } from '@/shared/schemas/job';
import type { JobListPage, JobListQuery, JobSortColumn } from '@/shared/schemas/job-list';
import { recordAudit } from './audit';
import { resolveCustomer } from './customers';
import { jobFacts } from './job-status';

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
      customer: sql<string>`coalesce(${customers.name}, '')`,
      customerId: jobs.customerId,
      status: jobs.status,
      dueDate: jobs.dueDate,
      notes: jobs.notes,
      wonAt: jobs.wonAt,
      createdAt: jobs.createdAt,
      updatedAt: jobs.updatedAt,
      partCount: sql<number>`coalesce(${stats.partCount}, 0)`,
      materials: sql<string[] | null>`${stats.materials}`,
    })
    .from(jobs)
    .leftJoin(customers, eq(customers.id, jobs.customerId))
    .leftJoin(stats, eq(stats.jobId, jobs.id));
}

type SummaryRow = { createdAt: Date; updatedAt: Date; wonAt: Date | null; materials: string[] | null } & Omit<JobSummary, 'createdAt' | 'updatedAt' | 'wonAt' | 'materials'>;

const toSummary = (row: SummaryRow): JobSummary => ({
  ...row,
  wonAt: row.wonAt?.toISOString() ?? null,
  partCount: Number(row.partCount),
  materials: row.materials ?? [],
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

/** `%text%` for ILIKE, the pattern's own characters (`%`, `_`, `\\`) matched as typed. */
const containing = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** A job's pieces (quantities summed), for sorting by them. */
const piecesOf = sql<number>`(select coalesce(sum(${parts.quantity}), 0) from ${parts} where ${parts.shopId} = ${jobs.shopId} and ${parts.jobId} = ${jobs.id})`;

/** What each sortable column sorts by: names ignoring case, status in work order, jobs without a due date last. */
const SORT_KEYS: Record<JobSortColumn, SQL> = {
  name: sql`lower(${jobs.name})`,
  customer: sql`lower(${customers.name})`,
  status: sql`array_position(array[${sql.raw(JOB_STATUSES.map((s) => `'${s}'`).join(', '))}]::job_status[], ${jobs.status})`,
  due: sql`${jobs.dueDate}`,
  parts: piecesOf,
  updated: sql`${jobs.updatedAt}`,
};

/**
 * One page of a shop's jobs as the jobs list shows them: filtered by status (archived left out unless asked for) and
 * customer, searched in the job's name, its customer's name and its parts' materials (any case), sorted on the
 * server (ties by id, so pages never overlap), with the counts the list's controls need. Three queries whatever the
 * shop's size: the page's ids (narrow rows, so sorting a big shop stays cheap; the default order reads
 * jobs_shop_updated_idx and stops after the page), those jobs with their parts' figures, and the counts.
 */
export async function listJobsPage(db: Db, shopId: string, q: JobListQuery): Promise<JobListPage> {
  const filters: SQL[] = [eq(jobs.shopId, shopId)];
  if (q.status === '') filters.push(sql`${jobs.status} <> 'archived'`);
  else if (q.status !== 'all') filters.push(eq(jobs.status, q.status));
  if (q.customer) filters.push(sql`lower(${customers.name}) = lower(${q.customer})`);
  if (q.q) {
    const like = containing(q.q);
    filters.push(
      sql`(${jobs.name} ilike ${like} or ${customers.name} ilike ${like} or exists (select 1 from ${parts} where ${parts.shopId} = ${jobs.shopId} and ${parts.jobId} = ${jobs.id} and ${parts.material} ilike ${like}))`,
    );
  }
  const where = and(...filters)!;
  const needsCustomer = Boolean(q.customer || q.q) || q.sort.startsWith('customer.');
  const [column, dir] = q.sort.split('.') as [JobSortColumn, 'asc' | 'desc'];
  const key = SORT_KEYS[column];
  // Empty values (no customer, no due date) go last either way round; ties by id the same way round.
  const order =
    column === 'updated' // never empty: plain, so the index serves it
      ? dir === 'asc' ? [asc(jobs.updatedAt), asc(jobs.id)] : [desc(jobs.updatedAt), desc(jobs.id)]
      : dir === 'asc' ? [sql`${key} asc nulls last`, asc(jobs.id)] : [sql`${key} desc nulls last`, desc(jobs.id)];

  const idsQuery = db.select({ id: jobs.id }).from(jobs);
  const pageIds = (await (needsCustomer ? idsQuery.leftJoin(customers, eq(customers.id, jobs.customerId)) : idsQuery)
    .where(where)
    .orderBy(...order)
    .limit(q.size)
    .offset((q.page - 1) * q.size)).map((r) => r.id);

  // Per job: its pieces and materials, grouped by material first (hashing; array_agg(distinct) sorted every job's
  // parts and cost ten times as much in the embedded database).
  const byMaterial = db
    .select({ material: parts.material, pieces: sql<number>`sum(${parts.quantity})`.as('pieces') })
    .from(parts)
    .where(and(eq(parts.shopId, jobs.shopId), eq(parts.jobId, jobs.id)))
    .groupBy(parts.material)
    .as('by_material');
  const stats = db
    .select({
      partCount: sql<number>`coalesce(sum(${byMaterial.pieces}), 0)::int`.as('part_count'),
      materials: sql<string[] | null>`array_agg(${byMaterial.material})`.as('materials'),
    })
    .from(byMaterial)
    .as('stats');
  const rows = pageIds.length
    ? await db
        .select({
          id: jobs.id,
          name: jobs.name,
          customer: sql<string>`coalesce(${customers.name}, '')`,
          customerId: jobs.customerId,
          status: jobs.status,
          dueDate: jobs.dueDate,
          notes: jobs.notes,
          wonAt: jobs.wonAt,
          createdAt: jobs.createdAt,
          updatedAt: jobs.updatedAt,
          partCount: stats.partCount,
          materials: stats.materials,
        })
        .from(jobs)
        .leftJoin(customers, eq(customers.id, jobs.customerId))
        .leftJoinLateral(stats, sql`true`)
        .where(and(eq(jobs.shopId, shopId), inArray(jobs.id, pageIds)))
    : [];
  const byId = new Map(rows.map((r) => [r.id, r]));

  const [counts] = await db
    .select({
      total: sql<number>`count(*) filter (where ${where})::int`,
      shopJobs: sql<number>`count(*)::int`,
      archived: sql<number>`count(*) filter (where ${jobs.status} = 'archived')::int`,
      // Once for the query (an uncorrelated sub-select): the shop's customers that have a job.
      customers: sql<string[] | null>`(select array_agg(c.name) from ${customers} c where c.shop_id = ${shopId} and exists (select 1 from ${jobs} j where j.customer_id = c.id))`,
    })
    .from(jobs)
    .leftJoin(customers, needsCustomer ? eq(customers.id, jobs.customerId) : sql`false`)
    .where(eq(jobs.shopId, shopId));

  const total = Number(counts?.total ?? 0);
  return {
    jobs: pageIds.flatMap((id) => {
      const row = byId.get(id);
      return row ? [toSummary({ ...row, materials: row.materials?.sort() ?? null })] : [];
    }),
    total,
    page: q.page,
    pageSize: q.size,
    pageCount: Math.max(1, Math.ceil(total / q.size)),
    sort: q.sort,
    shopJobs: Number(counts?.shopJobs ?? 0),
    archived: Number(counts?.archived ?? 0),
    customers: (counts?.customers ?? []).sort((a, b) => a.localeCompare(b, 'en', { sensitivity: 'base' })),
  };
}

export async function getJob(db: Db, shopId: string, id: string): Promise<JobSummary | null> {
  const [row] = await selectSummaries(db, shopId).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
  return row ? toSummary(row) : null;
}

export async function createJob(db: Db, shopId: string, userId: string, input: JobInput): Promise<JobSummary> {
  const id = await db.transaction(async (tx) => {
    const { customer, ...fields } = input;
    const customerId = await resolveCustomer(tx, shopId, userId, customer);
    const [row] = await tx.insert(jobs).values({ ...fields, customerId, wonAt: input.status === 'won' ? new Date() : null, shopId, createdBy: userId }).returning({ id: jobs.id });
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'job', entityId: row.id, data: { name: input.name } });
    return row.id;
  });
  return (await getJob(db, shopId, id))!;
}

/** Who is changing a job: the status rules depend on the role. */
export interface JobEditor {
  id: string;
  role: Role;
}

/**
 * Changes what the patch sends (only fields whose value differs are written; the audit keeps each as from → to). A
 * status set by hand follows the rules of lib/jobs/status.ts for the person's role; marking a job won records when.
 */
export async function updateJob(db: Db, shopId: string, editor: JobEditor, id: string, patch: JobPatch) {
  const updated = await db.transaction(async (tx) => {
    const [job] = await tx.select().from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id))).for('update');
    if (!job) return false;
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    const { customer, ...fields } = patch;
    for (const [field, to] of Object.entries(fields) as [Exclude<keyof JobPatch, 'customer'>, unknown][]) {
      if (to !== undefined && to !== job[field]) changes[field] = { from: job[field], to };
    }
    if (customer !== undefined) {
      const customerId = await resolveCustomer(tx, shopId, editor.id, customer);
      if (customerId !== job.customerId) changes.customerId = { from: job.customerId, to: customerId };
    }
    if (!Object.keys(changes).length) return true;
    const set: Partial<typeof jobs.$inferInsert> = Object.fromEntries(Object.entries(changes).map(([f, c]) => [f, c.to]));
    if (patch.status && changes.status) {
      const refused = refuseManualStatus(editor.role, job.status, patch.status, await jobFacts(tx, shopId, id, job.wonAt));
      if (refused) throw new HttpError(403, refused);
      set.wonAt = wonAtAfter(patch.status, job.wonAt, new Date());
    }
    await tx.update(jobs).set({ ...set, updatedAt: new Date() }).where(eq(jobs.id, id));
    await recordAudit(tx, { shopId, userId: editor.id, action: 'update', entity: 'job', entityId: id, data: { changes } });
    return true;
  });
  return updated ? getJob(db, shopId, id) : null;
}

/** A job with history — a plan that was ever released, or stock moved for one of its plans — is archived, not deleted. */
export class JobHasHistory extends HttpError {
  constructor(name: string) {
    super(409, `“${name}” has history (plans released to the saw, stock moved for them): archive it instead, so the stock and yield ledgers keep their plans. Archived jobs leave the jobs list until you filter for them.`);
  }
}

/** Deletes a job with its cut list and draft plans; refuses one with history (JobHasHistory), in the same statement. */
export async function deleteJob(db: Db, shopId: string, userId: string, id: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    const rows = await tx
      .delete(jobs)
      .where(
        and(
          eq(jobs.shopId, shopId),
          eq(jobs.id, id),
          sql`not exists (select 1 from ${plans} where ${plans.jobId} = ${id} and (${plans.releasedAt} is not null or ${plans.status} in ('released', 'cutting', 'done')))`,
          sql`not exists (select 1 from ${stockMovements} m join ${plans} p on p.id = m.plan_id where p.job_id = ${id})`,
        ),
      )
      .returning({ name: jobs.name });
    if (rows.length) {
      await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'job', entityId: id, data: rows[0] });
      return true;
    }
    const [kept] = await tx.select({ name: jobs.name }).from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
    if (kept) throw new JobHasHistory(kept.name);
    return false;
  });
}
