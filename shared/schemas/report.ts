import { z } from 'zod';
import { periodStart, REPORT_PERIODS, shopDay } from '@/lib/dates/shop-time';

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Write the day as YYYY-MM-DD, such as 2026-11-30.')
  .refine(
    (d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)) && new Date(`${d}T00:00:00Z`).toISOString().slice(0, 10) === d,
    'That day is not on the calendar.',
  );

/** A report's filters as they stand in its URL: every one optional, so a bare URL shows the last twelve months. */
export const reportQuerySchema = z.object({
  from: day.optional().or(z.literal('').transform(() => undefined)),
  to: day.optional().or(z.literal('').transform(() => undefined)),
  by: z.enum(REPORT_PERIODS, { error: 'Group by week or month.' }).default('month'),
  material: z
    .string()
    .trim()
    .max(200)
    .optional()
    .transform((m) => m || undefined),
  /** One customer's work, or one job's (by id). */
  customer: z
    .uuid({ error: 'Pick a customer from the list.' })
    .optional()
    .or(z.literal('').transform(() => undefined)),
  job: z
    .uuid({ error: 'Pick a job from the list.' })
    .optional()
    .or(z.literal('').transform(() => undefined)),
});
export type ReportQuery = z.infer<typeof reportQuerySchema>;

/** The longest range a report groups: ten years of weeks is already 520 bars. */
const MAX_RANGE_DAYS = 3660;

/**
 * The filter's days, with the defaults filled in on the shop's clock: up to today, from the start of the month
 * eleven months back (by month) or of the week twelve weeks back (by week). Refuses a range that runs backwards.
 */
export function reportRange(
  q: ReportQuery,
  timeZone: string,
  now = new Date(),
): { from: string; to: string; by: ReportQuery['by'] } | { error: string } {
  const to = q.to ?? shopDay(now, timeZone);
  let from = q.from;
  if (!from) {
    const end = new Date(`${to}T00:00:00Z`);
    if (q.by === 'month') end.setUTCMonth(end.getUTCMonth() - 11, 1);
    else end.setUTCDate(end.getUTCDate() - 7 * 12);
    from = periodStart(end.toISOString().slice(0, 10), q.by);
  }
  if (from > to) return { error: `The range runs backwards: ${from} is after ${to}.` };
  const days = (Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000;
  if (days > MAX_RANGE_DAYS) return { error: 'A report covers at most ten years: narrow the range.' };
  return { from, to, by: q.by };
}
