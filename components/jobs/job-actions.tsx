'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ActionError } from '@/components/ui/field';
import { call } from '@/client/api';
import type { JobStatus, JobSummary } from '@/shared/schemas/job';
import { EditJobForm } from './edit-job-form';

/**
 * A job's own actions beside its name: edit it, archive it, or delete it while it has no history (a job whose
 * plans reached the saw is archived instead, so the ledgers keep their plans).
 */
export function JobActions({
  job,
  statusChoices,
  hasHistory,
  followsPlans,
}: {
  job: JobSummary;
  statusChoices: JobStatus[];
  hasHistory: boolean;
  followsPlans: boolean;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const done = () => {
    void queryClient.invalidateQueries({ queryKey: ['jobs'] });
    router.refresh();
  };
  const archive = useMutation({
    mutationFn: () => call('PATCH /api/jobs/:id', { params: { id: job.id }, body: { status: 'archived' } }),
    onSuccess: done,
  });
  const remove = useMutation({
    mutationFn: () => call('DELETE /api/jobs/:id', { params: { id: job.id } }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      router.push('/jobs');
    },
  });
  const mayArchive = job.status !== 'archived' && statusChoices.includes('archived');

  return (
    <div className="flex flex-wrap items-center gap-2 print:hidden">
      <button type="button" className="btn-quiet" onClick={() => setEditing(true)}>
        Edit job
      </button>
      {mayArchive && (
        <button type="button" className="btn-quiet" disabled={archive.isPending} onClick={() => archive.mutate()}>
          {archive.isPending ? 'Archiving…' : 'Archive'}
        </button>
      )}
      {!hasHistory && !confirmDelete && (
        <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(true)}>
          Delete…
        </button>
      )}
      {confirmDelete && (
        <>
          <button type="button" className="btn-danger" disabled={remove.isPending} onClick={() => remove.mutate()}>
            Delete the job and its cut list
          </button>
          <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>
            Keep it
          </button>
        </>
      )}
      <ActionError error={archive.error ?? remove.error} />
      {editing && <EditJobForm job={job} statusChoices={statusChoices} followsPlans={followsPlans} onDone={() => setEditing(false)} />}
    </div>
  );
}
