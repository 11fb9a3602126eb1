'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useEffect, useMemo, useRef } from 'react';
import { useForm, useWatch, type Path } from 'react-hook-form';
import { ApiError, call } from '@/client/api';
import { defaultSetupCard, DRAWER_DEFAULTS, findSetupCard, JOINT_NAMES, sizeDrawerSchedule } from '@/lib/joinery';
import { formatLength } from '@/lib/units/format-length';
import { drawerScheduleSchema, JOINT_METHODS, type DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import type { SetupCard } from '@/shared/schemas/setup-card';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { RouterCautions, SetupCardView } from '@/components/setup-cards/setup-card-view';
import { partsKey } from '@/components/cut-list/use-parts';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { snapThickness, stockMatchWarning, thicknessChoices, type StockOffer } from '@/lib/cut-list/stock-match';
import { parseLength } from '@/lib/units/parse-length';
import { ThicknessPicker } from './thickness-picker';
import { BoxPreview } from './box-preview';
import { FacePreview } from './face-preview';
import { widthRuleText } from '@/components/settings/slide-model-form-values';
import { bottomMovementWarning } from './bottom-movement';
import {
  emptySchedule,
  fieldOfPath,
  fromSchedule,
  JOINT_PARAM,
  lipDefaultMm,
  scheduleFormSchema,
  slideModelChoices,
  THICKNESS_FIELDS,
  thicknessMaterial,
  toScheduleInput,
  type ScheduleFormText,
  type ScheduleFormValues,
  type SlideModelChoice,
  type ThicknessField,
} from './schedule-form-values';

const SLIDE_LABELS = {
  'side-mount': 'Side-mount slides',
  undermount: 'Undermount slides',
  'wooden-runners': 'Wooden runners',
  none: 'No slides',
} as const;
const SERIES_LABELS = { metric: 'Metric (250–650 mm)', imperial: 'Imperial (12–28″)' } as const;
const SERIES_HINTS = { metric: '12.5 mm each side and above the box.', imperial: '½″ each side and above the box.' } as const;
const LIP_FIT_LABELS = {
  overlay: 'Overlay: laps past the opening',
  reveal: 'Reveal: stops inside the opening',
  lip: 'Lip past the box, given outright',
} as const;
const LIP_AMOUNT_LABELS = { overlay: 'Overlay each side', reveal: 'Reveal each side', lip: 'Lip past each side of the box' } as const;
const ROLE_NAMES = { front: 'Front', back: 'Back', side: 'Side', bottom: 'Bottom', 'applied-front': 'Applied front' } as const;

/**
 * A drawer schedule's form over lib/joinery: every change re-sizes the box at once (preview, parts, setup cards,
 * warnings); saving replaces the schedule's rows in the cut list.
 */
export function ScheduleForm({
  jobId,
  units,
  cards,
  offers,
  slideModels,
  editing,
  onDone,
}: {
  jobId: string;
  units: ShopUnits;
  cards: SetupCard[];
  offers: StockOffer[];
  slideModels: SlideModelChoice[];
  editing: { id: string; input: DrawerSchedule } | null;
  onDone: () => void;
}) {
  const unit = shopLengthUnit(units);
  const models = useMemo(() => slideModelChoices(slideModels, editing?.input), [slideModels, editing]);
  const schema = useMemo(() => scheduleFormSchema(unit, models), [unit, models]);
  const form = useForm<ScheduleFormText, unknown, ScheduleFormValues>({
    resolver: zodResolver(schema),
    defaultValues: editing ? fromSchedule(editing.input, units) : { ...emptySchedule(units, offers) },
    mode: 'onBlur',
  });
  const { register, handleSubmit, formState, setError, control, setValue } = form;
  const values = useWatch({ control });
  const qc = useQueryClient();

  // Live sizing on whatever parses so far.
  const parsed = useMemo(() => schema.safeParse(values), [schema, values]);
  const liveModelError = parsed.success ? undefined : parsed.error.issues.find((i) => i.path[0] === 'slideModel')?.message;
  const live = useMemo(() => {
    if (!parsed.success) return null;
    const schedule = drawerScheduleSchema.safeParse(toScheduleInput(parsed.data, models, unit));
    // A schedule the schema refuses (a front too thin for the lock rabbet's rule) shows why, on its field.
    if (!schedule.success)
      return {
        schedule: null,
        sized: { ok: false as const, errors: schedule.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })) },
      };
    return {
      schedule: schedule.data,
      sized: sizeDrawerSchedule(schedule.data, { lengthText: (mm) => formatLength(mm, units), exactText: (mm) => exactLengthText(mm, units) }),
    };
  }, [parsed, models, unit, units]);

  // Undermount slides are sized by a model: switching to them picks the shop's first one, so the box shows at once.
  useEffect(() => {
    const ofKind = models.filter((m) => m.kind === values.slideType);
    if (values.slideModel && !ofKind.some((m) => m.id === values.slideModel)) setValue('slideModel', '');
    if (values.slideType === 'undermount' && !ofKind.some((m) => m.id === values.slideModel) && ofKind[0]) setValue('slideModel', ofKind[0].id);
  }, [values.slideType, values.slideModel, models, setValue]);
  const liveErrors = new Map<string, string>();
  if (live && !live.sized.ok)
    for (const e of live.sized.errors) if (!liveErrors.has(fieldOfPath(e.path))) liveErrors.set(fieldOfPath(e.path), e.message);

  const save = useMutation({
    mutationFn: (v: ScheduleFormValues) => {
      const body = toScheduleInput(v, models, unit);
      return editing
        ? call('PUT /api/jobs/:id/drawer-schedules/:scheduleId', { params: { id: jobId, scheduleId: editing.id }, body })
        : call('POST /api/jobs/:id/drawer-schedules', { params: { id: jobId }, body });
    },
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['drawer-schedules', jobId] });
      qc.invalidateQueries({ queryKey: partsKey(jobId) });
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError)
        for (const [path, messages] of Object.entries(e.fields)) setError(fieldOfPath(path) as Path<ScheduleFormText>, { message: messages[0] });
    },
  });

  const field = (name: keyof ScheduleFormText, label: string, opts: { placeholder?: string; hint?: string; list?: string } = {}) => {
    const message = formState.errors[name]?.message ?? liveErrors.get(name);
    return (
      <div>
        <label htmlFor={`ds-${name}`} className="field-label">
          {label}
        </label>
        <input
          id={`ds-${name}`}
          className="field-input"
          placeholder={opts.placeholder}
          list={opts.list}
          aria-invalid={message ? true : undefined}
          {...register(name)}
        />
        {message ? <p className="field-error">{message}</p> : opts.hint ? <p className="mt-1 text-xs text-graphite-mute">{opts.hint}</p> : null}
      </div>
    );
  };
  const select = (name: keyof ScheduleFormText, label: string, options: Record<string, string>, hint?: string) => {
    const message = formState.errors[name]?.message ?? liveErrors.get(name);
    return (
      <div>
        <label htmlFor={`ds-${name}`} className="field-label">
          {label}
        </label>
        <select id={`ds-${name}`} className="field-input" {...register(name)}>
          {Object.entries(options).map(([v, l]) => (
            <option key={v} value={v}>
              {l}
            </option>
          ))}
        </select>
        {message ? <p className="field-error">{message}</p> : hint ? <p className="mt-1 text-xs text-graphite-mute">{hint}</p> : null}
      </div>
    );
  };
  // Each thickness is picked from the stock room's sheets and boards of its part's material, so the joints are sized
  // on the stock that will be cut (12 mm Baltic birch, not ½″).
  const materialOf = (name: ThicknessField, v: Partial<ScheduleFormText> = values) => thicknessMaterial(name, v);
  const setText = (name: keyof ScheduleFormText, text: string) => setValue(name, text, { shouldValidate: true, shouldDirty: true });
  const snapTyped = (name: ThicknessField, text: string) => {
    const parsed = parseLength(text, { unit });
    if (!parsed.ok) return;
    const snapped = snapThickness(materialOf(name), parsed.mm, offers);
    if (snapped !== parsed.mm) setText(name, exactLengthText(snapped, units));
  };
  const thickness = (name: ThicknessField, label: string, sameAs?: string) => (
    <ThicknessPicker
      id={`ds-${name}`}
      label={label}
      value={String(values[name] ?? '')}
      onChange={(text) => setText(name, text)}
      onTyped={(text) => snapTyped(name, text)}
      choices={thicknessChoices(materialOf(name), offers, units)}
      unit={unit}
      sameAs={sameAs}
      error={formState.errors[name]?.message ?? liveErrors.get(name)}
    />
  );
  // A material changed: each thickness moves to that material's stock of the nearest size, when it has one.
  const lastMaterials = useRef(THICKNESS_FIELDS.map((f) => materialOf(f)));
  useEffect(() => {
    const now = THICKNESS_FIELDS.map((f) => materialOf(f, values));
    THICKNESS_FIELDS.forEach((f, i) => {
      if (now[i].trim().toLowerCase() !== lastMaterials.current[i].trim().toLowerCase() && values[f]) snapTyped(f, String(values[f]));
    });
    lastMaterials.current = now;
    // eslint-disable-next-line react-hooks/exhaustive-deps -- runs when a material changes, not on every keystroke
  }, [values.sidesMaterial, values.frontMaterial, values.bottomMaterial]);

  const len = (mm: number) => formatLength(mm, units);
  const kindModels = models.filter((m) => m.kind === values.slideType);
  const sideMountModels = models.filter((m) => m.kind === 'side-mount');
  const chosenModel = kindModels.find((m) => m.id === values.slideModel);
  const modelMessage = formState.errors.slideModel?.message ?? liveErrors.get('slideModel') ?? liveModelError;
  const param = JOINT_PARAM[values.jointMethod ?? 'lock-rabbet'];
  const front = parseLength(String(values.frontThickness ?? ''), { unit });
  // The rule refuses fronts it cannot figure (¼″ and thinner); the sizing then says so on the field.
  const byFront =
    param?.byFront && front.ok
      ? (() => {
          try {
            return param.byFront!.mm(front.mm);
          } catch {
            return undefined;
          }
        })()
      : undefined;
  const paramDefault = byFront ?? param?.defaultValue;
  const paramHint =
    param && paramDefault !== undefined
      ? `Blank: ${len(paramDefault)}${byFront !== undefined && front.ok ? ` for a ${exactLengthText(front.mm, units)} front (${param.byFront!.rule})` : ''}.`
      : undefined;
  const depthHint = chosenModel
    ? `Box depth: the longest ${chosenModel.name} that fits ${exactLengthText(chosenModel.rearClearance, units)} from the back; the box is as long as its slide.`
    : values.slideType === 'side-mount'
      ? `Box depth: the longest ${values.slideSeries ?? 'imperial'} slide that fits.`
      : values.slideType === 'undermount'
        ? 'Box depth: the longest slide of the model that fits.'
        : `Box depth: the opening less ${len(DRAWER_DEFAULTS.backClearance)} behind.`;
  const fit = values.frontFit ?? 'overlay';
  const exact = (mm: number) => exactLengthText(mm, units);
  const lipPlaceholder = fit === 'lip' ? undefined : exact(lipDefaultMm(fit, unit));
  const lipHint =
    fit === 'overlay'
      ? `Blank: ${exact(lipDefaultMm('overlay', unit))} past the opening each side, as a classic lipped drawer laps its face frame.`
      : fit === 'reveal'
        ? `Blank: ${exact(lipDefaultMm('reveal', unit))} inside the opening each side, so the front clears it.`
        : 'For a box given by its size: how far the front runs past each side.';
  const sized = live?.sized.ok ? live.sized : null;
  const bottom = sized?.parts.find((p) => p.role === 'bottom');
  const movement = live?.schedule && bottom ? bottomMovementWarning(live.schedule, bottom.width, units) : null;
  const cardKeys = sized?.setupCardKeys ?? [];
  // Joints are sized on the thickness given: stock of another actual thickness would not fit them.
  const stockWarnings = sized && offers.length ? [...new Set(sized.parts.flatMap((p) => stockMatchWarning(p, offers, units) ?? []))] : [];

  return (
    <form
      onSubmit={handleSubmit((v) => save.mutate(v))}
      aria-label={editing ? 'Edit drawer schedule' : 'New drawer schedule'}
      className="card mb-6 p-5"
    >
      <h3 className="mb-4 font-semibold">{editing ? `Edit “${editing.input.label}”` : 'New drawer schedule'}</h3>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <div className="grid content-start gap-4 sm:grid-cols-2">
          {field('label', 'Label', { placeholder: 'Kitchen base drawers' })}
          {field('quantity', 'Boxes')}
          {select('sizeFrom', 'Size given is', { opening: 'the opening in the carcass', box: 'the box itself' })}
          {select('slideType', 'Slides', SLIDE_LABELS)}
          {(values.slideType === 'undermount' || (values.slideType === 'side-mount' && sideMountModels.length > 0)) && (
            <div>
              <label htmlFor="ds-slideModel" className="field-label">
                Slide model
              </label>
              <select id="ds-slideModel" className="field-input" aria-invalid={modelMessage ? true : undefined} {...register('slideModel')}>
                {values.slideType === 'side-mount' && <option value="">Standard slides of a series</option>}
                {values.slideType === 'undermount' && kindModels.length === 0 && <option value="">No slide models yet</option>}
                {kindModels.map((m) => (
                  <option key={m.id} value={m.id}>
                    {m.retired ? `${m.name} (as saved; deleted from Shop settings)` : m.name}
                  </option>
                ))}
              </select>
              {modelMessage ? (
                <p className="field-error">{modelMessage}</p>
              ) : chosenModel ? (
                <p className="mt-1 text-xs text-graphite-mute">
                  {widthRuleText(chosenModel, units, exact)}; height − {exact(chosenModel.heightClearance)};{' '}
                  {chosenModel.maxSideThickness === null ? 'any sides' : `sides up to ${exact(chosenModel.maxSideThickness)}`}.
                </p>
              ) : null}
              {values.slideType === 'undermount' && kindModels.length === 0 && (
                <p className="mt-1 text-xs">
                  <Link href="/settings#slide-models">Shop settings → Drawer slides</Link>
                </p>
              )}
            </div>
          )}
          {values.slideType === 'side-mount' &&
            !chosenModel &&
            select('slideSeries', 'Slide series', SERIES_LABELS, SERIES_HINTS[values.slideSeries ?? 'imperial'])}
          {field('width', values.sizeFrom === 'box' ? 'Box width' : 'Opening width')}
          {field('height', values.sizeFrom === 'box' ? 'Box height' : 'Opening height')}
          {field('depth', values.sizeFrom === 'box' ? 'Box depth' : 'Opening depth', { hint: values.sizeFrom === 'opening' ? depthHint : undefined })}
          {select('jointMethod', 'Joint', Object.fromEntries(JOINT_METHODS.map((m) => [m, JOINT_NAMES[m]])))}
          {param ? field('jointParam', param.label, { placeholder: len(paramDefault ?? param.defaultValue), hint: paramHint }) : <div />}
          {select('frontStyle', 'Box front', {
            flush: 'Flush (the box front is the face)',
            lipped: 'Lipped (hides the slides)',
            applied: 'Applied front (overlay)',
          })}
          {values.frontStyle === 'lipped' && (
            <>
              {select('frontFit', 'Lipped front meets the opening', LIP_FIT_LABELS)}
              {field('frontLipAmount', LIP_AMOUNT_LABELS[values.frontFit ?? 'overlay'], { placeholder: lipPlaceholder, hint: lipHint })}
            </>
          )}
          {field('sidesMaterial', 'Box material', { list: 'ds-materials' })}
          {field('frontMaterial', 'Front and back material', { placeholder: 'same as box', list: 'ds-materials' })}
          {thickness('frontThickness', 'Front and back thickness')}
          {thickness('sideThickness', 'Side thickness')}
          {thickness('backThickness', 'Back thickness', 'Same as the front')}
          {select('bottomMount', 'Bottom', { groove: 'In a groove', applied: 'Applied under the box' })}
          {field('bottomMaterial', 'Bottom material', {
            list: 'ds-materials',
            hint: 'A species name (white oak, cherry…) means a solid bottom: its movement is checked.',
          })}
          {thickness('bottomThickness', 'Bottom thickness')}
          <datalist id="ds-materials">
            {[...new Set(offers.map((o) => o.material))].sort().map((m) => (
              <option key={m} value={m} />
            ))}
          </datalist>
        </div>

        <div className="space-y-4" aria-live="polite">
          {!live && (
            <p className="text-sm text-graphite-mute">
              {liveModelError && values.width && values.height && values.depth
                ? 'Choose the slide model to see the box and its parts.'
                : 'Fill in the size to see the box and its parts.'}
            </p>
          )}
          {live && !live.sized.ok && (
            <div role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
              <p className="font-medium">This box cannot be built as set:</p>
              <ul className="list-disc pl-5">
                {live.sized.errors.map((e) => (
                  <li key={e.path + e.message}>{e.message}</li>
                ))}
              </ul>
            </div>
          )}
          {sized && live?.schedule && (
            <>
              <BoxPreview
                box={sized.box}
                t={{
                  front: live.schedule.thickness.front,
                  back: live.schedule.thickness.back ?? live.schedule.thickness.front,
                  side: live.schedule.thickness.side,
                }}
                units={units}
              />
              {(sized.face.lipped || sized.face.role === 'applied-front') && <FacePreview face={sized.face} box={sized.box} units={units} />}
              <div className="relative overflow-x-auto">
                <table className="data-table" aria-label="Parts of this schedule">
                  <thead>
                    <tr>
                      <th>Part</th>
                      <th className="num">Qty</th>
                      <th className="num">Length</th>
                      <th className="num">Width</th>
                      <th className="num">Thick</th>
                      <th>Material</th>
                      <th className="num">Joint allow.</th>
                    </tr>
                  </thead>
                  <tbody>
                    {sized.parts.map((p) => (
                      <tr key={p.role}>
                        <td>{ROLE_NAMES[p.role]}</td>
                        <td className="num">{p.quantity}</td>
                        <td className="num whitespace-nowrap">{len(p.length)}</td>
                        <td className="num whitespace-nowrap">{len(p.width)}</td>
                        <td className="num whitespace-nowrap">{exactLengthText(p.thickness, units)}</td>
                        <td>{p.material}</td>
                        <td className="num">{p.jointAllowance > 0 ? len(p.jointAllowance) : '—'}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
              {sized.parts.some((p) => p.machining.length > 0) && (
                <dl className="space-y-1 text-xs text-graphite-soft" aria-label="Machining">
                  {sized.parts
                    .filter((p) => p.machining.length > 0)
                    .map((p) => (
                      <div key={p.role}>
                        <dt className="inline font-medium text-graphite">{ROLE_NAMES[p.role]}: </dt>
                        <dd className="inline">{p.machining.join(' ')}</dd>
                      </div>
                    ))}
                </dl>
              )}
              {sized.warnings.length > 0 && (
                <div role="note" className="rounded-md border border-amber/40 bg-amber-wash px-3 py-2 text-sm text-amber">
                  <p className="font-medium">Check the front’s fit:</p>
                  <ul className="list-disc pl-5">
                    {sized.warnings.map((w) => (
                      <li key={w}>{w}</li>
                    ))}
                  </ul>
                </div>
              )}
              {sized.notes.length > 0 && (
                <ul className="list-disc pl-5 text-sm text-graphite-soft">
                  {sized.notes.map((n) => (
                    <li key={n}>{n}</li>
                  ))}
                </ul>
              )}
              {stockWarnings.length > 0 && (
                <div role="note" className="rounded-md border border-amber/40 bg-amber-wash px-3 py-2 text-sm text-amber">
                  <p className="font-medium">Check the stock: the joints are sized on the thicknesses above.</p>
                  <ul className="list-disc pl-5">
                    {stockWarnings.map((w) => (
                      <li key={w}>{w}</li>
                    ))}
                  </ul>
                  <p className="mt-1">
                    <Link href="/stock">Open the stock room</Link>
                  </p>
                </div>
              )}
              {movement && (
                <p role="note" className="rounded-md border border-amber/40 bg-amber-wash px-3 py-2 text-sm text-amber">
                  Wood movement: {movement}
                </p>
              )}
              <div className="space-y-2">
                <h4 className="text-sm font-semibold">Setup cards this schedule needs</h4>
                {cardKeys.map((key) => {
                  const saved = findSetupCard(cards, key);
                  const fallback = defaultSetupCard(key);
                  const card = saved ?? fallback ?? { ...key, fields: [], note: 'Save the settings for this joint on the Setup cards page.' };
                  return (
                    <SetupCardView
                      key={`${key.joint}-${key.stockThickness}`}
                      card={card}
                      units={units}
                      source={saved ? 'saved' : fallback ? 'default' : 'missing'}
                    />
                  );
                })}
                <RouterCautions />
              </div>
            </>
          )}
        </div>
      </div>
      {save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) && (
        <p role="alert" className="field-error">
          {save.error.message}
        </p>
      )}
      <div className="mt-5 flex gap-2">
        <button type="submit" className="btn-accent" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : editing ? 'Save changes' : 'Add to the cut list'}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
