'use client';

import { useQuery } from '@tanstack/react-query';
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import Link from 'next/link';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useMemo, useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { api } from '@/lib/client/api';
import { jobMatchesSearch } from '@/lib/jobs/search';
import { JOB_STATUS_FILTERS, jobInStatusFilter, readStatusFilter, type JobStatusFilter } from '@/lib/jobs/status-filter';
import { JOB_STATUSES, type JobSummary } from '@/shared/schemas/job';
import { JobStatusBadge } from './job-status';
import { NewJobForm } from './new-job-form';
import { shopDay } from '@/lib/dates/shop-time';

const matchesSearch: FilterFn<JobSummary> = (row, _columnId, needle: string) => jobMatchesSearch(row.original, needle);
const matchesStatus: FilterFn<JobSummary> = (row, _columnId, filter: JobStatusFilter) => jobInStatusFilter(row.original.status, filter);

const columns: ColumnDef<JobSummary>[] = [
  { id: 'name', header: 'Job', accessorKey: 'name', cell: ({ row }) => <Link href={`/jobs/${row.original.id}`} className="font-medium text-graphite">{row.original.name}</Link> },
  { id: 'customer', header: 'Customer', accessorKey: 'customer', filterFn: 'equalsString' },
  {
    id: 'status',
    header: 'Status',
    accessorKey: 'status',
    filterFn: matchesStatus,
    // Work order, not alphabetical: quoting → quoted → accepted → cutting → done → archived.
    sortingFn: (a, b) => JOB_STATUSES.indexOf(a.original.status) - JOB_STATUSES.indexOf(b.original.status),
    cell: ({ row }) => <JobStatusBadge status={row.original.status} />,
  },
  { id: 'due', header: 'Due', accessorFn: (j) => j.dueDate ?? undefined, sortUndefined: 'last', cell: ({ row }) => <span className="whitespace-nowrap">{row.original.dueDate ?? '—'}</span> },
  { id: 'parts', header: 'Parts', accessorKey: 'partCount', meta: { numeric: true } },
  { id: 'materials', header: 'Materials', accessorFn: (j) => j.materials.join(', '), enableSorting: false, cell: ({ getValue }) => <span className="text-graphite-soft">{(getValue() as string) || '—'}</span> },
  // The day on the shop's clock (a US shop's evening is not tomorrow).
  { id: 'updated', header: 'Changed', accessorKey: 'updatedAt', cell: ({ row, table }) => <span className="whitespace-nowrap text-graphite-mute">{shopDay(new Date(row.original.updatedAt), (table.options.meta as { timeZone: string }).timeZone)}</span> },
];

// One stable empty list while loading: a fresh `[]` each render makes the table recompute (and re-render) endlessly.
const NO_JOBS: JobSummary[] = [];

/** Jobs as a sortable, filterable table; search, filters and sort live in the URL so a view can be bookmarked. */
export function JobsBoard({ canWrite, timeZone }: { canWrite: boolean; timeZone: string }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const search = params.get('q') ?? '';
  const status = readStatusFilter(params.get('status'));
  const customer = params.get('customer') ?? '';
  const sort = params.get('sort') ?? 'updated.desc';
  const [creating, setCreating] = useState(false);
  const jobs = useQuery({ queryKey: ['jobs'], queryFn: () => api<JobSummary[]>('/api/jobs') });

  function setParam(key: string, value: string) {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    router.replace(`${pathname}${next.size ? `?${next}` : ''}`);
  }

  const sorting: SortingState = useMemo(() => {
    const [id, dir] = sort.split('.');
    return columns.some((c) => c.id === id) ? [{ id, desc: dir === 'desc' }] : [];
  }, [sort]);
  // The status filter always applies: by default it leaves archived jobs out.
  const columnFilters = useMemo(() => [{ id: 'status', value: status }, ...(customer ? [{ id: 'customer', value: customer }] : [])], [status, customer]);
  const customers = useMemo(() => [...new Set((jobs.data ?? []).map((j) => j.customer).filter(Boolean))].sort(), [jobs.data]);

  const table = useReactTable({
    data: jobs.data ?? NO_JOBS,
    columns,
    meta: { timeZone },
    state: { sorting, columnFilters, globalFilter: search },
    globalFilterFn: matchesSearch,
    // Always ascending first: left to itself the table guesses from the first row's value, and a job with no due
    // date at the top would flip the first click to descending.
    sortDescFirst: false,
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      setParam('sort', next[0] ? `${next[0].id}.${next[0].desc ? 'desc' : 'asc'}` : '');
    },
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const rows = table.getRowModel().rows;
  const archivedCount = (jobs.data ?? NO_JOBS).filter((j) => j.status === 'archived').length;

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <div className="w-72">
          <label htmlFor="job-search" className="field-label">Search</label>
          <input id="job-search" className="field-input" placeholder="Job, customer or material" defaultValue={search} onChange={(e) => setParam('q', e.target.value)} />
        </div>
        <div>
          <label htmlFor="job-filter-status" className="field-label">Status</label>
          <select id="job-filter-status" className="field-input" value={status} onChange={(e) => setParam('status', e.target.value)}>
            {JOB_STATUS_FILTERS.map((f) => <option key={f.value} value={f.value}>{f.label}</option>)}
          </select>
        </div>
        <div>
          <label htmlFor="job-filter-customer" className="field-label">Customer</label>
          <select id="job-filter-customer" className="field-input" value={customer} onChange={(e) => setParam('customer', e.target.value)}>
            <option value="">Any</option>
            {customers.map((c) => <option key={c} value={c}>{c}</option>)}
          </select>
        </div>
        {canWrite && !creating && <button type="button" className="btn-accent ml-auto" onClick={() => setCreating(true)}>New job</button>}
      </div>
      {creating && <NewJobForm onDone={() => setCreating(false)} />}

      {jobs.isPending && <p className="text-sm text-graphite-mute" role="status">Loading jobs…</p>}
      {jobs.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load jobs: {jobs.error.message} <button className="underline" onClick={() => jobs.refetch()}>Try again</button>
        </p>
      )}
      {jobs.isSuccess && rows.length === 0 && (
        <EmptyState title={jobs.data.length ? 'No job matches these filters.' : 'No jobs yet.'}>
          {jobs.data.length ? 'Clear the search or pick another status or customer.' : canWrite ? 'Create the first job to start its cut list.' : 'Jobs appear here once an estimator creates them.'}
        </EmptyState>
      )}
      {jobs.isSuccess && rows.length > 0 && (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Jobs">
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => {
                    const sorted = header.column.getIsSorted();
                    const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                    return (
                      <th key={header.id} className={numeric ? 'num' : undefined} aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}>
                        {header.column.getCanSort() ? (
                          <button type="button" className="uppercase tracking-wide hover:text-graphite" onClick={header.column.getToggleSortingHandler()}>
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            <span aria-hidden className="ml-1">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {rows.map((row) => (
                <tr key={row.id} className="hover:bg-paper">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={(cell.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric ? 'num' : undefined}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          <p className="border-t border-paper-edge px-3 py-2 text-xs text-graphite-mute">
            {rows.length} of {jobs.data.length} jobs
            {status === '' && archivedCount > 0 && ` · ${archivedCount} archived not shown (Status: Archived shows them)`}
          </p>
        </div>
      )}
    </div>
  );
}
