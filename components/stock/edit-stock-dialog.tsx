'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '@/client/api';
import { STOCK_DETAIL_FIELDS, stockItemPatchSchema, type StockDetailField, type StockItemPatch } from '@/shared/schemas/stock';
import { ActionError, Field } from '@/components/ui/field';
import { centsForInput, moneyInput, wholeInput } from './form-fields';
import { useStockAction } from './use-stock-action';

/** What the dialog needs of a size: its details as stored, and what it is (shown, not editable). */
export interface EditableStock {
  id: string;
  kind: 'sheet' | 'board';
  material: string;
  nominalThickness: string;
  surfacing: '' | 'rough' | 'S2S' | 'S4S';
  grade: string;
  costCents: number;
  supplier: string;
  location: string;
  lowStockAt: number;
  buyable: boolean;
}

const patch = stockItemPatchSchema.shape;
const formSchema = z.object({
  material: patch.material.unwrap(),
  nominalThickness: patch.nominalThickness.unwrap(),
  surfacing: patch.surfacing.unwrap(),
  grade: patch.grade.unwrap(),
  costCents: moneyInput.pipe(patch.costCents.unwrap()),
  supplier: patch.supplier.unwrap(),
  location: patch.location.unwrap(),
  lowStockAt: wholeInput(0).pipe(patch.lowStockAt.unwrap()),
  buyable: z.boolean(),
});
type FormInput = z.input<typeof formSchema>;
type FormOutput = z.output<typeof formSchema>;

/** Only what changed is sent, so two people editing different details of one size do not undo each other. */
function changedDetails(item: EditableStock, values: FormOutput): StockItemPatch {
  return Object.fromEntries(STOCK_DETAIL_FIELDS.filter((f) => values[f] !== item[f]).map((f) => [f, values[f]]));
}

/**
 * Change a size's details in a small dialog: name, supplier, rack location, cost, low-stock mark, grade and
 * surfacing (boards), and whether the shop can buy more. The size itself (length, width, thickness, grain) and the
 * counts stay: a different size is a new stock size, and counts change by receiving or adjusting. Owners only.
 */
export function EditStockDialog({ item, label, currency, onDone }: { item: EditableStock; label: string; currency: string; onDone: () => void }) {
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = dialog.current;
    if (d && !d.open) d.showModal();
  }, []);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(formSchema),
    defaultValues: { ...item, costCents: centsForInput(item.costCents), lowStockAt: String(item.lowStockAt) },
  });
  const action = useStockAction('PATCH /api/stock/:id', { params: { id: item.id }, onDone });
  const e = form.formState.errors;
  const board = item.kind === 'board';
  const id = (field: StockDetailField) => `es-${field}-${item.id}`;

  function save(values: FormOutput) {
    const body = changedDetails(item, values);
    if (!Object.keys(body).length) return onDone();
    action.mutate(body, {
      // The server's field messages go on the fields they name; anything else stays in the summary.
      onError: (err) => {
        if (!(err instanceof ApiError)) return;
        for (const [field, messages] of Object.entries(err.fields)) {
          if ((STOCK_DETAIL_FIELDS as readonly string[]).includes(field))
            form.setError(field as StockDetailField, { type: 'server', message: messages[0] });
        }
      },
    });
  }

  return (
    <dialog
      ref={dialog}
      onClose={onDone}
      aria-label={`Edit ${label}`}
      className="m-auto w-[min(40rem,calc(100vw-2rem))] rounded-lg border border-paper-edge bg-white p-0 text-left text-graphite shadow-xl backdrop:bg-graphite/40"
    >
      <form onSubmit={form.handleSubmit(save)} className="grid gap-3 p-5 sm:grid-cols-2" noValidate>
        <div className="sm:col-span-2">
          <h2>Edit {label}</h2>
          <p className="text-sm text-graphite-mute">
            Length, width, thickness and grain define this size and stay as they are; a different size is a new stock size. Counts change by Receive
            and Adjust.
          </p>
        </div>
        <Field id={id('material')} label={board ? 'Species' : 'Material'} error={e.material?.message}>
          <input id={id('material')} className="field-input" autoFocus {...form.register('material')} />
        </Field>
        <Field id={id('nominalThickness')} label="Thickness as you say it" error={e.nominalThickness?.message}>
          <input id={id('nominalThickness')} className="field-input" {...form.register('nominalThickness')} />
        </Field>
        {board && (
          <Field id={id('surfacing')} label="Surfacing" error={e.surfacing?.message}>
            <select id={id('surfacing')} className="field-input" {...form.register('surfacing')}>
              <option value="">—</option>
              <option value="rough">Rough</option>
              <option value="S2S">S2S</option>
              <option value="S4S">S4S</option>
            </select>
          </Field>
        )}
        {board && (
          <Field id={id('grade')} label="Grade" error={e.grade?.message}>
            <input id={id('grade')} className="field-input" placeholder="FAS, 1 Common" {...form.register('grade')} />
          </Field>
        )}
        <Field id={id('costCents')} label={`${board ? 'Cost per board foot' : 'Cost each'} (${currency})`} error={e.costCents?.message}>
          <input id={id('costCents')} className="field-input" inputMode="decimal" {...form.register('costCents')} />
        </Field>
        <Field id={id('lowStockAt')} label="Low when free ≤" error={e.lowStockAt?.message}>
          <input id={id('lowStockAt')} className="field-input" inputMode="numeric" {...form.register('lowStockAt')} />
        </Field>
        <Field id={id('supplier')} label="Supplier" error={e.supplier?.message}>
          <input id={id('supplier')} className="field-input" {...form.register('supplier')} />
        </Field>
        <Field id={id('location')} label="Location" error={e.location?.message}>
          <input id={id('location')} className="field-input" {...form.register('location')} />
        </Field>
        <label className="flex items-center gap-2 text-sm sm:col-span-2">
          <input type="checkbox" {...form.register('buyable')} /> Can buy more of this size
        </label>
        <div className="sm:col-span-2">
          <ActionError error={action.error} except={STOCK_DETAIL_FIELDS} />
        </div>
        <div className="flex gap-2 sm:col-span-2">
          <button type="submit" className="btn-accent" disabled={action.isPending}>
            {action.isPending ? 'Saving…' : 'Save changes'}
          </button>
          <button type="button" className="btn-quiet" onClick={() => dialog.current?.close()}>
            Cancel
          </button>
        </div>
      </form>
    </dialog>
  );
}
