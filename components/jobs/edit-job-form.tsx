'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useEffect, useRef, type FormEvent } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ActionError, Field } from '@/components/ui/field';
import { ApiError, call } from '@/client/api';
import { CUSTOMER_FIELD_HINT, CustomerChoices } from '@/components/customers/customer-choices';
import { JOB_STATUS_LABELS, jobFields, type JobPatch, type JobStatus, type JobSummary } from '@/shared/schemas/job';

const FIELDS = ['name', 'customer', 'dueDate', 'notes', 'status'] as const;

const formSchema = z.object({
  name: jobFields.name,
  // The customer's name as typed: the server picks the customer of that name or adds one ('' for none).
  customer: z.string().trim().max(120, 'Keep the customer’s name under 120 characters.'),
  // A date input gives '' when cleared: no due date.
  dueDate: z
    .string()
    .transform((v) => v || null)
    .pipe(jobFields.dueDate),
  notes: jobFields.notes,
  status: jobFields.status,
});
type FormInput = z.input<typeof formSchema>;
type FormOutput = z.output<typeof formSchema>;

/** Only what changed is sent, so someone else's change to another field is not undone. */
function changed(job: JobSummary, values: FormOutput): JobPatch {
  return Object.fromEntries(FIELDS.filter((f) => values[f] !== job[f]).map((f) => [f, values[f]]));
}

/**
 * Edit a job in a dialog: name, customer, due date, notes and status. The statuses offered are the ones this person
 * may set by hand (cutting and done follow the plans; the owner may set any).
 */
export function EditJobForm({
  job,
  statusChoices,
  followsPlans,
  onDone,
}: {
  job: JobSummary;
  statusChoices: JobStatus[];
  followsPlans: boolean;
  onDone: () => void;
}) {
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = dialog.current;
    if (d && !d.open) d.showModal();
  }, []);
  const router = useRouter();
  const queryClient = useQueryClient();
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(formSchema),
    defaultValues: { name: job.name, customer: job.customer, dueDate: job.dueDate ?? '', notes: job.notes, status: job.status },
  });
  const save = useMutation({
    mutationFn: (body: JobPatch) => call('PATCH /api/jobs/:id', { params: { id: job.id }, body }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['jobs'] });
      router.refresh();
      dialog.current?.close();
    },
    // The server's field messages go on the fields they name.
    onError: (err) => {
      if (!(err instanceof ApiError)) return;
      for (const [field, messages] of Object.entries(err.fields)) {
        if ((FIELDS as readonly string[]).includes(field)) form.setError(field as (typeof FIELDS)[number], { type: 'server', message: messages[0] });
      }
    },
  });
  const e = form.formState.errors;
  const submit = (event: FormEvent<HTMLFormElement>) =>
    form.handleSubmit((values) => {
      const body = changed(job, values);
      if (!Object.keys(body).length) return dialog.current?.close();
      save.mutate(body);
    })(event);

  return (
    <dialog
      ref={dialog}
      onClose={onDone}
      aria-label="Edit job"
      className="m-auto w-[min(40rem,calc(100vw-2rem))] rounded-lg border border-paper-edge bg-white p-0 text-left text-graphite shadow-xl backdrop:bg-graphite/40"
    >
      <form onSubmit={submit} className="grid gap-3 p-5 sm:grid-cols-2" noValidate>
        <h2 className="sm:col-span-2">Edit job</h2>
        <Field id="edit-job-name" label="Job name" error={e.name?.message}>
          <input id="edit-job-name" className="field-input" autoFocus {...form.register('name')} />
        </Field>
        <Field id="edit-job-customer" label="Customer" error={e.customer?.message}>
          <input id="edit-job-customer" className="field-input" list="edit-job-customer-choices" autoComplete="off" {...form.register('customer')} />
          <CustomerChoices id="edit-job-customer-choices" />
          <p className="mt-1 text-xs text-graphite-mute">{CUSTOMER_FIELD_HINT}</p>
        </Field>
        <Field id="edit-job-due" label="Due date" error={e.dueDate?.message}>
          <input id="edit-job-due" type="date" className="field-input" {...form.register('dueDate')} />
        </Field>
        <Field id="edit-job-status" label="Status" error={e.status?.message}>
          <select id="edit-job-status" className="field-input" {...form.register('status')}>
            {statusChoices.map((s) => (
              <option key={s} value={s}>
                {JOB_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
          {followsPlans && (
            <p className="mt-1 text-xs text-graphite-mute">
              Cutting and done follow the plans: releasing a plan starts cutting, finishing the last one (with no re-cut open) makes the job done.
            </p>
          )}
        </Field>
        <Field id="edit-job-notes" label="Notes" error={e.notes?.message} className="sm:col-span-2">
          <textarea id="edit-job-notes" rows={4} className="field-input" {...form.register('notes')} />
        </Field>
        <div className="sm:col-span-2">
          <ActionError error={save.error} except={FIELDS} />
        </div>
        <div className="flex gap-2 sm:col-span-2">
          <button type="submit" className="btn-accent" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save changes'}
          </button>
          <button type="button" className="btn-quiet" onClick={() => dialog.current?.close()}>
            Cancel
          </button>
        </div>
      </form>
    </dialog>
  );
}
