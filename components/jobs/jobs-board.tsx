'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useMemo, useState } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { api } from '@/lib/client/api';
import { JOB_STATUS_LABELS, JOB_STATUSES, type JobSummary } from '@/shared/schemas/job';
import { JobStatusBadge } from './job-status';
import { NewJobForm } from './new-job-form';

export function JobsBoard({ canWrite }: { canWrite: boolean }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const search = params.get('q') ?? '';
  const status = params.get('status') ?? '';
  const [creating, setCreating] = useState(false);
  const jobs = useQuery({ queryKey: ['jobs'], queryFn: () => api<JobSummary[]>('/api/jobs') });

  // Filters live in the URL so a filtered list can be bookmarked and shared.
  function setFilter(key: string, value: string) {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    router.replace(`${pathname}${next.size ? `?${next}` : ''}`);
  }

  const shown = useMemo(() => {
    const needle = search.trim().toLowerCase();
    return (jobs.data ?? []).filter(
      (j) =>
        (!status || j.status === status) &&
        (!needle || `${j.name} ${j.customer} ${j.materials.join(' ')}`.toLowerCase().includes(needle)),
    );
  }, [jobs.data, search, status]);

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <div className="w-72">
          <label htmlFor="job-search" className="field-label">Search</label>
          <input id="job-search" className="field-input" placeholder="Job, customer or material" defaultValue={search} onChange={(e) => setFilter('q', e.target.value)} />
        </div>
        <div>
          <label htmlFor="job-status" className="field-label">Status</label>
          <select id="job-status" className="field-input" value={status} onChange={(e) => setFilter('status', e.target.value)}>
            <option value="">Any</option>
            {JOB_STATUSES.map((s) => (
              <option key={s} value={s}>{JOB_STATUS_LABELS[s]}</option>
            ))}
          </select>
        </div>
        {canWrite && !creating && (
          <button type="button" className="btn-accent ml-auto" onClick={() => setCreating(true)}>New job</button>
        )}
      </div>
      {creating && <NewJobForm onDone={() => setCreating(false)} />}

      {jobs.isPending && <p className="text-sm text-graphite-mute" role="status">Loading jobs…</p>}
      {jobs.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load jobs: {jobs.error.message} <button className="underline" onClick={() => jobs.refetch()}>Try again</button>
        </p>
      )}
      {jobs.isSuccess && shown.length === 0 && (
        <EmptyState title={jobs.data.length ? 'No job matches these filters.' : 'No jobs yet.'}>
          {jobs.data.length ? 'Clear the search or pick another status.' : canWrite ? 'Create the first job to start its cut list.' : 'Jobs appear here once an estimator creates them.'}
        </EmptyState>
      )}
      {jobs.isSuccess && shown.length > 0 && (
        <div className="card overflow-hidden">
          <table className="data-table" aria-label="Jobs">
            <thead>
              <tr>
                <th>Job</th>
                <th>Customer</th>
                <th>Status</th>
                <th>Due</th>
                <th className="num">Parts</th>
                <th>Materials</th>
              </tr>
            </thead>
            <tbody>
              {shown.map((job) => (
                <tr key={job.id} className="hover:bg-paper">
                  <td><Link href={`/jobs/${job.id}`} className="font-medium text-graphite">{job.name}</Link></td>
                  <td>{job.customer}</td>
                  <td><JobStatusBadge status={job.status} /></td>
                  <td className="whitespace-nowrap">{job.dueDate ?? '—'}</td>
                  <td className="num">{job.partCount}</td>
                  <td className="text-graphite-soft">{job.materials.join(', ') || '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
