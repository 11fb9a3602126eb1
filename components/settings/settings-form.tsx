'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { api, ApiError } from '@/lib/client/api';
import { formatLength } from '@/lib/units/format-length';
import { parseLength } from '@/lib/units/parse-length';
import type { ShopSettings } from '@/shared/schemas/shop';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';

const UNIT_CHOICES: { key: string; label: string; units: ShopUnits }[] = [
  { key: 'in16', label: 'Inches, to 1/16″', units: { system: 'imperial', precision: 16, feet: false } },
  { key: 'in32', label: 'Inches, to 1/32″', units: { system: 'imperial', precision: 32, feet: false } },
  { key: 'ft16', label: 'Feet and inches, to 1/16″', units: { system: 'imperial', precision: 16, feet: true } },
  { key: 'mm1', label: 'Millimetres, to 1 mm', units: { system: 'metric', precision: 1, feet: false } },
  { key: 'mm05', label: 'Millimetres, to 0.5 mm', units: { system: 'metric', precision: 0.5, feet: false } },
];

const LENGTH_FIELDS = [
  ['kerfMm', 'Saw kerf', 'Width of material the blade removes.'],
  ['edgeTrimMm', 'Edge trim', 'Taken off each factory edge of sheets and boards.'],
  ['minOffcutLengthMm', 'Keep offcuts at least this long', ''],
  ['minOffcutWidthMm', '… and at least this wide', ''],
] as const;

function unitKey(u: ShopUnits) {
  return UNIT_CHOICES.find((c) => JSON.stringify(c.units) === JSON.stringify(u))?.key ?? 'in16';
}

export function SettingsForm() {
  const queryClient = useQueryClient();
  const settings = useQuery({ queryKey: ['settings'], queryFn: () => api<ShopSettings>('/api/settings') });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const save = useMutation({
    mutationFn: (body: Partial<ShopSettings>) => api<ShopSettings>('/api/settings', { method: 'PATCH', body }),
    onSuccess: (data) => queryClient.setQueryData(['settings'], data),
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });

  if (settings.isPending) return <p role="status" className="text-sm text-graphite-mute">Loading settings…</p>;
  if (settings.isError) return <p role="alert" className="text-sm text-brick">Could not load settings: {settings.error.message}</p>;
  const current = settings.data;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const units = UNIT_CHOICES.find((c) => c.key === form.get('units'))!.units;
    // Lengths are typed in the shop's current unit (any form the parser reads) and sent in mm.
    const errors: Record<string, string[]> = {};
    const lengths: Record<string, number> = {};
    for (const [key] of LENGTH_FIELDS) {
      const parsed = parseLength(String(form.get(key) ?? ''), { unit: shopLengthUnit(current.units) });
      if (parsed.ok) lengths[key] = parsed.mm;
      else errors[key] = [parsed.error];
    }
    setFields(errors);
    if (Object.keys(errors).length) return;
    save.mutate({
      name: String(form.get('name') ?? ''),
      currency: String(form.get('currency') ?? '').toUpperCase(),
      wastePercent: Number(form.get('wastePercent')),
      units,
      ...lengths,
    });
  }

  return (
    <form key={JSON.stringify(current)} onSubmit={onSubmit} className="card grid max-w-3xl gap-5 p-6 md:grid-cols-2" aria-label="Shop settings">
      <div>
        <label htmlFor="s-name" className="field-label">Shop name</label>
        <input id="s-name" name="name" className="field-input" defaultValue={current.name} />
        {fields.name && <p className="field-error">{fields.name[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-units" className="field-label">Units</label>
        <select id="s-units" name="units" className="field-input" defaultValue={unitKey(current.units)}>
          {UNIT_CHOICES.map((c) => (
            <option key={c.key} value={c.key}>{c.label}</option>
          ))}
        </select>
      </div>
      {LENGTH_FIELDS.map(([key, label, hint]) => (
        <div key={key}>
          <label htmlFor={`s-${key}`} className="field-label">{label}</label>
          <input id={`s-${key}`} name={key} className="field-input font-mono" defaultValue={formatLength(current[key], current.units, { style: 'ascii' }).replace(/^~/, '')} />
          {hint && <p className="mt-1 text-xs text-graphite-mute">{hint}</p>}
          {fields[key] && <p className="field-error">{fields[key][0]}</p>}
        </div>
      ))}
      <div>
        <label htmlFor="s-currency" className="field-label">Currency</label>
        <input id="s-currency" name="currency" className="field-input uppercase" defaultValue={current.currency} maxLength={3} />
        {fields.currency && <p className="field-error">{fields.currency[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-waste" className="field-label">Waste allowance for takeoffs (%)</label>
        <input id="s-waste" name="wastePercent" type="number" min={0} max={90} className="field-input" defaultValue={current.wastePercent} />
        {fields.wastePercent && <p className="field-error">{fields.wastePercent[0]}</p>}
      </div>
      <div className="flex items-center gap-3 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>{save.isPending ? 'Saving…' : 'Save settings'}</button>
        {save.isSuccess && <span role="status" className="text-sm text-sage">Saved.</span>}
        {save.isError && !Object.keys(fields).length && <span role="alert" className="text-sm text-brick">{save.error.message}</span>}
      </div>
    </form>
  );
}
