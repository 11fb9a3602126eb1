'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';
import type { Customer } from '@/shared/schemas/customer';

const FIELDS = [
  ['name', 'Name', 'input'],
  ['company', 'Company', 'input'],
  ['email', 'E-mail', 'input'],
  ['phone', 'Phone', 'input'],
  ['billingAddress', 'Billing address', 'textarea'],
  ['siteAddress', 'Site address (where the work goes)', 'textarea'],
  ['notes', 'Notes', 'textarea'],
] as const;
type Key = (typeof FIELDS)[number][0];
type Values = Record<Key, string>;

/** Only the fields that differ from the customer as saved. */
const changesOf = (values: Values, customer: Customer): Partial<Values> =>
  Object.fromEntries(Object.entries(values).filter(([k, v]) => v !== customer[k as Key]));

/** Adds a customer (no `customer`) or edits one: only the fields changed are sent. */
export function CustomerForm({ customer, onDone }: { customer?: Customer; onDone?: () => void }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const save = useMutation({
    mutationFn: (values: Values) =>
      customer
        ? call('PATCH /api/customers/:id', { params: { id: customer.id }, body: changesOf(values, customer) })
        : call('POST /api/customers', { body: values }),
    onSuccess: (saved) => {
      void queryClient.invalidateQueries({ queryKey: ['customers'] });
      setFields({});
      if (customer) router.refresh();
      else router.push(`/customers/${saved.id}`);
      onDone?.();
    },
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const values = Object.fromEntries(FIELDS.map(([k]) => [k, String(form.get(k) ?? '').trim()])) as Values;
    if (customer && !Object.keys(changesOf(values, customer)).length) return onDone?.();
    save.mutate(values);
  }

  const prefix = customer ? 'edit-customer' : 'new-customer';
  return (
    <form onSubmit={onSubmit} className="card grid gap-4 p-5 md:grid-cols-2" aria-label={customer ? 'Edit customer' : 'New customer'} noValidate>
      {FIELDS.map(([key, label, kind]) => (
        <div key={key} className={kind === 'textarea' && key === 'notes' ? 'md:col-span-2' : undefined}>
          <label htmlFor={`${prefix}-${key}`} className="field-label">
            {label}
          </label>
          {kind === 'textarea' ? (
            <textarea
              id={`${prefix}-${key}`}
              name={key}
              rows={key === 'notes' ? 3 : 2}
              className="field-input"
              defaultValue={customer?.[key] ?? ''}
            />
          ) : (
            <input
              id={`${prefix}-${key}`}
              name={key}
              type={key === 'email' ? 'email' : key === 'phone' ? 'tel' : 'text'}
              className="field-input"
              defaultValue={customer?.[key] ?? ''}
              autoFocus={key === 'name' && !customer}
            />
          )}
          {fields[key] && (
            <p className="field-error" role="alert">
              {fields[key][0]}
            </p>
          )}
        </div>
      ))}
      {save.isError && !Object.keys(fields).length && (
        <p className="field-error md:col-span-2" role="alert">
          {save.error.message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : customer ? 'Save customer' : 'Add customer'}
        </button>
        {onDone && (
          <button type="button" className="btn-quiet" onClick={onDone}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}

/** A button that opens the form in place. */
export function CustomerFormToggle({ customer, label }: { customer?: Customer; label: string }) {
  const [open, setOpen] = useState(false);
  if (!open)
    return (
      <button type="button" className={customer ? 'btn-quiet' : 'btn-accent'} onClick={() => setOpen(true)}>
        {label}
      </button>
    );
  return (
    <div className="mb-6 w-full">
      <CustomerForm customer={customer} onDone={() => setOpen(false)} />
    </div>
  );
}
