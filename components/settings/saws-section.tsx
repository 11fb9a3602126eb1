'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ApiError, call } from '@/client/api';
import type { Saw } from '@/shared/schemas/saw';
import type { ShopUnits } from '@/shared/schemas/units';
import {
  blankSawText,
  readSawForm,
  SAW_KINDS,
  SAW_KIND_LABELS,
  sawFacts,
  sawFormField,
  sawKindText,
  sawText,
  type SawFormText,
} from './saw-form-values';
import type { SavedSaw } from '@/shared/wire/settings';

export const SAWS_KEY = ['saws'] as const;

/** The caution beside the safe minimum: the figure is the shop's, the saw's manual decides. */
export const FENCE_CAUTION =
  'Never trap a narrow strip between blade and fence: rip it off the free side, or use a sled or a track saw. Use the guard, riving knife and push sticks, and follow the saw’s manual and local codes; the figure here only keeps plans from asking for less.';

/** Shop settings → Saws: what each saw can cut; every nest keeps to the saw (or saws) it is cut on. */
export function SawsSection() {
  const qc = useQueryClient();
  const settings = useQuery({ queryKey: ['settings'], queryFn: () => call('GET /api/settings') });
  const saws = useQuery({ queryKey: SAWS_KEY, queryFn: () => call('GET /api/saws') });
  const [editing, setEditing] = useState<SavedSaw | 'new' | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/saws/:id', { params: { id } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: SAWS_KEY }),
  });
  const units = settings.data?.units;

  return (
    <section aria-labelledby="saws" className="mt-8 max-w-3xl">
      <div className="mb-2 flex items-center gap-3">
        <h2 id="saws" className="mr-auto">
          Saws
        </h2>
        {units && editing === null && (
          <button type="button" className="btn-accent" onClick={() => setEditing('new')}>
            Add a saw
          </button>
        )}
      </div>
      <p className="mb-4 text-sm text-graphite-mute">
        A nest keeps to the saw it is cut on: no fence setting past its rip capacity, no cut longer than it takes, no more stages of cuts than it is
        used with. The first saw here is the nest’s default; with a track saw as well, the track saw breaks the sheets down.
      </p>
      {units && editing !== null && (
        <SawForm
          key={editing === 'new' ? 'new' : editing.id}
          editing={editing === 'new' ? null : editing}
          units={units}
          onDone={() => setEditing(null)}
        />
      )}
      {(saws.isPending || settings.isPending) && (
        <p role="status" className="text-sm text-graphite-mute">
          Loading saws…
        </p>
      )}
      {saws.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load saws: {saws.error.message}
        </p>
      )}
      {remove.isError && (
        <p role="alert" className="field-error">
          {remove.error.message}
        </p>
      )}
      {saws.isSuccess && saws.data.length === 0 && editing === null && (
        <EmptyState title="No saws yet.">Add the saws the shop cuts sheet goods on; the nest keeps to them.</EmptyState>
      )}
      {units && (
        <ul className="grid gap-3" aria-label="Saws">
          {saws.data?.map((s) => (
            <li key={s.id} className="card p-4">
              <div className="flex items-start gap-2">
                <p className="mr-auto min-w-0 font-semibold">
                  {s.name} <span className="text-xs font-normal text-graphite-mute">· {sawKindText(s)}</span>
                </p>
                <button type="button" className="btn-quiet" onClick={() => setEditing(s)} aria-label={`Edit ${s.name}`}>
                  Edit
                </button>
                <button
                  type="button"
                  className="btn-danger"
                  disabled={remove.isPending}
                  aria-label={`Delete ${s.name}`}
                  onClick={() => {
                    if (window.confirm(`Delete the saw “${s.name}”? Plans already nested for it keep its figures.`)) remove.mutate(s.id);
                  }}
                >
                  Delete
                </button>
              </div>
              <dl className="mt-1 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-0.5 text-sm">
                {sawFacts(s, units).map((f) => (
                  <div key={f.label} className="contents">
                    <dt className="text-graphite-mute">{f.label}</dt>
                    <dd>{f.value}</dd>
                  </div>
                ))}
              </dl>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function SawForm({ editing, units, onDone }: { editing: SavedSaw | null; units: ShopUnits; onDone: () => void }) {
  const qc = useQueryClient();
  const initial = editing ? sawText(editing, units) : blankSawText();
  const [kind, setKind] = useState(initial.kind);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: (saw: Saw) =>
      editing ? call('PUT /api/saws/:id', { params: { id: editing.id }, body: saw }) : call('POST /api/saws', { body: saw }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: SAWS_KEY });
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError && Object.keys(e.fields).length)
        setErrors(Object.fromEntries(Object.entries(e.fields).map(([k, v]) => [sawFormField(k), v[0]])));
    },
  });

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = Object.fromEntries(Object.keys(initial).map((k) => [k, String(form.get(k) ?? '')])) as unknown as SawFormText;
    const read = readSawForm(text, units);
    setErrors(read.ok ? {} : read.errors);
    if (read.ok) save.mutate(read.saw);
  }

  const track = kind === 'track-saw';
  const input = (name: keyof SawFormText, label: string, hint?: string, placeholder?: string) => (
    <div>
      <label htmlFor={`saw-${name}`} className="field-label">
        {label}
      </label>
      <input
        id={`saw-${name}`}
        name={name}
        className="field-input"
        defaultValue={initial[name]}
        placeholder={placeholder}
        aria-invalid={errors[name] ? true : undefined}
      />
      {errors[name] ? <p className="field-error">{errors[name]}</p> : hint ? <p className="mt-1 text-xs text-graphite-mute">{hint}</p> : null}
    </div>
  );
  const select = (name: keyof SawFormText, label: string, options: [string, string][], onChange?: (v: string) => void) => (
    <div>
      <label htmlFor={`saw-${name}`} className="field-label">
        {label}
      </label>
      <select
        id={`saw-${name}`}
        name={name}
        className="field-input"
        defaultValue={initial[name]}
        onChange={onChange && ((e) => onChange(e.target.value))}
      >
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
      {errors[name] && <p className="field-error">{errors[name]}</p>}
    </div>
  );

  return (
    <form onSubmit={onSubmit} aria-label={editing ? `Edit ${editing.name}` : 'New saw'} className="card mb-4 grid gap-4 p-5 md:grid-cols-2">
      <h3 className="font-semibold md:col-span-2">{editing ? `Edit “${editing.name}”` : 'New saw'}</h3>
      {input('name', 'Name', 'As the shop calls it: “Cabinet saw”, “Track saw”.')}
      {select(
        'kind',
        'Kind',
        SAW_KINDS.map((k) => [k, k === 'other' ? 'Another kind (name it)' : SAW_KIND_LABELS[k]]),
        setKind,
      )}
      {kind === 'other' ? input('kindName', 'What kind of saw', 'A beam saw, a band saw…') : <input type="hidden" name="kindName" value="" />}
      {input('kerf', 'Kerf', 'The width the blade takes out.')}
      {input('ripCapacity', track ? 'Rip capacity (blank: no fence)' : 'Rip capacity', 'The widest fence setting, blade to fence. Blank: no limit.')}
      {input(
        'crosscutCapacity',
        track ? 'Track length' : 'Crosscut capacity',
        track ? 'The longest cut its track makes, rip or crosscut.' : 'The longest crosscut on the sled or carriage. Blank: no limit.',
      )}
      {input('maxPieceLength', 'Largest piece: length', 'Blank: any. A larger piece is broken down first.')}
      {input('maxPieceWidth', 'Largest piece: width', 'Blank: any.')}
      {select('maxStages', 'Stages of cuts', [
        ['2', 'At most 2'],
        ['3', 'At most 3'],
        ['4', 'At most 4'],
        ['any', 'Any number'],
      ])}
      {select('firstStage', 'First stage', [
        ['rip', 'Rips (strips along the length)'],
        ['crosscut', 'Crosscuts'],
      ])}
      <div className="md:col-span-2">
        {input('minFenceWidth', 'Narrowest strip between blade and fence', 'A rip never leaves less than this against the fence. 0: no minimum.')}
        <p className="mt-2 rounded-md bg-amber-wash px-3 py-2 text-xs text-graphite" role="note">
          {FENCE_CAUTION}
        </p>
      </div>
      {save.isError && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) && (
        <p role="alert" className="field-error md:col-span-2">
          {save.error.message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : editing ? 'Save changes' : 'Add the saw'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
