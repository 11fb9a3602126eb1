'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { usePathname, useSearchParams } from 'next/navigation';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { call } from '@/client/api';
import { JOB_STATUS_FILTERS } from '@/lib/jobs/status-filter';
import type { JobSummary } from '@/shared/schemas/job';
import {
  JOB_PAGE_SIZES,
  jobListQuerySchema,
  jobListSearch,
  type JobListPage,
  type JobListQuery,
  type JobSortColumn,
} from '@/shared/schemas/job-list';
import { JobStatusBadge } from './job-status';
import { NewJobForm } from './new-job-form';
import { shopDay } from '@/lib/dates/shop-time';

interface Column {
  id: string;
  header: string;
  /** The server's sort key; none for a column that does not sort. */
  sort?: JobSortColumn;
  numeric?: boolean;
  /** Narrower screens leave the column out (a phone shows the job, its customer under it, its status and due day). */
  from?: 'sm' | 'md';
  cell: (job: JobSummary, timeZone: string) => ReactNode;
}

const SHOWN_FROM = { sm: 'hidden sm:table-cell', md: 'hidden md:table-cell' } as const;
const cellClass = (c: Column) => [c.numeric ? 'num' : '', c.from ? SHOWN_FROM[c.from] : ''].filter(Boolean).join(' ') || undefined;

const COLUMNS: Column[] = [
  {
    id: 'name',
    header: 'Job',
    sort: 'name',
    cell: (j) => (
      <>
        <Link href={`/jobs/${j.id}`} className="font-medium text-graphite">
          {j.name}
        </Link>
        {j.customer && <span className="block text-xs text-graphite-mute sm:hidden">{j.customer}</span>}
      </>
    ),
  },
  { id: 'customer', header: 'Customer', sort: 'customer', from: 'sm', cell: (j) => j.customer },
  // Work order, not alphabetical: quoting → quoted → accepted → deposit paid → cutting → done → declined → expired → archived.
  { id: 'status', header: 'Status', sort: 'status', cell: (j) => <JobStatusBadge status={j.status} /> },
  { id: 'due', header: 'Due', sort: 'due', cell: (j) => <span className="whitespace-nowrap">{j.dueDate ?? '—'}</span> },
  { id: 'parts', header: 'Parts', sort: 'parts', numeric: true, from: 'sm', cell: (j) => j.partCount },
  { id: 'materials', header: 'Materials', from: 'md', cell: (j) => <span className="text-graphite-soft">{j.materials.join(', ') || '—'}</span> },
  // The day on the shop's clock (a US shop's evening is not tomorrow).
  {
    id: 'updated',
    header: 'Changed',
    sort: 'updated',
    from: 'md',
    cell: (j, timeZone) => <span className="whitespace-nowrap text-graphite-mute">{shopDay(new Date(j.updatedAt), timeZone)}</span>,
  },
];

/**
 * Jobs as a table, one page at a time: search, filters, sort, page and page size live in the URL (so a link keeps the
 * view) and are applied on the server. The server renders the first view; later ones come from the API.
 */
export function JobsBoard({
  canWrite,
  timeZone,
  initial,
  initialQuery,
}: {
  canWrite: boolean;
  timeZone: string;
  initial: JobListPage;
  initialQuery: JobListQuery;
}) {
  const pathname = usePathname();
  const params = useSearchParams();
  const query = useMemo(() => {
    const parsed = jobListQuerySchema.safeParse(Object.fromEntries(params));
    return parsed.success ? parsed.data : initialQuery;
  }, [params, initialQuery]);
  const search = jobListSearch(query);
  const initialSearch = jobListSearch(initialQuery);
  const [creating, setCreating] = useState(false);
  const jobs = useQuery({
    queryKey: ['jobs', search],
    queryFn: () => call('GET /api/jobs', { query }),
    initialData: search === initialSearch ? initial : undefined,
    // The page stays on screen while the next one loads.
    placeholderData: keepPreviousData,
  });

  /** A new view in the URL without a round trip for the page itself (Next's router follows replaceState). */
  function setView(change: Partial<JobListQuery>) {
    // Any change but the page itself starts again from the first page.
    const next = { ...query, page: 1, ...change };
    const qs = jobListSearch(next);
    window.history.replaceState(null, '', `${pathname}${qs ? `?${qs}` : ''}`);
  }

  // Typing searches once the typist pauses, not at every key.
  const [typed, setTyped] = useState(query.q);
  const typing = useRef<ReturnType<typeof setTimeout>>(undefined);
  useEffect(() => () => clearTimeout(typing.current), []);
  function onSearch(value: string) {
    setTyped(value);
    clearTimeout(typing.current);
    typing.current = setTimeout(() => setView({ q: value.trim() }), 250);
  }

  function toggleSort(column: JobSortColumn) {
    const [current, dir] = query.sort.split('.');
    // Always ascending first, then back and forth.
    setView({ sort: current === column && dir === 'asc' ? `${column}.desc` : `${column}.asc` });
  }

  const data = jobs.data;
  const rows = data?.jobs ?? [];
  const [sortColumn, sortDir] = query.sort.split('.');

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <div className="w-72 max-w-full">
          <label htmlFor="job-search" className="field-label">
            Search
          </label>
          <input
            id="job-search"
            className="field-input"
            placeholder="Job, customer or material"
            value={typed}
            onChange={(e) => onSearch(e.target.value)}
          />
        </div>
        <div>
          <label htmlFor="job-filter-status" className="field-label">
            Status
          </label>
          <select
            id="job-filter-status"
            className="field-input"
            value={query.status}
            onChange={(e) => setView({ status: e.target.value as JobListQuery['status'] })}
          >
            {JOB_STATUS_FILTERS.map((f) => (
              <option key={f.value} value={f.value}>
                {f.label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="job-filter-customer" className="field-label">
            Customer
          </label>
          <select
            id="job-filter-customer"
            className="field-input max-w-[14rem]"
            value={query.customer}
            onChange={(e) => setView({ customer: e.target.value })}
          >
            <option value="">Any</option>
            {query.customer && !data?.customers.includes(query.customer) && <option value={query.customer}>{query.customer}</option>}
            {(data?.customers ?? []).map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        </div>
        {canWrite && !creating && (
          <button type="button" className="btn-accent ml-auto" onClick={() => setCreating(true)}>
            New job
          </button>
        )}
      </div>
      {creating && <NewJobForm onDone={() => setCreating(false)} />}

      {jobs.isPending && (
        <p className="text-sm text-graphite-mute" role="status">
          Loading jobs…
        </p>
      )}
      {jobs.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load jobs: {jobs.error.message}{' '}
          <button className="underline" onClick={() => jobs.refetch()}>
            Try again
          </button>
        </p>
      )}
      {data && data.total === 0 && (
        <EmptyState title={data.shopJobs ? 'No job matches these filters.' : 'No jobs yet.'}>
          {data.shopJobs
            ? 'Clear the search or pick another status or customer.'
            : canWrite
              ? 'Create the first job to start its cut list.'
              : 'Jobs appear here once an estimator creates them.'}
        </EmptyState>
      )}
      {data && data.total > 0 && rows.length === 0 && (
        <EmptyState title={`Page ${data.page} is past the last page.`}>
          <a
            href={`${pathname}?${jobListSearch({ ...query, page: data.pageCount })}`}
            onClick={(e) => {
              e.preventDefault();
              setView({ page: data.pageCount });
            }}
            className="underline"
          >
            Go to page {data.pageCount}
          </a>
        </EmptyState>
      )}
      {data && rows.length > 0 && (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Jobs" aria-busy={jobs.isPlaceholderData || undefined}>
            <thead>
              <tr>
                {COLUMNS.map((c) => {
                  const sorted = c.sort && sortColumn === c.sort ? sortDir : undefined;
                  return (
                    <th key={c.id} className={cellClass(c)} aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}>
                      {c.sort ? (
                        <button type="button" className="uppercase tracking-wide hover:text-graphite" onClick={() => toggleSort(c.sort!)}>
                          {c.header}
                          <span aria-hidden className="ml-1">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                          </span>
                        </button>
                      ) : (
                        c.header
                      )}
                    </th>
                  );
                })}
              </tr>
            </thead>
            <tbody>
              {rows.map((job) => (
                <tr key={job.id} className="hover:bg-paper">
                  {COLUMNS.map((c) => (
                    <td key={c.id} className={cellClass(c)}>
                      {c.cell(job, timeZone)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          <Pager page={data} query={query} pathname={pathname} setView={setView} />
          {query.status === '' && data.archived > 0 && (
            <p className="border-t border-paper-edge px-3 py-2 text-xs text-graphite-mute">
              {data.archived} archived not shown (Status: Archived shows them)
            </p>
          )}
        </div>
      )}
    </div>
  );
}

/** Where the page is, the way to the next and previous ones (real links, so they open in a new tab too), and the page size. */
function Pager({
  page,
  query,
  pathname,
  setView,
}: {
  page: JobListPage;
  query: JobListQuery;
  pathname: string;
  setView: (change: Partial<JobListQuery>) => void;
}) {
  const first = (page.page - 1) * page.pageSize + 1;
  const last = Math.min(page.total, page.page * page.pageSize);
  const link = (to: number, label: string, rel: 'prev' | 'next') => {
    const disabled = to < 1 || to > page.pageCount;
    if (disabled)
      return (
        <span className="btn-quiet pointer-events-none opacity-40" aria-disabled="true">
          {label}
        </span>
      );
    const qs = jobListSearch({ ...query, page: to });
    return (
      <a
        href={`${pathname}${qs ? `?${qs}` : ''}`}
        rel={rel}
        className="btn-quiet"
        onClick={(e) => {
          e.preventDefault();
          setView({ page: to });
        }}
      >
        {label}
      </a>
    );
  };
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center gap-x-4 gap-y-2 border-t border-paper-edge px-3 py-2 text-xs text-graphite-mute">
      <p data-testid="jobs-range">
        {first}–{last} of {page.total} {page.total === 1 ? 'job' : 'jobs'} · page {page.page} of {page.pageCount}
      </p>
      <div className="ml-auto flex items-center gap-2">
        {link(page.page - 1, '‹ Previous', 'prev')}
        {link(page.page + 1, 'Next ›', 'next')}
        <label htmlFor="job-page-size" className="ml-2">
          Per page
        </label>
        <select
          id="job-page-size"
          className="field-input w-auto py-1 text-xs"
          value={page.pageSize}
          onChange={(e) => setView({ size: Number(e.target.value) })}
        >
          {JOB_PAGE_SIZES.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </div>
    </nav>
  );
}
