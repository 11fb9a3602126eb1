import { z } from 'zod';
import { JOB_STATUSES, type JobSummary } from './job';
import { text } from './text';

/** The columns the jobs list sorts by, on the server. */
export const JOB_SORT_COLUMNS = ['name', 'customer', 'status', 'due', 'parts', 'updated'] as const;
export type JobSortColumn = (typeof JOB_SORT_COLUMNS)[number];
export const JOB_SORTS = JOB_SORT_COLUMNS.flatMap((c) => [`${c}.asc`, `${c}.desc`] as const);
export type JobSort = `${JobSortColumn}.${'asc' | 'desc'}`;
export const DEFAULT_JOB_SORT: JobSort = 'updated.desc';

export const JOB_PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_JOB_PAGE_SIZE = 25;
/** Far beyond any shop's jobs at the largest page size; a bigger number is a typo, not a page. */
export const MAX_JOB_PAGE = 100_000;

/** The status filter: '' every job still in play (archived left out), one status, or `all`. */
export const JOB_LIST_STATUSES = ['', 'all', ...JOB_STATUSES] as const;

/** An empty field in the URL (`?page=`) means the default, as if it were not there. */
const blankIsDefault = (v: unknown) => (v === '' ? undefined : v);

const PAGE_MESSAGE = 'The page is a whole number, 1 or more.';
const SIZE_MESSAGE = `A page holds ${JOB_PAGE_SIZES.slice(0, -1).join(', ')} or ${JOB_PAGE_SIZES.at(-1)} jobs.`;

/** A whole number from the URL, with its message for anything else; blank or missing is `fallback`. */
const wholeNumber = (message: string, range: z.ZodType<number, number>, fallback: number) =>
  z
    .preprocess(
      blankIsDefault,
      z.coerce
        .number({ error: message })
        .refine((n) => Number.isSafeInteger(n), message)
        .pipe(range)
        .optional(),
    )
    .transform((n) => n ?? fallback);

/**
 * The jobs list's view as it stands in the URL (and the API's query string): page, page size, sort, search, status
 * and customer. Every one is optional, so a bare `/jobs` is the first page of open jobs, latest change first.
 */
export const jobListQuerySchema = z.object({
  page: wholeNumber(
    PAGE_MESSAGE,
    z
      .number()
      .min(1, PAGE_MESSAGE)
      .max(MAX_JOB_PAGE, `The page is at most ${MAX_JOB_PAGE.toLocaleString('en-US')}.`),
    1,
  ),
  size: wholeNumber(
    SIZE_MESSAGE,
    z.number().refine((n) => (JOB_PAGE_SIZES as readonly number[]).includes(n), SIZE_MESSAGE),
    DEFAULT_JOB_PAGE_SIZE,
  ),
  sort: z
    .preprocess(
      blankIsDefault,
      z
        .enum(JOB_SORTS as unknown as [JobSort, ...JobSort[]], {
          error: `Sort by ${JOB_SORT_COLUMNS.join(', ')}, each .asc or .desc (say updated.desc).`,
        })
        .optional(),
    )
    .transform((s): JobSort => s ?? DEFAULT_JOB_SORT),
  q: text({ max: 120, maxMessage: 'Search for at most 120 characters.' }).default(''),
  status: z.enum(JOB_LIST_STATUSES, { error: `Status is one of ${JOB_STATUSES.join(', ')} or all.` }).default(''),
  customer: text({ max: 120, maxMessage: 'A customer’s name is at most 120 characters.' }).default(''),
});
export type JobListQuery = z.infer<typeof jobListQuerySchema>;

/** One page of the jobs list with what the list's controls need. */
export interface JobListPage {
  jobs: JobSummary[];
  /** Jobs matching the filters and search, on every page. */
  total: number;
  page: number;
  pageSize: number;
  /** At least 1, so "page 1 of 1" reads right for an empty list. */
  pageCount: number;
  sort: JobSort;
  /** Every job of the shop, and how many of them are archived (the hint under the default view). */
  shopJobs: number;
  archived: number;
  /** Customers' names of the shop's jobs, for the Customer filter. */
  customers: string[];
}

/** The query string of a view, with defaults left out (so `/jobs` stays `/jobs`). */
export function jobListSearch(q: Partial<JobListQuery>): string {
  const out = new URLSearchParams();
  if (q.q) out.set('q', q.q);
  if (q.status) out.set('status', q.status);
  if (q.customer) out.set('customer', q.customer);
  if (q.sort && q.sort !== DEFAULT_JOB_SORT) out.set('sort', q.sort);
  if (q.size && q.size !== DEFAULT_JOB_PAGE_SIZE) out.set('size', String(q.size));
  if (q.page && q.page !== 1) out.set('page', String(q.page));
  return out.toString();
}
