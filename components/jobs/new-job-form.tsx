'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';
import { CUSTOMER_FIELD_HINT, CustomerChoices } from '@/components/customers/customer-choices';
import type { ApiBody } from '@/shared/wire/api';

export function NewJobForm({ onDone }: { onDone: () => void }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const create = useMutation({
    mutationFn: (body: ApiBody<'POST /api/jobs'>) => call('POST /api/jobs', { body }),
    onSuccess: (job) => {
      queryClient.invalidateQueries({ queryKey: ['jobs'] });
      queryClient.invalidateQueries({ queryKey: ['customers'] });
      onDone();
      router.push(`/jobs/${job.id}`);
    },
    onError: (error) => setFields(error instanceof ApiError ? error.fields : {}),
  });

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = (name: string) => String(form.get(name) ?? '');
    setFields({});
    create.mutate({ name: text('name'), customer: text('customer'), dueDate: text('dueDate') || null, notes: text('notes') });
  }

  return (
    <form onSubmit={onSubmit} className="card mb-6 grid gap-4 p-5 md:grid-cols-2" aria-label="New job">
      <div>
        <label htmlFor="job-name" className="field-label">
          Job name
        </label>
        <input id="job-name" name="name" className="field-input" placeholder="Hollis kitchen" autoFocus />
        {fields.name && <p className="field-error">{fields.name[0]}</p>}
      </div>
      <div>
        <label htmlFor="job-customer" className="field-label">
          Customer
        </label>
        <input id="job-customer" name="customer" className="field-input" list="job-customer-choices" autoComplete="off" />
        <CustomerChoices id="job-customer-choices" />
        <p className="mt-1 text-xs text-graphite-mute">{CUSTOMER_FIELD_HINT}</p>
        {fields.customer && <p className="field-error">{fields.customer[0]}</p>}
      </div>
      <div>
        <label htmlFor="job-due" className="field-label">
          Due date
        </label>
        <input id="job-due" name="dueDate" type="date" className="field-input" />
        {fields.dueDate && <p className="field-error">{fields.dueDate[0]}</p>}
      </div>
      <div>
        <label htmlFor="job-notes" className="field-label">
          Notes
        </label>
        <input id="job-notes" name="notes" className="field-input" />
      </div>
      {create.isError && !Object.keys(fields).length && <p className="field-error md:col-span-2">{create.error.message}</p>}
      <div className="flex gap-2 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create job'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
