'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { adjustStockSchema, receiveStockSchema } from '@/shared/schemas/stock';
import { EditStockDialog, type EditableStock } from './edit-stock-dialog';
import { ActionError, Field } from '@/components/ui/field';
import { useStockAction } from './use-stock-action';

const receiveForm = receiveStockSchema.extend({ quantity: z.coerce.number<string | number>().pipe(receiveStockSchema.shape.quantity) });
const adjustForm = adjustStockSchema.extend({ count: z.coerce.number<string | number>().pipe(adjustStockSchema.shape.count) });

/** Receive a delivery, set a counted figure or change a size's details, from its row. Owners only. */
export function StockRowActions({ item, label, onHand, currency }: { item: EditableStock; label: string; onHand: number; currency: string }) {
  const [open, setOpen] = useState<'receive' | 'adjust' | 'edit' | null>(null);
  const { id } = item;
  return (
    <div className="flex flex-col items-end gap-2">
      <div className="flex flex-col gap-1">
        <button
          type="button"
          className="btn-quiet px-2 py-0.5 text-xs"
          onClick={() => setOpen(open === 'receive' ? null : 'receive')}
          aria-label={`Receive ${label}`}
        >
          Receive
        </button>
        <button
          type="button"
          className="btn-quiet px-2 py-0.5 text-xs"
          onClick={() => setOpen(open === 'adjust' ? null : 'adjust')}
          aria-label={`Adjust count of ${label}`}
        >
          Adjust
        </button>
        <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setOpen('edit')} aria-label={`Edit ${label}`}>
          Edit
        </button>
      </div>
      {open === 'receive' && <ReceiveForm id={id} label={label} onDone={() => setOpen(null)} />}
      {open === 'adjust' && <AdjustForm id={id} label={label} onHand={onHand} onDone={() => setOpen(null)} />}
      {open === 'edit' && <EditStockDialog item={item} label={label} currency={currency} onDone={() => setOpen(null)} />}
    </div>
  );
}

function ReceiveForm({ id, label, onDone }: { id: string; label: string; onDone: () => void }) {
  const form = useForm<z.input<typeof receiveForm>, unknown, z.output<typeof receiveForm>>({
    resolver: zodResolver(receiveForm),
    defaultValues: { quantity: '', reason: '' },
  });
  const action = useStockAction('POST /api/stock/:id/receive', { params: { id }, onDone });
  const e = form.formState.errors;
  return (
    <form
      onSubmit={form.handleSubmit((v) => action.mutate(v))}
      className="card w-72 space-y-2 p-3 text-left"
      aria-label={`Receive ${label}`}
      noValidate
    >
      <Field id={`rq-${id}`} label="Pieces received" error={e.quantity?.message}>
        <input id={`rq-${id}`} className="field-input" inputMode="numeric" autoFocus {...form.register('quantity')} />
      </Field>
      <Field id={`rr-${id}`} label="Note (delivery, supplier)" error={e.reason?.message}>
        <input id={`rr-${id}`} className="field-input" {...form.register('reason')} />
      </Field>
      <ActionError error={action.error} />
      <button type="submit" className="btn-accent w-full" disabled={action.isPending}>
        {action.isPending ? 'Saving…' : 'Receive'}
      </button>
    </form>
  );
}

function AdjustForm({ id, label, onHand, onDone }: { id: string; label: string; onHand: number; onDone: () => void }) {
  const form = useForm<z.input<typeof adjustForm>, unknown, z.output<typeof adjustForm>>({
    resolver: zodResolver(adjustForm),
    defaultValues: { count: String(onHand), reason: '' },
  });
  const action = useStockAction('POST /api/stock/:id/adjust', { params: { id }, onDone });
  const e = form.formState.errors;
  return (
    <form
      onSubmit={form.handleSubmit((v) => action.mutate(v))}
      className="card w-72 space-y-2 p-3 text-left"
      aria-label={`Adjust count of ${label}`}
      noValidate
    >
      <Field id={`ac-${id}`} label={`Counted on the rack (book: ${onHand})`} error={e.count?.message}>
        <input id={`ac-${id}`} className="field-input" inputMode="numeric" autoFocus {...form.register('count')} />
      </Field>
      <Field id={`ar-${id}`} label="Reason" error={e.reason?.message}>
        <input id={`ar-${id}`} className="field-input" placeholder="Counted, damaged, found…" {...form.register('reason')} />
      </Field>
      <ActionError error={action.error} />
      <button type="submit" className="btn-accent w-full" disabled={action.isPending}>
        {action.isPending ? 'Saving…' : 'Save count'}
      </button>
    </form>
  );
}
