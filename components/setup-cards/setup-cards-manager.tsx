'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError, call } from '@/client/api';
import { DEFAULT_LOCK_RABBET_CARDS, findSetupCard, JOINT_NAMES } from '@/lib/joinery';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { parseLength } from '@/lib/units/parse-length';
import { JOINT_METHODS } from '@/shared/schemas/drawer-schedule';
import type { SetupCard } from '@/shared/schemas/setup-card';
import { lengthInput, shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { EmptyState } from '@/components/ui/empty-state';
import { RouterCautions, SetupCardView } from './setup-card-view';

const cardForm = (units: ShopUnits) =>
  z.object({
    joint: z.enum(JOINT_METHODS),
    stockThickness: lengthInput(shopLengthUnit(units)),
    fields: z
      .array(
        z
          .object({
            label: z.string().trim().min(1, 'Name the setting.').max(80),
            value: z.string().trim().min(1, 'Enter a value.'),
            unit: z.enum(['mm', 'rpm', 'deg']),
          })
          .transform((f, ctx) => {
            const parsed =
              f.unit === 'mm'
                ? parseLength(f.value, { unit: shopLengthUnit(units) })
                : Number.isFinite(Number(f.value)) && f.value !== ''
                  ? { ok: true as const, mm: Number(f.value) }
                  : { ok: false as const, error: 'Enter a number.' };
            if (!parsed.ok) {
              ctx.addIssue({ code: 'custom', path: ['value'], message: parsed.error });
              return z.NEVER;
            }
            const key =
              f.label
                .toLowerCase()
                .replace(/[^a-z0-9]+/g, '-')
                .replace(/^-+|-+$/g, '') || 'setting';
            return { key: /^[a-z]/.test(key) ? key : `s-${key}`, label: f.label, value: parsed.mm, unit: f.unit };
          }),
      )
      .max(20),
    note: z.string().max(2000),
  });
type FormText = z.input<ReturnType<typeof cardForm>>;
type FormValues = z.output<ReturnType<typeof cardForm>>;

const toText = (card: SetupCard, units: ShopUnits): FormText => ({
  joint: card.joint,
  stockThickness: exactLengthText(card.stockThickness, units),
  fields: card.fields.map((f) => ({ label: f.label, value: f.unit === 'mm' ? exactLengthText(f.value, units) : String(f.value), unit: f.unit })),
  note: card.note,
});

/** Setup cards: the shop's saved machine settings per joint and stock thickness, with the starting cards offered. */
export function SetupCardsManager({ units, canWrite }: { units: ShopUnits; canWrite: boolean }) {
  const qc = useQueryClient();
  const cards = useQuery({ queryKey: ['setup-cards'], queryFn: () => call('GET /api/setup-cards') });
  const [editing, setEditing] = useState<{ id: string | null; card: SetupCard } | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/setup-cards/:id', { params: { id } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['setup-cards'] }),
  });
  const unsavedDefaults = DEFAULT_LOCK_RABBET_CARDS.filter((d) => !findSetupCard(cards.data ?? [], d));
  const blank: SetupCard = {
    joint: 'lock-rabbet',
    stockThickness: 12.7,
    fields: [{ key: 'bit-height', label: 'Bit height', value: 9.525, unit: 'mm' }],
    note: '',
  };

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
      <div className="space-y-4">
        {canWrite && !editing && (
          <button type="button" className="btn-accent" onClick={() => setEditing({ id: null, card: blank })}>
            New setup card
          </button>
        )}
        {editing && <CardForm key={editing.id ?? 'new'} id={editing.id} card={editing.card} units={units} onDone={() => setEditing(null)} />}
        {cards.isPending && (
          <p role="status" className="text-sm text-graphite-mute">
            Loading setup cards…
          </p>
        )}
        {cards.isError && (
          <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
            Could not load setup cards: {cards.error.message}
          </p>
        )}
        {remove.isError && (
          <p role="alert" className="field-error">
            {remove.error.message}
          </p>
        )}
        {cards.isSuccess && cards.data.length === 0 && (
          <EmptyState title="No saved setup cards yet.">
            Save the settings that cut a good joint, per joint and stock thickness; drawer schedules show them.
          </EmptyState>
        )}
        <ul className="grid gap-3 md:grid-cols-2" aria-label="Saved setup cards">
          {cards.data?.map((c) => (
            <li key={c.id} className="space-y-2">
              <SetupCardView card={c} units={units} source="saved" />
              {canWrite && (
                <div className="flex gap-2">
                  <button type="button" className="btn-quiet" onClick={() => setEditing({ id: c.id, card: c })}>
                    Edit
                  </button>
                  <button
                    type="button"
                    className="btn-danger"
                    onClick={() => {
                      if (window.confirm('Delete this setup card?')) remove.mutate(c.id);
                    }}
                  >
                    Delete
                  </button>
                </div>
              )}
            </li>
          ))}
        </ul>
        {unsavedDefaults.length > 0 && (
          <div>
            <h2 className="mb-2 text-base">Starting values</h2>
            <ul className="grid gap-3 md:grid-cols-2">
              {unsavedDefaults.map((d) => (
                <li key={d.stockThickness} className="space-y-2">
                  <SetupCardView card={d} units={units} source="default" />
                  {canWrite && (
                    <button type="button" className="btn-quiet" onClick={() => setEditing({ id: null, card: d })}>
                      Adjust and save
                    </button>
                  )}
                </li>
              ))}
            </ul>
          </div>
        )}
      </div>
      <RouterCautions />
    </div>
  );
}

function CardForm({ id, card, units, onDone }: { id: string | null; card: SetupCard; units: ShopUnits; onDone: () => void }) {
  const qc = useQueryClient();
  const schema = useMemo(() => cardForm(units), [units]);
  const { register, control, handleSubmit, formState, setError } = useForm<FormText, unknown, FormValues>({
    resolver: zodResolver(schema),
    defaultValues: toText(card, units),
  });
  const rows = useFieldArray({ control, name: 'fields' });
  const save = useMutation({
    mutationFn: (v: FormValues) => {
      const body = { joint: v.joint, stockThickness: v.stockThickness, fields: v.fields, note: v.note };
      return id ? call('PUT /api/setup-cards/:id', { params: { id }, body }) : call('POST /api/setup-cards', { body });
    },
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['setup-cards'] });
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError && e.fields.stockThickness) setError('stockThickness', { message: e.fields.stockThickness[0] });
    },
  });
  const err = formState.errors;
  return (
    <form
      onSubmit={handleSubmit((v) => save.mutate(v))}
      aria-label={id ? 'Edit setup card' : 'New setup card'}
      className="card grid gap-4 p-5 sm:grid-cols-2"
    >
      <div>
        <label htmlFor="sc-joint" className="field-label">
          Joint
        </label>
        <select id="sc-joint" className="field-input" {...register('joint')}>
          {JOINT_METHODS.map((m) => (
            <option key={m} value={m}>
              {JOINT_NAMES[m]}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="sc-thickness" className="field-label">
          Stock thickness
        </label>
        <input id="sc-thickness" className="field-input" {...register('stockThickness')} />
        {err.stockThickness && <p className="field-error">{err.stockThickness.message}</p>}
      </div>
      <fieldset className="sm:col-span-2">
        <legend className="field-label">Settings</legend>
        <div className="space-y-2">
          {rows.fields.map((row, i) => (
            <div key={row.id} className="grid grid-cols-[2fr_1fr_auto_auto] items-start gap-2">
              <div>
                <input aria-label={`Setting ${i + 1} name`} className="field-input" {...register(`fields.${i}.label`)} />
                {err.fields?.[i]?.label && <p className="field-error">{err.fields[i]?.label?.message}</p>}
              </div>
              <div>
                <input aria-label={`Setting ${i + 1} value`} className="field-input" {...register(`fields.${i}.value`)} />
                {err.fields?.[i]?.value && <p className="field-error">{err.fields[i]?.value?.message}</p>}
              </div>
              <select aria-label={`Setting ${i + 1} unit`} className="field-input" {...register(`fields.${i}.unit`)}>
                <option value="mm">length</option>
                <option value="rpm">rpm</option>
                <option value="deg">degrees</option>
              </select>
              <button type="button" className="btn-quiet" onClick={() => rows.remove(i)} aria-label={`Remove setting ${i + 1}`}>
                ✕
              </button>
            </div>
          ))}
        </div>
        <button type="button" className="mt-2 text-sm text-oak-deep underline" onClick={() => rows.append({ label: '', value: '', unit: 'mm' })}>
          Add a setting
        </button>
      </fieldset>
      <div className="sm:col-span-2">
        <label htmlFor="sc-note" className="field-label">
          Note
        </label>
        <textarea id="sc-note" rows={2} className="field-input" {...register('note')} />
      </div>
      {save.error && (
        <p role="alert" className="field-error sm:col-span-2">
          {save.error.message}
        </p>
      )}
      <div className="flex gap-2 sm:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          Save card
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
