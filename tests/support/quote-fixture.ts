import type { Db } from '@/db/open';
import { customers, jobs, quoteRevisions, quotes } from '@/db/schema';
import type { QuoteLine } from '@/shared/schemas/quote';
import { nextNumber } from './unique';

/**
 * A job of the shop, for a customer with an e-mail address, with a draft quote (rev A) of the lines given: a quote
 * as `createQuote` leaves it.
 */
export async function jobWithDraftQuote(
  db: Db,
  shopId: string,
  lines: QuoteLine[] = [
    { id: 'o-1', kind: 'other', description: 'Delivery', quantity: 1, unit: 'trip', unitCostMinor: 7500, taxable: false, note: '' },
  ],
) {
  const n = nextNumber();
  const [customer] = await db
    .insert(customers)
    .values({ shopId, name: `Quote customer ${n}`, email: `customer-${n}@example.com` })
    .returning();
  const [job] = await db
    .insert(jobs)
    .values({ shopId, name: `Quoted job ${n}`, customerId: customer.id })
    .returning();
  const [quote] = await db
    .insert(quotes)
    .values({ shopId, jobId: job.id, number: 100_000 + n })
    .returning();
  const [rev] = await db
    .insert(quoteRevisions)
    .values({
      shopId,
      quoteId: quote.id,
      jobId: job.id,
      revision: 0,
      currency: 'USD',
      lines,
      markupMaterialPercent: 30,
      markupHardwarePercent: 20,
      discount: { kind: 'percent', percent: 0 },
      taxPercent: 0,
      depositPercent: 50,
      validityDays: 30,
      terms: 'Terms.',
    })
    .returning();
  return { job, customer, quote, revision: rev };
}
