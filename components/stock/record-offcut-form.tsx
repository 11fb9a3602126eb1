'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { recordOffcutSchema } from '@/shared/schemas/stock';
import { lengthInput, shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { ActionError, Field } from '@/components/ui/field';
import { useStockAction } from './use-stock-action';

const formSchema = (unit: 'in' | 'mm') =>
  recordOffcutSchema.extend({ thickness: lengthInput(unit), length: lengthInput(unit), width: lengthInput(unit) });

/** A cutter (or owner) puts an offcut on the rack that no plan recorded: sizes typed as the shop writes them. */
export function RecordOffcutForm({ units, onDone }: { units: ShopUnits; onDone: () => void }) {
  const schema = useMemo(() => formSchema(shopLengthUnit(units)), [units]);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: { material: '', thickness: '', length: '', width: '', grain: 'along-length', location: '' },
  });
  const action = useStockAction('POST /api/offcuts', { onDone });
  const e = form.formState.errors;
  return (
    <form
      onSubmit={form.handleSubmit((v) => action.mutate(v))}
      className="card mb-4 grid gap-3 p-4 md:grid-cols-3"
      aria-label="Record an offcut"
      noValidate
    >
      <Field id="ro-material" label="Material" error={e.material?.message}>
        <input id="ro-material" className="field-input" {...form.register('material')} />
      </Field>
      <Field id="ro-thickness" label="Thickness" error={e.thickness?.message}>
        <input id="ro-thickness" className="field-input" {...form.register('thickness')} />
      </Field>
      <Field id="ro-location" label="Location" error={e.location?.message}>
        <input id="ro-location" className="field-input" {...form.register('location')} />
      </Field>
      <Field id="ro-length" label="Length (along the grain)" error={e.length?.message}>
        <input id="ro-length" className="field-input" {...form.register('length')} />
      </Field>
      <Field id="ro-width" label="Width" error={e.width?.message}>
        <input id="ro-width" className="field-input" {...form.register('width')} />
      </Field>
      <Field id="ro-grain" label="Grain" error={e.grain?.message}>
        <select id="ro-grain" className="field-input" {...form.register('grain')}>
          <option value="along-length">Along the length</option>
          <option value="none">None (MDF, particleboard)</option>
        </select>
      </Field>
      <div className="md:col-span-3">
        <ActionError error={action.error} />
      </div>
      <div className="flex gap-2 md:col-span-3">
        <button type="submit" className="btn-accent" disabled={action.isPending}>
          {action.isPending ? 'Saving…' : 'Put on the rack'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
