'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { call } from '@/client/api';

/** Makes a new quote from one of the job's plans (material and saw time) or from none. */
export function NewQuoteForm({ jobId, plans }: { jobId: string; plans: { id: string; name: string; status: string }[] }) {
  const router = useRouter();
  const [planId, setPlanId] = useState(plans[0]?.id ?? '');
  const create = useMutation({
    mutationFn: () => call('POST /api/jobs/:id/quotes', { params: { id: jobId }, body: { planId: planId || null } }),
    onSuccess: (q) => router.push(`/jobs/${jobId}/quotes/${q.id}`),
  });
  return (
    <form
      className="card mb-6 flex flex-wrap items-end gap-3 p-4"
      aria-label="New quote"
      onSubmit={(e) => {
        e.preventDefault();
        create.mutate();
      }}
    >
      <div className="min-w-0 flex-1">
        <label htmlFor="quote-plan" className="field-label">
          Material and saw time from
        </label>
        <select id="quote-plan" className="field-input" value={planId} onChange={(e) => setPlanId(e.target.value)}>
          {plans.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({p.status})
            </option>
          ))}
          <option value="">No plan (hardware and labour only)</option>
        </select>
      </div>
      <button type="submit" className="btn-accent" disabled={create.isPending}>
        {create.isPending ? 'Building…' : 'Build a quote'}
      </button>
      {create.isError && (
        <p role="alert" className="field-error w-full">
          {create.error.message}
        </p>
      )}
    </form>
  );
}
