'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ApiError, call } from '@/client/api';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatLength } from '@/lib/units/format-length';
import type { SlideModel } from '@/shared/schemas/slide-model';
import type { ShopUnits } from '@/shared/schemas/units';
import {
  blankSlideModelText,
  KIND_LABELS,
  readSlideModelForm,
  SLIDE_MODEL_KINDS,
  SLIDE_WIDTH_RULES,
  slideModelText,
  WIDTH_RULE_LABELS,
  widthRuleText,
  type SlideModelFormText,
} from './slide-model-form-values';
import type { SavedSlideModel } from '@/shared/wire/settings';

export const SLIDE_MODELS_KEY = ['slide-models'] as const;

/** Shop settings → Drawer slides: the slide models drawer schedules size boxes from, as their makers specify them. */
export function SlideModelsSection() {
  const qc = useQueryClient();
  const settings = useQuery({ queryKey: ['settings'], queryFn: () => call('GET /api/settings') });
  const models = useQuery({ queryKey: SLIDE_MODELS_KEY, queryFn: () => call('GET /api/slide-models') });
  const [editing, setEditing] = useState<SavedSlideModel | 'new' | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/slide-models/:id', { params: { id } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: SLIDE_MODELS_KEY }),
  });
  const units = settings.data?.units;

  return (
    <section aria-labelledby="slide-models" className="mt-8 max-w-3xl">
      <div className="mb-2 flex items-center gap-3">
        <h2 id="slide-models" className="mr-auto">
          Drawer slides
        </h2>
        {units && editing === null && (
          <button type="button" className="btn-accent" onClick={() => setEditing('new')}>
            Add a slide model
          </button>
        )}
      </div>
      <p className="mb-4 text-sm text-graphite-mute">
        Drawer schedules on undermount slides are sized from the model chosen: its width rule, its height and rear clearances, and the lengths it is
        made in (the box is as long as its slide). Copy the figures from the maker’s sheet; a saved schedule keeps the rule it was sized by.
      </p>
      {units && editing !== null && (
        <SlideModelForm
          key={editing === 'new' ? 'new' : editing.id}
          editing={editing === 'new' ? null : editing}
          units={units}
          onDone={() => setEditing(null)}
        />
      )}
      {(models.isPending || settings.isPending) && (
        <p role="status" className="text-sm text-graphite-mute">
          Loading slide models…
        </p>
      )}
      {models.isError && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          Could not load slide models: {models.error.message}
        </p>
      )}
      {remove.isError && (
        <p role="alert" className="field-error">
          {remove.error.message}
        </p>
      )}
      {models.isSuccess && models.data.length === 0 && editing === null && (
        <EmptyState title="No slide models yet.">Add the undermount slides the shop uses; the drawer schedule form offers them.</EmptyState>
      )}
      {units && (
        <ul className="grid gap-3" aria-label="Slide models">
          {models.data?.map((m) => (
            <li key={m.id} className="card p-4">
              <div className="flex items-start gap-2">
                <p className="mr-auto min-w-0 font-semibold">
                  {m.name} <span className="text-xs font-normal text-graphite-mute">· {KIND_LABELS[m.kind]}</span>
                </p>
                <button type="button" className="btn-quiet" onClick={() => setEditing(m)} aria-label={`Edit ${m.name}`}>
                  Edit
                </button>
                <button
                  type="button"
                  className="btn-danger"
                  disabled={remove.isPending}
                  aria-label={`Delete ${m.name}`}
                  onClick={() => {
                    if (window.confirm(`Delete the slide model “${m.name}”? Schedules already sized on it keep its rule.`)) remove.mutate(m.id);
                  }}
                >
                  Delete
                </button>
              </div>
              <ModelFacts model={m} units={units} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** What a model does to a box, in the shop's unit where that is exact, else as the maker gave it (250 mm in an inch shop). */
export function ModelFacts({ model: m, units }: { model: SlideModel; units: ShopUnits }) {
  const len = (mm: number) => (mm === 0 ? formatLength(0, units) : exactLengthText(mm, units));
  return (
    <dl className="mt-1 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-0.5 text-sm">
      <dt className="text-graphite-mute">Width</dt>
      <dd>{widthRuleText(m, units, len)}</dd>
      <dt className="text-graphite-mute">Height</dt>
      <dd>Box = opening − {len(m.heightClearance)}</dd>
      <dt className="text-graphite-mute">Lengths</dt>
      <dd>
        {m.lengths.map(len).join(', ')} · {len(m.rearClearance)} behind
      </dd>
      <dt className="text-graphite-mute">Sides</dt>
      <dd>
        {m.maxSideThickness === null ? 'any thickness' : `up to ${len(m.maxSideThickness)}`}
        {m.kind === 'undermount' ? ` · bottom at least ${len(m.bottomRecess)} up` : ''}
      </dd>
    </dl>
  );
}

function SlideModelForm({ editing, units, onDone }: { editing: SavedSlideModel | null; units: ShopUnits; onDone: () => void }) {
  const qc = useQueryClient();
  const initial = editing ? slideModelText(editing, units) : blankSlideModelText();
  const [kind, setKind] = useState(initial.kind);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: (model: SlideModel) =>
      editing ? call('PUT /api/slide-models/:id', { params: { id: editing.id }, body: model }) : call('POST /api/slide-models', { body: model }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: SLIDE_MODELS_KEY });
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError && Object.keys(e.fields).length) {
        const back: Record<string, keyof SlideModelFormText> = {
          lengths: 'lengths',
          widthDeduction: 'widthDeduction',
          maxSideThickness: 'maxSideThickness',
          bottomRecess: 'bottomRecess',
          heightClearance: 'heightClearance',
          rearClearance: 'rearClearance',
        };
        setErrors(Object.fromEntries(Object.entries(e.fields).map(([k, v]) => [back[k] ?? k, v[0]])));
      }
    },
  });

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = Object.fromEntries(Object.keys(initial).map((k) => [k, String(form.get(k) ?? '')])) as unknown as SlideModelFormText;
    const read = readSlideModelForm(text, units);
    setErrors(read.ok ? {} : read.errors);
    if (read.ok) save.mutate(read.model);
  }

  const unitWord = units.system === 'metric' ? 'mm' : 'inches';
  const input = (name: keyof SlideModelFormText, label: string, hint?: string, placeholder?: string) => (
    <div>
      <label htmlFor={`sm-${name}`} className="field-label">
        {label}
      </label>
      <input
        id={`sm-${name}`}
        name={name}
        className="field-input"
        defaultValue={initial[name]}
        placeholder={placeholder}
        aria-invalid={errors[name] ? true : undefined}
      />
      {errors[name] ? <p className="field-error">{errors[name]}</p> : hint ? <p className="mt-1 text-xs text-graphite-mute">{hint}</p> : null}
    </div>
  );

  return (
    <form onSubmit={onSubmit} aria-label={editing ? `Edit ${editing.name}` : 'New slide model'} className="card mb-4 grid gap-4 p-5 md:grid-cols-2">
      <h3 className="font-semibold md:col-span-2">{editing ? `Edit “${editing.name}”` : 'New slide model'}</h3>
      {input('name', 'Name', 'Maker and model, as the order sheet says.')}
      <div>
        <label htmlFor="sm-kind" className="field-label">
          Kind
        </label>
        <select id="sm-kind" name="kind" className="field-input" value={kind} onChange={(e) => setKind(e.target.value)}>
          {SLIDE_MODEL_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </div>
      <div className="md:col-span-2">
        {input(
          'lengths',
          `Lengths it is made in (${unitWord})`,
          'Separate them with a comma and a space: 12, 15, 18, 21. A box on the slide is as long as its slide.',
          units.system === 'metric' ? '250, 300, 350, 400, 450, 500' : '12, 15, 18, 21',
        )}
      </div>
      <div>
        <label htmlFor="sm-widthRule" className="field-label">
          Width rule
        </label>
        <select id="sm-widthRule" name="widthRule" className="field-input" defaultValue={initial.widthRule}>
          {SLIDE_WIDTH_RULES.map((r) => (
            <option key={r} value={r}>
              {WIDTH_RULE_LABELS[r]}
            </option>
          ))}
        </select>
        {errors.widthRule && <p className="field-error">{errors.widthRule}</p>}
      </div>
      {input('widthDeduction', 'Width deduction', 'From the maker’s sheet: the opening less this is the width above.')}
      {input('maxSideThickness', 'Thickest side it takes', 'Blank: any. Thicker sides are refused in a schedule.')}
      {kind === 'undermount' ? (
        input('bottomRecess', 'Bottom recess', 'The bottom sits at least this far above the sides’ lower edge.')
      ) : (
        <input type="hidden" name="bottomRecess" value="0" />
      )}
      {input('heightClearance', 'Height clearance', 'Opening height less box height.')}
      {input('rearClearance', 'Rear clearance', 'Room the slide needs behind its length.')}
      {save.isError && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) && (
        <p role="alert" className="field-error md:col-span-2">
          {save.error.message}
        </p>
      )}
      <div className="flex gap-2 md:col-span-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : editing ? 'Save changes' : 'Add the slide model'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
