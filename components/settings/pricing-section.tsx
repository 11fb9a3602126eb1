'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ApiError, call } from '@/client/api';
import { formatMoney, toMinorUnits } from '@/lib/costing/money';
import type { HardwareItem, PricingSettings } from '@/shared/schemas/pricing';
import { moneyText, PRICING_FIELDS, pricingFormText, readPricingForm, type PricingFormText } from './pricing-form-values';

export const PRICING_KEY = ['pricing'] as const;
export const HARDWARE_KEY = ['hardware'] as const;

/** Shop settings → Pricing: what every new quote starts from. */
export function PricingSection() {
  const qc = useQueryClient();
  const view = useQuery({ queryKey: PRICING_KEY, queryFn: () => call('GET /api/settings/pricing') });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const save = useMutation({
    mutationFn: (body: PricingSettings) => call('PUT /api/settings/pricing', { body }),
    onSuccess: (data) => qc.setQueryData(PRICING_KEY, data),
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });
  if (view.isPending)
    return (
      <p role="status" className="mt-8 text-sm text-graphite-mute">
        Loading pricing…
      </p>
    );
  if (view.isError)
    return (
      <p role="alert" className="mt-8 text-sm text-brick">
        Could not load pricing: {view.error.message}
      </p>
    );
  const { currency, pricing } = view.data;
  const shown = pricingFormText(pricing, currency);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = {
      ...Object.fromEntries(PRICING_FIELDS.map(([k]) => [k, String(form.get(k) ?? '')])),
      terms: String(form.get('terms') ?? ''),
      offcutValuation: String(form.get('offcutValuation') ?? ''),
      taxMaterial: form.get('taxMaterial') === 'on',
      taxHardware: form.get('taxHardware') === 'on',
      taxLabour: form.get('taxLabour') === 'on',
    } as PricingFormText;
    const read = readPricingForm(text, currency);
    setFields(read.ok ? {} : read.errors);
    if (read.ok) save.mutate(read.value);
  }

  return (
    <section aria-labelledby="pricing" className="mt-8 max-w-3xl">
      <h2 id="pricing" className="mb-2">
        Pricing
      </h2>
      <p className="mb-4 text-sm text-graphite-mute">
        Every new quote starts from these figures; the estimator can change any line of a quote. Amounts are in {currency}.
      </p>
      <form key={JSON.stringify(view.data)} onSubmit={onSubmit} className="card grid gap-5 p-6 md:grid-cols-2" aria-label="Pricing" noValidate>
        {PRICING_FIELDS.map(([key, label, kind, hint]) => (
          <div key={key}>
            <label htmlFor={`p-${key}`} className="field-label">
              {label}
            </label>
            <input
              id={`p-${key}`}
              name={key}
              inputMode="decimal"
              className={`field-input ${kind === 'money' ? 'font-mono' : ''}`}
              defaultValue={shown[key]}
            />
            {hint && <p className="mt-1 text-xs text-graphite-mute">{hint}</p>}
            {fields[key] && (
              <p className="field-error" role="alert">
                {fields[key][0]}
              </p>
            )}
          </div>
        ))}
        <fieldset className="md:col-span-2">
          <legend className="field-label">Taxable by default</legend>
          <div className="flex flex-wrap gap-4 text-sm">
            {(
              [
                ['taxMaterial', 'Material'],
                ['taxHardware', 'Hardware'],
                ['taxLabour', 'Labour'],
              ] as const
            ).map(([k, label]) => (
              <label key={k} className="flex items-center gap-2">
                <input type="checkbox" name={k} defaultChecked={shown[k]} /> {label}
              </label>
            ))}
          </div>
        </fieldset>
        <div className="md:col-span-2">
          <label htmlFor="p-offcutValuation" className="field-label">
            Offcuts a plan uses are priced
          </label>
          <select id="p-offcutValuation" name="offcutValuation" className="field-input" defaultValue={shown.offcutValuation}>
            <option value="area-cost">At area cost</option>
            <option value="free">Free</option>
          </select>
          <p className="mt-1 text-xs text-graphite-mute">
            At area cost: their share of the sheet or board they came from. Free: an earlier job paid for them.
          </p>
        </div>
        <div className="md:col-span-2">
          <label htmlFor="p-terms" className="field-label">
            Quote terms
          </label>
          <textarea id="p-terms" name="terms" rows={4} className="field-input" defaultValue={shown.terms} />
          {fields.terms && (
            <p className="field-error" role="alert">
              {fields.terms[0]}
            </p>
          )}
        </div>
        <div className="flex items-center gap-3 md:col-span-2">
          <button type="submit" className="btn-accent" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save pricing'}
          </button>
          {save.isSuccess && (
            <span role="status" className="text-sm text-sage">
              Saved.
            </span>
          )}
          {save.isError && !Object.keys(fields).length && (
            <span role="alert" className="text-sm text-brick">
              {save.error.message}
            </span>
          )}
        </div>
      </form>
      <HardwareList currency={currency} />
    </section>
  );
}

/** The hardware price list: name, unit, price; quotes pick hardware lines from it. */
function HardwareList({ currency }: { currency: string }) {
  const qc = useQueryClient();
  const items = useQuery({ queryKey: HARDWARE_KEY, queryFn: () => call('GET /api/settings/hardware') });
  const [editing, setEditing] = useState<HardwareItem | 'new' | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/settings/hardware/:id', { params: { id } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: HARDWARE_KEY }),
  });
  return (
    <div className="mt-6">
      <div className="mb-2 flex items-center gap-3">
        <h3 className="mr-auto font-semibold">Hardware price list</h3>
        {editing === null && (
          <button type="button" className="btn-quiet" onClick={() => setEditing('new')}>
            Add an item
          </button>
        )}
      </div>
      {editing !== null && (
        <HardwareForm
          key={editing === 'new' ? 'new' : editing.id}
          item={editing === 'new' ? null : editing}
          currency={currency}
          onDone={() => setEditing(null)}
        />
      )}
      {items.isError && (
        <p role="alert" className="field-error">
          Could not load the price list: {items.error.message}
        </p>
      )}
      {remove.isError && (
        <p role="alert" className="field-error">
          {remove.error.message}
        </p>
      )}
      {items.isSuccess && items.data.length === 0 && editing === null && (
        <EmptyState title="No hardware priced yet.">Add the slides, hinges, pulls and fasteners you sell; quotes offer them as lines.</EmptyState>
      )}
      {items.isSuccess && items.data.length > 0 && (
        <div className="card relative overflow-x-auto">
          <table className="data-table" aria-label="Hardware price list">
            <thead>
              <tr>
                <th>Item</th>
                <th>Unit</th>
                <th className="num">Price</th>
                <th>
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {items.data.map((h) => (
                <tr key={h.id}>
                  <td>{h.name}</td>
                  <td>{h.unit}</td>
                  <td className="num">{formatMoney(h.priceMinor, currency)}</td>
                  <td className="whitespace-nowrap text-right">
                    <button type="button" className="btn-quiet" aria-label={`Edit ${h.name}`} onClick={() => setEditing(h)}>
                      Edit
                    </button>{' '}
                    <button
                      type="button"
                      className="btn-danger"
                      aria-label={`Delete ${h.name}`}
                      disabled={remove.isPending}
                      onClick={() => {
                        if (window.confirm(`Take “${h.name}” off the price list? Quotes already made keep their lines.`)) remove.mutate(h.id);
                      }}
                    >
                      Delete
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

function HardwareForm({ item, currency, onDone }: { item: HardwareItem | null; currency: string; onDone: () => void }) {
  const qc = useQueryClient();
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const save = useMutation({
    mutationFn: (body: Omit<HardwareItem, 'id'>) =>
      item ? call('PUT /api/settings/hardware/:id', { params: { id: item.id }, body }) : call('POST /api/settings/hardware', { body }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: HARDWARE_KEY });
      onDone();
    },
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const priceText = String(form.get('price') ?? '')
      .trim()
      .replace(',', '.');
    let priceMinor: number;
    try {
      if (!/^\d+(\.\d+)?$/.test(priceText)) throw new RangeError('Type the price as a number, such as 14.95.');
      priceMinor = toMinorUnits(Number(priceText), currency);
    } catch (e) {
      return setFields({ priceMinor: [(e as Error).message.replace('An amount', 'The price')] });
    }
    save.mutate({ name: String(form.get('name') ?? ''), unit: String(form.get('unit') ?? ''), priceMinor });
  }
  return (
    <form
      onSubmit={onSubmit}
      className="card mb-3 grid gap-3 p-4 sm:grid-cols-3"
      aria-label={item ? `Edit ${item.name}` : 'New hardware item'}
      noValidate
    >
      <div>
        <label htmlFor="hw-name" className="field-label">
          Item
        </label>
        <input id="hw-name" name="name" className="field-input" defaultValue={item?.name ?? ''} placeholder="Hinge, 110° soft-close" autoFocus />
        {fields.name && (
          <p className="field-error" role="alert">
            {fields.name[0]}
          </p>
        )}
      </div>
      <div>
        <label htmlFor="hw-unit" className="field-label">
          Unit
        </label>
        <input id="hw-unit" name="unit" className="field-input" defaultValue={item?.unit ?? 'each'} />
        {fields.unit && (
          <p className="field-error" role="alert">
            {fields.unit[0]}
          </p>
        )}
      </div>
      <div>
        <label htmlFor="hw-price" className="field-label">
          Price ({currency})
        </label>
        <input
          id="hw-price"
          name="price"
          inputMode="decimal"
          className="field-input font-mono"
          defaultValue={item ? moneyText(item.priceMinor, currency) : ''}
        />
        {fields.priceMinor && (
          <p className="field-error" role="alert">
            {fields.priceMinor[0]}
          </p>
        )}
      </div>
      {save.isError && !Object.keys(fields).length && (
        <p className="field-error sm:col-span-3" role="alert">
          {save.error.message}
        </p>
      )}
      <div className="flex gap-2 sm:col-span-3">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {item ? 'Save item' : 'Add item'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
