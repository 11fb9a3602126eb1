'use client';

import Link from 'next/link';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { call } from '@/client/api';
import type { ApiBody } from '@/shared/wire/api';

/** Makes drafts (one per supplier) from the low-stock sizes, a plan's stock to buy, or an empty one; then opens them. */
export function useMakeOrders() {
  const router = useRouter();
  return useMutation({
    mutationFn: (body: ApiBody<'POST /api/purchase-orders'>) => call('POST /api/purchase-orders', { body }),
    onSuccess: ({ orders }) => {
      if (orders.length === 1) router.push(`/purchase-orders/${orders[0].id}`);
      else router.refresh();
    },
  });
}

export function OrderLowStockButton({ disabled }: { disabled: boolean }) {
  const make = useMakeOrders();
  return (
    <div>
      <button type="button" className="btn-accent" disabled={disabled || make.isPending} onClick={() => make.mutate({ from: 'low-stock' })}>
        {make.isPending ? 'Making orders…' : 'Order the low stock'}
      </button>
      {make.error && (
        <p role="alert" className="field-error mt-1">
          {make.error.message}
        </p>
      )}
      {make.data && make.data.orders.length > 1 && (
        <p role="status" className="mt-1 text-sm text-sage">
          {make.data.orders.length} drafts made, one per supplier: {make.data.orders.map((o) => o.title).join(', ')}.
        </p>
      )}
    </div>
  );
}

export function OrderFromPlanButton({ planId }: { planId: string }) {
  const make = useMakeOrders();
  return (
    <div className="mb-4">
      <button type="button" className="btn-quiet" disabled={make.isPending} onClick={() => make.mutate({ from: 'plan', planId })}>
        {make.isPending ? 'Making orders…' : 'Make purchase orders for this'}
      </button>
      {make.error && (
        <p role="alert" className="field-error mt-1">
          {make.error.message}
        </p>
      )}
      {make.data && make.data.orders.length > 1 && (
        <p role="status" className="mt-1 text-sm text-sage">
          {make.data.orders.length} drafts made, one per supplier: {make.data.orders.map((o) => o.title).join(', ')}.{' '}
          <Link href="/purchase-orders">Open purchase orders</Link>
        </p>
      )}
    </div>
  );
}

export function NewOrderForm({ suppliers }: { suppliers: string[] }) {
  const make = useMakeOrders();
  const [supplier, setSupplier] = useState('');
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        make.mutate({ from: 'manual', supplier });
      }}
    >
      <div>
        <label htmlFor="new-po-supplier" className="field-label">
          New order for a supplier
        </label>
        <input
          id="new-po-supplier"
          className="field-input w-64 max-w-full"
          list="po-suppliers"
          value={supplier}
          onChange={(e) => setSupplier(e.target.value)}
          placeholder="Supplier’s name"
        />
        <datalist id="po-suppliers">
          {suppliers.map((s) => (
            <option key={s} value={s} />
          ))}
        </datalist>
      </div>
      <button type="submit" className="btn-quiet" disabled={make.isPending}>
        Make a draft
      </button>
      {make.error && (
        <p role="alert" className="field-error w-full">
          {make.error.message}
        </p>
      )}
    </form>
  );
}
