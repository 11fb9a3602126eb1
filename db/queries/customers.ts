import type { CustomerJob } from '@/shared/wire/jobs';
import type { Scope, ShopScope } from '../scope';
import { and, asc, desc, eq, ilike, or, sql } from 'drizzle-orm';
import { customers, jobs } from '../schema';
import type { Customer, CustomerInput, CustomerPatch } from '@/shared/schemas/customer';
import { recordAudit } from './audit';
import { invalid, conflict, notFound } from '@/lib/errors';

type CustomerRow = typeof customers.$inferSelect;

const toCustomer = (row: CustomerRow, jobCount: number): Customer => ({
  id: row.id,
  name: row.name,
  company: row.company,
  email: row.email,
  phone: row.phone,
  billingAddress: row.billingAddress,
  siteAddress: row.siteAddress,
  notes: row.notes,
  jobCount,
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

// Written out in full: inside the subquery an unqualified "id" would be the job's.
const jobCount = sql<number>`(select count(*)::int from "jobs" as j where j."customer_id" = "customers"."id")`;

/** Escapes LIKE's wildcards, so a search for "50%" finds "50%" and not everything. */
const likeText = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** The shop's customers by name; a search matches name, company, e-mail or phone (any case). */
export async function listCustomers({ db, shopId }: ShopScope, search = ''): Promise<Customer[]> {
  const text = search.trim();
  const match = text ? or(...[customers.name, customers.company, customers.email, customers.phone].map((c) => ilike(c, likeText(text)))) : undefined;
  const rows = await db
    .select({ row: customers, jobCount })
    .from(customers)
    .where(and(eq(customers.shopId, shopId), match))
    .orderBy(asc(sql`lower(${customers.name})`), asc(customers.id));
  return rows.map((r) => toCustomer(r.row, Number(r.jobCount)));
}

export type { CustomerJob } from '@/shared/wire/jobs';

export async function getCustomer({ db, shopId }: ShopScope, id: string): Promise<Customer & { jobs: CustomerJob[] }> {
  const [found] = await db
    .select({ row: customers, jobCount })
    .from(customers)
    .where(and(eq(customers.shopId, shopId), eq(customers.id, id)));
  if (!found) throw notFound('That customer');
  const jobRows = await db
    .select({ id: jobs.id, name: jobs.name, status: jobs.status, dueDate: jobs.dueDate, updatedAt: jobs.updatedAt })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.customerId, id)))
    .orderBy(desc(jobs.updatedAt), asc(jobs.id));
  return { ...toCustomer(found.row, Number(found.jobCount)), jobs: jobRows.map((j) => ({ ...j, updatedAt: j.updatedAt.toISOString() })) };
}

export async function createCustomer({ db, shopId, userId }: Scope, input: CustomerInput): Promise<Customer> {
  const row = await db.transaction(async (tx) => {
    const [created] = await tx
      .insert(customers)
      .values({ ...input, shopId })
      .returning();
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'customer', entityId: created.id, data: { name: input.name } });
    return created;
  });
  return toCustomer(row, 0);
}

export async function updateCustomer({ db, shopId, userId }: Scope, id: string, patch: CustomerPatch): Promise<Customer> {
  await db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(customers)
      .where(and(eq(customers.shopId, shopId), eq(customers.id, id)))
      .for('update');
    if (!current) throw notFound('That customer');
    const changes = Object.fromEntries(
      Object.entries(patch)
        .filter(([k, v]) => v !== undefined && v !== current[k as keyof CustomerRow])
        .map(([k, v]) => [k, { from: current[k as keyof CustomerRow], to: v }]),
    );
    if (!Object.keys(changes).length) return;
    await tx
      .update(customers)
      .set({ ...Object.fromEntries(Object.entries(changes).map(([k, c]) => [k, c.to])), updatedAt: new Date() })
      .where(eq(customers.id, id));
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'customer', entityId: id, data: { changes } });
  });
  const { jobs: _jobs, ...customer } = await getCustomer({ db, shopId }, id);
  return customer;
}

/** Deletes a customer no job belongs to; one with jobs is kept (409), so no job loses who it is for. */
export async function deleteCustomer({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(customers)
      .where(and(eq(customers.shopId, shopId), eq(customers.id, id)))
      .for('update');
    if (!current) throw notFound('That customer');
    const [{ n }] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(jobs)
      .where(eq(jobs.customerId, id));
    if (Number(n) > 0) throw conflict(`${current.name} has ${n} job${Number(n) === 1 ? '' : 's'}: move them to another customer first.`);
    await tx.delete(customers).where(eq(customers.id, id));
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'customer', entityId: id, data: { name: current.name } });
  });
}

/** The customer a job is for, as its quote and e-mail need them; null for a job that has none. */
export async function customerOfJob({ db, shopId }: ShopScope, job: { customerId: string | null }): Promise<CustomerRow | null> {
  if (!job.customerId) return null;
  const [row] = await db
    .select()
    .from(customers)
    .where(and(eq(customers.shopId, shopId), eq(customers.id, job.customerId)));
  return row ?? null;
}

/** Name spelled the way the migration compares them: trimmed, runs of spaces made one. */
export const tidyName = (name: string) => name.trim().replace(/\s+/g, ' ');

/**
 * The customer a job form picked: an existing one by id (of this shop, or 422), or by name — the shop's customer of
 * that name (letter case ignored) or a new one. Runs inside the job's transaction.
 */
export async function resolveCustomer({ db: tx, shopId, userId }: Scope, choice: { id: string } | { name: string } | null): Promise<string | null> {
  if (choice === null) return null;
  if ('id' in choice) {
    const [found] = await tx
      .select({ id: customers.id })
      .from(customers)
      .where(and(eq(customers.shopId, shopId), eq(customers.id, choice.id)));
    if (!found) throw invalid('That customer was not found.', { customer: ['Pick one of the shop’s customers.'] });
    return found.id;
  }
  const name = tidyName(choice.name);
  const [found] = await tx
    .select({ id: customers.id })
    .from(customers)
    .where(and(eq(customers.shopId, shopId), sql`lower(${customers.name}) = lower(${name})`))
    .orderBy(asc(customers.createdAt))
    .limit(1);
  if (found) return found.id;
  const [created] = await tx.insert(customers).values({ shopId, name }).returning({ id: customers.id });
  await recordAudit(tx, { shopId, userId, action: 'create', entity: 'customer', entityId: created.id, data: { name } });
  return created.id;
}
