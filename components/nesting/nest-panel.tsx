'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError, call } from '@/client/api';
import { formatMoney } from '@/lib/money';
import { formatLength } from '@/lib/units/format-length';
import { cuttingStyleSchema, objectiveSchema, type NestRequestInput, type NestStock, type Plan } from '@/shared/schemas/nesting';
import type { NestSettingsOverride } from '@/shared/schemas/plan-save';
import type { NestFor } from '@/shared/schemas/recut';
import type { ShopSettings } from '@/shared/schemas/shop';
import { sawKindText, type NestSaw } from '@/shared/schemas/saw';
import type { SavedSaw } from '@/shared/wire/settings';
import { lengthInput, shopLengthUnit } from '@/shared/schemas/units';
import { NestProgressBar } from './nest-progress';
import { PlanSummary } from './plan-summary';
import { useNestingWorker } from './use-nesting-worker';
import { Field } from '@/components/ui/field';
import { requestForChoice } from '@/lib/nesting/request-for-choice';

const settingsForm = (unit: 'in' | 'mm') =>
  z.object({
    kerf: lengthInput(unit),
    trim: lengthInput(unit),
    minOffcutLength: lengthInput(unit),
    minOffcutWidth: lengthInput(unit),
    style: cuttingStyleSchema,
    objective: objectiveSchema,
    timeBudgetSec: z.coerce.number({ error: 'Enter seconds.' }).min(0, 'At least 0 s.').max(120, 'At most 120 s.'),
    preferOffcuts: z.boolean(),
    sawId: z.string(),
    breakdownSawId: z.string(),
    stockIds: z.array(z.string()).min(1, 'Choose at least one kind of stock.'),
  });

const STOCK_KIND = { sheet: 'Sheets', board: 'Boards', offcut: 'Offcuts' } as const;

interface NestResult {
  plan: Plan;
  stockIds: string[];
  settings: NestSettingsOverride;
}

/**
 * Choose stock and settings, nest in the worker with progress, look at the result and save it as a draft. With
 * `nestFor: 'recuts'` the parts are the job's open re-cuts only, and the saved plan is a re-cut plan.
 */
export function NestPanel({
  jobId,
  shop,
  showPrices,
  nestFor = 'cut-list',
}: {
  jobId: string;
  shop: ShopSettings;
  showPrices: boolean;
  nestFor?: NestFor;
}) {
  const offered = useQuery({
    queryKey: ['nest-request', jobId, nestFor],
    queryFn: () => call('GET /api/jobs/:id/nest-request', { params: { id: jobId }, query: { for: nestFor } }),
  });
  const saws = useQuery({ queryKey: ['saws'], queryFn: () => call('GET /api/saws') });
  if (offered.isPending || saws.isPending) return <p className="text-sm text-graphite-mute">Loading the stock on offer…</p>;
  if (offered.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the stock on offer: {offered.error.message}
      </p>
    );
  if (saws.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the shop’s saws: {saws.error.message}
      </p>
    );
  return <NestForm jobId={jobId} shop={shop} showPrices={showPrices} offered={offered.data} saws={saws.data} nestFor={nestFor} />;
}

/** The saw a nest starts with: the shop's first saw, or with a track saw beside another, the track saw breaking down. */
export function defaultSaws(saws: readonly SavedSaw[]): { sawId: string; breakdownSawId: string } {
  const track = saws.find((s) => s.kind === 'track-saw');
  const other = saws.find((s) => s.kind !== 'track-saw');
  if (track && other) return { sawId: other.id, breakdownSawId: track.id };
  return { sawId: saws[0]?.id ?? '', breakdownSawId: '' };
}

/** The profile a request carries: the same the server builds from Shop settings (db/queries/nest-request.ts). */
const profile = (s: SavedSaw & { updatedAt?: string }): NestSaw => {
  const { updatedAt: _u, ...rest } = s;
  return rest;
};

function NestForm({
  jobId,
  shop,
  showPrices,
  offered,
  saws,
  nestFor,
}: {
  jobId: string;
  shop: ShopSettings;
  showPrices: boolean;
  offered: NestRequestInput;
  saws: SavedSaw[];
  nestFor: NestFor;
}) {
  const unit = shopLengthUnit(shop.units);
  const schema = useMemo(() => settingsForm(unit), [unit]);
  const len = (mm: number) => formatLength(mm, shop.units);
  const thick = (mm: number) => exactLengthText(mm, shop.units);
  const s = offered.settings ?? {};
  const shopDefaults = {
    kerf: s.kerf ?? shop.kerf,
    trim: s.trim ?? shop.edgeTrim,
    minOffcutLength: s.minOffcutLength ?? shop.minOffcutLength,
    minOffcutWidth: s.minOffcutWidth ?? shop.minOffcutWidth,
  };
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      kerf: len(shopDefaults.kerf),
      trim: len(shopDefaults.trim),
      minOffcutLength: len(shopDefaults.minOffcutLength),
      minOffcutWidth: len(shopDefaults.minOffcutWidth),
      style: 'panel',
      objective: 'cost',
      timeBudgetSec: 3,
      preferOffcuts: true,
      ...defaultSaws(saws),
      stockIds: offered.stock.map((st) => st.id),
    },
  });
  const chosenSawId = form.watch('sawId');
  const { errors } = form.formState;
  const worker = useNestingWorker();
  const [result, setResult] = useState<NestResult | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [budgetMs, setBudgetMs] = useState(3000);
  const partCount = offered.parts.reduce((n, p) => n + (p.quantity ?? 1), 0);

  const nest = form.handleSubmit(async (v) => {
    // A length left as shown keeps the shop's exact value (the field shows it rounded to the shop's precision).
    const dirty = form.formState.dirtyFields;
    const exact = (field: 'kerf' | 'trim' | 'minOffcutLength' | 'minOffcutWidth', typed: number) => (dirty[field] ? typed : shopDefaults[field]);
    const saw = saws.find((sw) => sw.id === v.sawId);
    const breakdown = saw ? saws.find((sw) => sw.id === v.breakdownSawId && sw.id !== saw.id) : undefined;
    const settings: NestSettingsOverride = {
      kerf: exact('kerf', v.kerf),
      trim: exact('trim', v.trim),
      minOffcutLength: exact('minOffcutLength', v.minOffcutLength),
      minOffcutWidth: exact('minOffcutWidth', v.minOffcutWidth),
      style: v.style,
      objective: v.objective,
      timeBudgetMs: Math.round(v.timeBudgetSec * 1000),
      preferOffcuts: v.preferOffcuts,
      ...(saw ? { sawId: saw.id } : {}),
      ...(breakdown ? { breakdownSawId: breakdown.id } : {}),
    };
    // The same rule the server judges the saved plan by (lib/nesting/request-for-choice.ts).
    const { sawId: _s, breakdownSawId: _b, ...engineSettings } = settings;
    const request = requestForChoice(offered, {
      stockIds: v.stockIds,
      settings: engineSettings,
      saw: saw ? profile(saw) : undefined,
      breakdownSaw: breakdown ? profile(breakdown) : undefined,
    });
    setResult(null);
    setFailure(null);
    setBudgetMs(settings.timeBudgetMs ?? 0);
    const outcome = await worker.run(request);
    if (outcome.ok) setResult({ plan: outcome.plan, stockIds: v.stockIds, settings });
    else setFailure(outcome.error === 'invalid-request' ? outcome.issues.map((i) => `${i.path}: ${i.message}`).join('; ') : outcome.message);
  });

  const groups = (['sheet', 'board', 'offcut'] as const)
    .map((kind) => ({ kind, stock: offered.stock.filter((st) => st.kind === kind) }))
    .filter((g) => g.stock.length);

  return (
    <div className="space-y-5">
      <form onSubmit={nest} className="space-y-4" aria-label="Nest settings" noValidate>
        <fieldset className="card min-w-0 overflow-x-auto p-3">
          <legend className="px-1 text-sm font-semibold">Stock to nest on</legend>
          {offered.stock.length === 0 && <p className="text-sm text-graphite-mute">The stock room has nothing on offer yet.</p>}
          {groups.map((g) => (
            <table key={g.kind} className="data-table mb-2" aria-label={STOCK_KIND[g.kind]}>
              <thead>
                <tr>
                  <th className="w-8"></th>
                  <th>{STOCK_KIND[g.kind]}</th>
                  <th className="num">Size</th>
                  <th className="num">Available</th>
                  {showPrices && <th className="num">Each</th>}
                  <th>Where</th>
                </tr>
              </thead>
              <tbody>
                {g.stock.map((st) => (
                  <tr key={st.id}>
                    <td>
                      <input type="checkbox" value={st.id} aria-label={stockLabel(st, len)} {...form.register('stockIds')} />
                    </td>
                    <td>
                      {thick(st.thickness)} {st.material}
                      {st.grain === 'none' ? ' (no grain)' : ''}
                    </td>
                    <td className="num">
                      {len(st.length)} × {len(st.width)}
                    </td>
                    <td className="num">{st.count === null ? 'buy as needed' : `${st.count} on hand`}</td>
                    {showPrices && <td className="num">{formatMoney(Math.round(st.costEach ?? 0), shop.currency)}</td>}
                    <td className="text-graphite-mute">{st.source ?? ''}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ))}
          {errors.stockIds && <p className="field-error">{errors.stockIds.message}</p>}
        </fieldset>

        <fieldset className="card grid gap-3 p-3 sm:grid-cols-4">
          <legend className="px-1 text-sm font-semibold">Settings</legend>
          <Field id="kerf" label="Saw kerf" error={errors.kerf?.message}>
            <input id="kerf" className="field-input" {...form.register('kerf')} />
          </Field>
          <Field id="trim" label="Edge trim (each side)" error={errors.trim?.message}>
            <input id="trim" className="field-input" {...form.register('trim')} />
          </Field>
          <Field id="min-offcut-length" label="Keep offcuts this long" error={errors.minOffcutLength?.message}>
            <input id="min-offcut-length" className="field-input" {...form.register('minOffcutLength')} />
          </Field>
          <Field id="min-offcut-width" label="… and this wide" error={errors.minOffcutWidth?.message}>
            <input id="min-offcut-width" className="field-input" {...form.register('minOffcutWidth')} />
          </Field>
          <Field id="saw" label="Cut on">
            <select id="saw" className="field-input" {...form.register('sawId')}>
              {saws.map((sw) => (
                <option key={sw.id} value={sw.id}>
                  {sw.name} ({sawKindText(sw).toLowerCase()})
                </option>
              ))}
              <option value="">No saw: choose a cutting style</option>
            </select>
          </Field>
          {chosenSawId ? (
            <Field id="breakdown-saw" label="Break sheets down on">
              <select id="breakdown-saw" className="field-input" {...form.register('breakdownSawId')}>
                <option value="">No breakdown: the whole sheet on the saw</option>
                {saws
                  .filter((sw) => sw.id !== chosenSawId)
                  .map((sw) => (
                    <option key={sw.id} value={sw.id}>
                      {sw.name} ({sawKindText(sw).toLowerCase()})
                    </option>
                  ))}
              </select>
            </Field>
          ) : (
            <Field id="style" label="Cutting style">
              <select id="style" className="field-input" {...form.register('style')}>
                <option value="panel">Panel saw: any through-cuts</option>
                <option value="strips">Table saw strips: rip, crosscut, trim</option>
              </select>
            </Field>
          )}
          <Field id="objective" label="Aim for">
            <select id="objective" className="field-input" {...form.register('objective')}>
              <option value="cost">Lowest material cost</option>
              <option value="pieces">Fewest stock pieces</option>
              <option value="cuts">Fewest cuts</option>
            </select>
          </Field>
          <Field id="time-budget" label="Search for (seconds)" error={errors.timeBudgetSec?.message}>
            <input id="time-budget" type="number" min={0} max={120} step={1} className="field-input" {...form.register('timeBudgetSec')} />
          </Field>
          <label className="flex items-center gap-2 self-end pb-2 text-sm">
            <input type="checkbox" {...form.register('preferOffcuts')} /> Use offcuts first
          </label>
        </fieldset>

        <div className="flex items-center gap-3">
          <button type="submit" className="btn-accent" disabled={worker.running || partCount === 0}>
            Nest {partCount} {nestFor === 'recuts' ? `re-cut${partCount === 1 ? '' : 's'}` : `part${partCount === 1 ? '' : 's'}`}
          </button>
          {partCount === 0 && (
            <span className="text-sm text-graphite-mute">
              {nestFor === 'recuts' ? 'No re-cut is open: each is cut, cancelled or in a released plan.' : 'Add parts to the cut list first.'}
            </span>
          )}
        </div>
      </form>

      {worker.running && (
        <NestProgressBar
          progress={worker.progress}
          budgetMs={budgetMs}
          label="Nesting in the background — the page stays usable"
          onCancel={worker.cancel}
        />
      )}
      {failure && (
        <p className="field-error" role="alert">
          The Nest could not run: {failure}
        </p>
      )}
      {result && <NestResultCard jobId={jobId} result={result} shop={shop} showPrices={showPrices} nestFor={nestFor} />}
    </div>
  );
}

function NestResultCard({
  jobId,
  result,
  shop,
  showPrices,
  nestFor,
}: {
  jobId: string;
  result: NestResult;
  shop: ShopSettings;
  showPrices: boolean;
  nestFor: NestFor;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [name, setName] = useState(`${nestFor === 'recuts' ? 'Re-cuts' : 'Plan'} ${new Date().toLocaleDateString()}`);
  const save = useMutation({
    mutationFn: () =>
      call('POST /api/jobs/:id/plans', {
        params: { id: jobId },
        body: { name, settings: result.settings, stockIds: result.stockIds, for: nestFor, plan: result.plan },
      }),
    onSuccess: ({ id }) => {
      void queryClient.invalidateQueries({ queryKey: ['plans', jobId] });
      router.push(`/jobs/${jobId}/plan/${id}`);
    },
  });
  const problems = save.error instanceof ApiError ? Object.values(save.error.fields).flat() : [];
  return (
    <section aria-labelledby="nest-result" className="space-y-3">
      <h3 id="nest-result" className="text-base font-semibold">
        Result
      </h3>
      <PlanSummary plan={result.plan} units={shop.units} currency={shop.currency} showPrices={showPrices} />
      <div className="flex flex-wrap items-end gap-3">
        <div className="w-72">
          <label htmlFor="plan-name" className="field-label">
            Plan name
          </label>
          <input id="plan-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} />
        </div>
        <button type="button" className="btn-primary" disabled={save.isPending || !name.trim()} onClick={() => save.mutate()}>
          {save.isPending ? 'Saving…' : 'Save as draft plan'}
        </button>
      </div>
      {save.error && (
        <div className="field-error" role="alert">
          {save.error.message}
          {problems.length > 0 && (
            <ul className="ml-5 list-disc">
              {problems.slice(0, 8).map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          )}
        </div>
      )}
    </section>
  );
}

const stockLabel = (st: NestStock | NestRequestInput['stock'][number], len: (mm: number) => string) =>
  `${st.kind} ${len(st.thickness)} ${st.material} ${len(st.length)} × ${len(st.width)}${st.count === null ? ' to buy' : ''}`;
