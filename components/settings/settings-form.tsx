'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';
import type { ShopSettings } from '@/shared/schemas/shop';
import { timeZoneChoices } from '@/lib/dates/shop-time';
import { LENGTH_FIELDS, readSettingsForm, settingsFormText, UNIT_CHOICES, type SettingsFormText } from './settings-form-values';

export function SettingsForm() {
  const queryClient = useQueryClient();
  const settings = useQuery({ queryKey: ['settings'], queryFn: () => call('GET /api/settings') });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const save = useMutation({
    mutationFn: (body: Partial<ShopSettings>) => call('PATCH /api/settings', { body }),
    onSuccess: (data) => queryClient.setQueryData(['settings'], data),
    onError: (e) => setFields(e instanceof ApiError ? e.fields : {}),
  });

  if (settings.isPending)
    return (
      <p role="status" className="text-sm text-graphite-mute">
        Loading settings…
      </p>
    );
  if (settings.isError)
    return (
      <p role="alert" className="text-sm text-brick">
        Could not load settings: {settings.error.message}
      </p>
    );
  const current = settings.data;

  const shown = settingsFormText(current);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = Object.fromEntries(Object.keys(shown).map((k) => [k, String(form.get(k) ?? '')])) as SettingsFormText;
    const read = readSettingsForm(current, text);
    setFields(read.ok ? {} : read.errors);
    if (read.ok) save.mutate(read.patch);
  }

  return (
    <form key={JSON.stringify(current)} onSubmit={onSubmit} className="card grid max-w-3xl gap-5 p-6 md:grid-cols-2" aria-label="Shop settings">
      <div>
        <label htmlFor="s-name" className="field-label">
          Shop name
        </label>
        <input id="s-name" name="name" className="field-input" defaultValue={shown.name} />
        {fields.name && <p className="field-error">{fields.name[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-units" className="field-label">
          Units
        </label>
        <select id="s-units" name="units" className="field-input" defaultValue={shown.units}>
          {UNIT_CHOICES.map((c) => (
            <option key={c.key} value={c.key}>
              {c.label}
            </option>
          ))}
        </select>
      </div>
      {LENGTH_FIELDS.map(([key, label, hint]) => (
        <div key={key}>
          <label htmlFor={`s-${key}`} className="field-label">
            {label}
          </label>
          <input id={`s-${key}`} name={key} className="field-input font-mono" defaultValue={shown[key]} />
          {hint && <p className="mt-1 text-xs text-graphite-mute">{hint}</p>}
          {fields[key] && <p className="field-error">{fields[key][0]}</p>}
        </div>
      ))}
      <div>
        <label htmlFor="s-currency" className="field-label">
          Currency
        </label>
        <input id="s-currency" name="currency" className="field-input uppercase" defaultValue={shown.currency} maxLength={3} />
        {fields.currency && <p className="field-error">{fields.currency[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-waste" className="field-label">
          Spoilage allowance for takeoffs (%)
        </label>
        <input id="s-waste" name="wastePercent" type="number" min={0} max={90} className="field-input" defaultValue={shown.wastePercent} />
        {fields.wastePercent && <p className="field-error">{fields.wastePercent[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-zone" className="field-label">
          Time zone
        </label>
        <select id="s-zone" name="timeZone" className="field-input" defaultValue={shown.timeZone}>
          {timeZoneChoices().map((z) => (
            <option key={z} value={z}>
              {z.replace(/_/g, ' ')}
            </option>
          ))}
        </select>
        <p className="mt-1 text-xs text-graphite-mute">Reports group and show dates on the shop’s clock.</p>
        {fields.timeZone && <p className="field-error">{fields.timeZone[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-target" className="field-label">
          Yield target (%)
        </label>
        <input
          id="s-target"
          name="yieldTargetPercent"
          type="number"
          min={1}
          max={100}
          className="field-input"
          defaultValue={shown.yieldTargetPercent}
        />
        <p className="mt-1 text-xs text-graphite-mute">Share of the stock area you aim to turn into parts: the line on the yield report.</p>
        {fields.yieldTargetPercent && <p className="field-error">{fields.yieldTargetPercent[0]}</p>}
      </div>
      <div>
        <label htmlFor="s-age" className="field-label">
          Offcuts old after (months)
        </label>
        <input id="s-age" name="offcutAgeMonths" type="number" min={1} max={120} className="field-input" defaultValue={shown.offcutAgeMonths} />
        <p className="mt-1 text-xs text-graphite-mute">Offcuts racked longer are listed on the offcut report, to use or scrap.</p>
        {fields.offcutAgeMonths && <p className="field-error">{fields.offcutAgeMonths[0]}</p>}
      </div>
      <div className="flex items-center gap-3 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save settings'}
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
  );
}
