'use client';

import { useQuery } from '@tanstack/react-query';
import { call } from '@/client/api';

/**
 * The shop's customers as choices for a customer field (`list` on the input): typing a name picks the customer of that
 * name, and a new name adds a customer when the job is saved.
 */
export function CustomerChoices({ id }: { id: string }) {
  const customers = useQuery({ queryKey: ['customers', ''], queryFn: () => call('GET /api/customers') });
  return (
    <datalist id={id}>
      {(customers.data ?? []).map((c) => (
        <option key={c.id} value={c.name}>
          {c.company || c.email || undefined}
        </option>
      ))}
    </datalist>
  );
}

export const CUSTOMER_FIELD_HINT = 'Pick one of your customers, or type a new name to add them.';
