'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { stockItemSchema } from '@/shared/schemas/stock';
import { lengthInput, shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { ActionError, Field } from '@/components/ui/field';
import { moneyInput, wholeInput } from './form-fields';
import { useStockAction } from './use-stock-action';

const formSchema = (unit: 'in' | 'mm') =>
  stockItemSchema.extend({
    thickness: lengthInput(unit),
    length: lengthInput(unit),
    width: lengthInput(unit),
    onHand: wholeInput(0),
    lowStockAt: wholeInput(0),
    costCents: moneyInput,
  });

/** A new sheet or board size on the rack, or a size the shop can buy (the catalogue the nesting engine buys from). */
export function NewStockForm({ units, onDone }: { units: ShopUnits; onDone: () => void }) {
  const schema = useMemo(() => formSchema(shopLengthUnit(units)), [units]);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      kind: 'sheet',
      material: '',
      nominalThickness: '',
      thickness: '',
      length: '',
      width: '',
      grain: 'along-length',
      surfacing: '',
      grade: '',
      onHand: '0',
      lowStockAt: '0',
      costCents: '',
      supplier: '',
      location: '',
      buyable: true,
    },
  });
  const action = useStockAction('POST /api/stock', { onDone });
  const e = form.formState.errors;
  const board = form.watch('kind') === 'board';
  return (
    <form
      onSubmit={form.handleSubmit((v) => action.mutate(v))}
      className="card mb-4 grid gap-3 p-4 md:grid-cols-4"
      aria-label="New stock size"
      noValidate
    >
      <Field id="ns-kind" label="Kind" error={e.kind?.message}>
        <select id="ns-kind" className="field-input" {...form.register('kind')}>
          <option value="sheet">Sheet</option>
          <option value="board">Board</option>
        </select>
      </Field>
      <Field id="ns-material" label={board ? 'Species' : 'Material'} error={e.material?.message}>
        <input id="ns-material" className="field-input" {...form.register('material')} />
      </Field>
      <Field id="ns-nominal" label="Thickness as you say it" error={e.nominalThickness?.message}>
        <input id="ns-nominal" className="field-input" placeholder={board ? '4/4' : '3/4"'} {...form.register('nominalThickness')} />
      </Field>
      <Field id="ns-thickness" label="Actual thickness" error={e.thickness?.message}>
        <input id="ns-thickness" className="field-input" placeholder={board ? '13/16' : '23/32'} {...form.register('thickness')} />
      </Field>
      <Field id="ns-length" label="Length" error={e.length?.message}>
        <input id="ns-length" className="field-input" {...form.register('length')} />
      </Field>
      <Field id="ns-width" label="Width" error={e.width?.message}>
        <input id="ns-width" className="field-input" {...form.register('width')} />
      </Field>
      <Field id="ns-onhand" label="On hand" error={e.onHand?.message}>
        <input id="ns-onhand" className="field-input" inputMode="numeric" {...form.register('onHand')} />
      </Field>
      <Field id="ns-cost" label={board ? 'Cost per board foot' : 'Cost each'} error={e.costCents?.message}>
        <input id="ns-cost" className="field-input" inputMode="decimal" {...form.register('costCents')} />
      </Field>
      <Field id="ns-grain" label="Grain" error={e.grain?.message}>
        <select id="ns-grain" className="field-input" {...form.register('grain')}>
          <option value="along-length">Along the length</option>
          <option value="none">None</option>
        </select>
      </Field>
      {board && (
        <Field id="ns-surfacing" label="Surfacing" error={e.surfacing?.message}>
          <select id="ns-surfacing" className="field-input" {...form.register('surfacing')}>
            <option value="">—</option>
            <option value="rough">Rough</option>
            <option value="S2S">S2S</option>
            <option value="S4S">S4S</option>
          </select>
        </Field>
      )}
      {board && (
        <Field id="ns-grade" label="Grade" error={e.grade?.message}>
          <input id="ns-grade" className="field-input" placeholder="FAS, 1 Common" {...form.register('grade')} />
        </Field>
      )}
      <Field id="ns-supplier" label="Supplier" error={e.supplier?.message}>
        <input id="ns-supplier" className="field-input" {...form.register('supplier')} />
      </Field>
      <Field id="ns-location" label="Location" error={e.location?.message}>
        <input id="ns-location" className="field-input" {...form.register('location')} />
      </Field>
      <Field id="ns-low" label="Low when free ≤" error={e.lowStockAt?.message}>
        <input id="ns-low" className="field-input" inputMode="numeric" {...form.register('lowStockAt')} />
      </Field>
      <label className="flex items-center gap-2 self-end pb-2 text-sm">
        <input type="checkbox" {...form.register('buyable')} /> Can buy more of this size
      </label>
      <div className="md:col-span-4">
        <ActionError error={action.error} />
      </div>
      <div className="flex gap-2 md:col-span-4">
        <button type="submit" className="btn-accent" disabled={action.isPending}>
          {action.isPending ? 'Saving…' : 'Add to the stock room'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
