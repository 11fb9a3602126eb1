import type { Scope, ShopScope } from '../scope';
import { and, asc, desc, eq, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../open';
import { customers, jobs, parts, plans, stockMovements } from '../schema';
import type { Role } from '@/lib/auth/permissions';
import { refuseManualStatus, acceptedAtAfter } from '@/lib/jobs/status';
import { JOB_STATUSES, type JobInput, type JobPatch, type JobSummary } from '@/shared/schemas/job';
import type { JobListPage, JobListQuery, JobSortColumn } from '@/shared/schemas/job-list';
import { recordAudit } from './audit';
import { resolveCustomer } from './customers';
import { jobFacts } from './job-status';
import { DomainError, forbidden, notFound } from '@/lib/errors';
import { isoText, PreparedRead } from '../prepared';

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
      acceptedAt: jobs.acceptedAt,
      createdAt: jobs.createdAt,
      updatedAt: jobs.updatedAt,
      partCount: sql<number>`coalesce(${stats.partCount}, 0)`,
      materials: sql<string[] | null>`${stats.materials}`,
    })
    .from(jobs)
    .leftJoin(customers, eq(customers.id, jobs.customerId))
    .leftJoin(stats, eq(stats.jobId, jobs.id));
}

type SummaryRow = { createdAt: Date; updatedAt: Date; acceptedAt: Date | null; materials: string[] | null } & Omit<
  JobSummary,
  'createdAt' | 'updatedAt' | 'acceptedAt' | 'materials'
>;

const toSummary = (row: SummaryRow): JobSummary => ({
  ...row,
  acceptedAt: row.acceptedAt?.toISOString() ?? null,
  partCount: Number(row.partCount),
  materials: row.materials ?? [],
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

/** `%text%` for ILIKE, the pattern's own characters (`%`, `_`, `\\`) matched as typed. */
const containing = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** What each sortable column sorts by: names ignoring case, status in work order, jobs without a due date last. */
const SORT_KEYS: Record<JobSortColumn, SQL> = {
  name: sql`lower(${jobs.name})`,
  customer: sql`lower(${customers.name})`,
  status: sql`array_position(array[${sql.raw(JOB_STATUSES.map((s) => `'${s}'`).join(', '))}]::job_status[], ${jobs.status})`,
  due: sql`${jobs.dueDate}`,
  parts: sql`${jobs.partPieces}`,
  updated: sql`${jobs.updatedAt}`,
};

/** What a jobs-list statement binds; each view's shape (filters present, sort) is one prepared statement. */
type JobListValues = { shopId: string; status: string; customer: string; like: string; size: number; offset: number };

/**
 * The statement of one shape of view: which filters it has and how it sorts (at most 3 × 2 × 2 × 12 shapes, made
 * once each). One statement: the page's jobs with their customer as JSON (sorted on the server, ties by id, so pages
 * never overlap; the default order reads jobs_shop_updated_idx and stops after the page), the counts the list's
 * controls need, and the customers' names. A job's pieces and materials are kept on the job by a trigger on parts
 * (migration 0014).
 */
function jobListStatement(q: Pick<JobListQuery, 'status' | 'customer' | 'q' | 'sort'>): PreparedRead<JobListValues> {
  const statusKind = q.status === '' ? 'open' : q.status === 'all' ? 'all' : 'one';
  const key = `${statusKind}|${q.customer ? 'c' : ''}|${q.q ? 'q' : ''}|${q.sort}`;
  let statement = jobListStatements.get(key);
  if (statement) return statement;
  statement = new PreparedRead<JobListValues>((v) => {
    const filters: SQL[] = [sql`${jobs.shopId} = ${v('shopId')}`];
    if (statusKind === 'open') filters.push(sql`${jobs.status} <> 'archived'`);
    else if (statusKind === 'one') filters.push(sql`${jobs.status} = ${v('status')}`);
    if (q.customer) filters.push(sql`lower(${customers.name}) = lower(${v('customer')})`);
    if (q.q) {
      const like = v('like');
      filters.push(
        sql`(${jobs.name} ilike ${like} or ${customers.name} ilike ${like} or exists (select 1 from unnest(${jobs.partMaterials}) m where m ilike ${like}))`,
      );
    }
    const where = and(...filters)!;
    const needsCustomer = Boolean(q.customer || q.q) || q.sort.startsWith('customer.');
    const [column, dir] = q.sort.split('.') as [JobSortColumn, 'asc' | 'desc'];
    const sortKey = SORT_KEYS[column];
    // Empty values (no customer, no due date) go last either way round; ties by id the same way round.
    const order =
      column === 'updated' // never empty: plain, so the index serves it
        ? dir === 'asc'
          ? [asc(jobs.updatedAt), asc(jobs.id)]
          : [desc(jobs.updatedAt), desc(jobs.id)]
        : dir === 'asc'
          ? [sql`${sortKey} asc nulls last`, asc(jobs.id)]
          : [sql`${sortKey} desc nulls last`, desc(jobs.id)];
    const orderBy = sql.join(order, sql`, `);
    const customerJoin = needsCustomer ? sql`left join ${customers} on ${customers.id} = ${jobs.customerId}` : sql``;
    // The page's rows sorted in the statement (a top-N sort keeps only the page) and numbered, so their JSON keeps
    // the order.
    return sql`
      select (select coalesce(json_agg(page order by page.ord), '[]'::json) from (
                select row_number() over (order by ${orderBy}) as ord, ${jobs.id} as "id", ${jobs.name} as "name",
                       coalesce(${customers.name}, '') as "customer", ${jobs.customerId} as "customerId", ${jobs.status} as "status",
                       ${jobs.dueDate} as "dueDate", ${jobs.notes} as "notes", ${isoText(jobs.acceptedAt)} as "acceptedAt",
                       ${isoText(jobs.createdAt)} as "createdAt", ${isoText(jobs.updatedAt)} as "updatedAt",
                       ${jobs.partPieces} as "partCount", ${jobs.partMaterials} as "materials"
                  from ${jobs} left join ${customers} on ${customers.id} = ${jobs.customerId}
                 where ${where}
                 order by ${orderBy}
                 limit ${v('size')} offset ${v('offset')}) page) as jobs,
             counts.total, counts.shop_jobs, counts.archived,
             (select coalesce(json_agg(c.name), '[]'::json) from ${customers} c
               where c.shop_id = ${v('shopId')} and exists (select 1 from ${jobs} j where j.customer_id = c.id)) as customers
        from (select count(*) filter (where ${where})::int as total, count(*)::int as shop_jobs,
                     count(*) filter (where ${jobs.status} = 'archived')::int as archived
                from ${jobs} ${customerJoin}
               where ${jobs.shopId} = ${v('shopId')}) counts`;
  });
  jobListStatements.set(key, statement);
  return statement;
}

const jobListStatements = new Map<string, PreparedRead<JobListValues>>();

/** Customers' names in the order people read them (one collator: making one per comparison cost more than the sort). */
const byName = new Intl.Collator('en', { sensitivity: 'base' });

/** A json column as the driver hands it: text from the embedded database's protocol, parsed already by others. */
const fromJson = <T>(value: unknown): T => (typeof value === 'string' ? JSON.parse(value) : value) as T;

/**
 * One page of a shop's jobs as the jobs list shows them: filtered by status (archived left out unless asked for) and
 * customer, searched in the job's name, its customer's name and its parts' materials (any case), sorted on the
 * server (ties by id, so pages never overlap), with the counts the list's controls need, in one prepared statement.
 */
export async function listJobsPage({ db, shopId }: ShopScope, q: JobListQuery): Promise<JobListPage> {
  const [row] = await jobListStatement(q).rows(db, {
    shopId,
    status: q.status,
    customer: q.customer,
    like: containing(q.q),
    size: q.size,
    offset: (q.page - 1) * q.size,
  });
  const rows = fromJson<(JobSummary & { ord?: number })[]>(row.jobs);
  const total = Number(row.total);
  return {
    jobs: rows.map(({ ord: _ord, ...j }) => ({ ...j, partCount: Number(j.partCount), materials: [...new Set(j.materials)].sort() })),
    total,
    page: q.page,
    pageSize: q.size,
    pageCount: Math.max(1, Math.ceil(total / q.size)),
    sort: q.sort,
    shopJobs: Number(row.shop_jobs),
    archived: Number(row.archived),
    customers: fromJson<string[]>(row.customers).sort(byName.compare),
  };
}

export async function getJob({ db, shopId }: ShopScope, id: string): Promise<JobSummary> {
  const [row] = await selectSummaries(db, shopId).where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
  if (!row) throw notFound('That job');
  return toSummary(row);
}

export async function createJob({ db, shopId, userId }: Scope, input: JobInput): Promise<JobSummary> {
  const id = await db.transaction(async (tx) => {
    const { customer, ...fields } = input;
    const customerId = await resolveCustomer({ db: tx, shopId, userId }, customer);
    const [row] = await tx
      .insert(jobs)
      .values({ ...fields, customerId, acceptedAt: input.status === 'accepted' ? new Date() : null, shopId, createdBy: userId })
      .returning({ id: jobs.id });
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'job', entityId: row.id, data: { name: input.name } });
    return row.id;
  });
  return getJob({ db, shopId }, id);
}

/** Who is changing a job: the status rules depend on the role. */
export interface JobEditor {
  id: string;
  role: Role;
}

/**
 * Changes what the patch sends (only fields whose value differs are written; the audit keeps each as from → to). A
 * status set by hand follows the rules of lib/jobs/status.ts for the person's role; marking a job accepted records when.
 */
export async function updateJob({ db, shopId }: ShopScope, editor: JobEditor, id: string, patch: JobPatch): Promise<JobSummary> {
  await db.transaction(async (tx) => {
    const [job] = await tx
      .select()
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)))
      .for('update');
    if (!job) throw notFound('That job');
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    const { customer, ...fields } = patch;
    for (const [field, to] of Object.entries(fields) as [Exclude<keyof JobPatch, 'customer'>, unknown][]) {
      if (to !== undefined && to !== job[field]) changes[field] = { from: job[field], to };
    }
    if (customer !== undefined) {
      const customerId = await resolveCustomer({ db: tx, shopId, userId: editor.id }, customer);
      if (customerId !== job.customerId) changes.customerId = { from: job.customerId, to: customerId };
    }
    if (!Object.keys(changes).length) return;
    const set: Partial<typeof jobs.$inferInsert> = Object.fromEntries(Object.entries(changes).map(([f, c]) => [f, c.to]));
    if (patch.status && changes.status) {
      const refused = refuseManualStatus(editor.role, job.status, patch.status, await jobFacts({ db: tx, shopId }, id, job.acceptedAt));
      if (refused) throw forbidden(refused);
      set.acceptedAt = acceptedAtAfter(patch.status, job.acceptedAt, new Date());
    }
    await tx
      .update(jobs)
      .set({ ...set, updatedAt: new Date() })
      .where(eq(jobs.id, id));
    await recordAudit(tx, { shopId, userId: editor.id, action: 'update', entity: 'job', entityId: id, data: { changes } });
  });
  return getJob({ db, shopId }, id);
}

/** A job with history — a plan that was ever released, or stock moved for one of its plans — is archived, not deleted. */
export class JobHasHistory extends DomainError {
  constructor(name: string) {
    super(
      'conflict',
      `“${name}” has history (plans released to the saw, stock moved for them): archive it instead, so the stock and yield ledgers keep their plans. Archived jobs leave the jobs list until you filter for them.`,
    );
  }
}

/** Deletes a job with its cut list and draft plans; refuses one with history (JobHasHistory), in the same statement. */
export async function deleteJob({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
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
      return;
    }
    const [kept] = await tx
      .select({ name: jobs.name })
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.id, id)));
    if (kept) throw new JobHasHistory(kept.name);
    throw notFound('That job');
  });
}
