import { z } from 'zod';
import { DRAWER_DEFAULTS as D, LIPPED_FRONT_DEFAULTS, lockRabbetFaceLeft } from '@/lib/joinery/defaults';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { snapThickness, type StockOffer } from '@/lib/cut-list/stock-match';
import { formatLength } from '@/lib/units/format-length';
import type { LengthUnit } from '@/lib/units/parse-length';
import {
  JOINT_METHODS,
  LIP_FITS,
  SLIDE_SERIES_IDS,
  SLIDE_TYPES,
  type DrawerSchedule,
  type DrawerScheduleInput,
  type JointMethod,
  type SlideSeries,
} from '@/shared/schemas/drawer-schedule';
import type { SlideModelRule } from '@/shared/schemas/slide-model';
import { lengthInput, type ShopUnits } from '@/shared/schemas/units';

/**
 * The drawer schedule form is flat, with lengths as typed text in the shop's unit; `toScheduleInput` builds the
 * nested schedule `lib/joinery` sizes, and `FIELD_OF_PATH` puts the sizing errors back on the field that caused them.
 */
export const JOINT_PARAM: Partial<
  Record<JointMethod, { key: string; label: string; defaultValue: number; byFront?: { mm: (front: number) => number; rule: string } }>
> = {
  'lock-rabbet': {
    key: 'faceLeft',
    label: 'Face left outside the tongue',
    defaultValue: D.lockRabbetFaceLeft,
    byFront: { mm: lockRabbetFaceLeft, rule: 'half the front’s thickness less ⅛″' },
  },
  'rabbet-and-dado': { key: 'dadoDepth', label: 'Dado depth', defaultValue: D.dadoDepth },
  'half-blind-dovetail': { key: 'lap', label: 'Lap', defaultValue: D.dovetailLap },
  'box-joint': { key: 'fingerWidth', label: 'Finger width', defaultValue: D.boxJointFinger },
};

const optionalLength = (unit: LengthUnit) => z.union([z.literal(''), lengthInput(unit)]).transform((v) => (v === '' ? undefined : v));
const text = (max: number) => z.string().trim().max(max, `At most ${max} characters.`);

/** A slide model the form can offer: one of the shop's, or the rule a schedule being edited was saved with. */
export type SlideModelChoice = SlideModelRule & { id: string; /** Deleted from Shop settings since the schedule was saved. */ retired?: boolean };

/**
 * The form's text schema. Undermount slides need a model from `models` (their maker's rule sizes the box); side-mount
 * slides take a model or the standard series.
 */
export const scheduleFormSchema = (unit: LengthUnit, models: readonly SlideModelChoice[] = []) =>
  z
    .object({
      label: text(80).min(1, 'Give the schedule a label.'),
      quantity: z.coerce
        .number({ error: 'Quantity must be a whole number.' })
        .int('Quantity must be a whole number.')
        .min(1, 'Quantity must be at least 1.')
        .max(10_000),
      sizeFrom: z.enum(['opening', 'box']),
      width: lengthInput(unit),
      height: lengthInput(unit),
      depth: lengthInput(unit),
      slideType: z.enum(SLIDE_TYPES),
      slideSeries: z.enum(SLIDE_SERIES_IDS),
      /** A slide model's id, or '' for none (side-mount: the standard series). */
      slideModel: z.string(),
      jointMethod: z.enum(JOINT_METHODS),
      jointParam: optionalLength(unit),
      frontThickness: lengthInput(unit),
      sideThickness: lengthInput(unit),
      backThickness: optionalLength(unit),
      frontStyle: z.enum(['flush', 'lipped', 'applied']),
      /** Lipped fronts: overlay past the opening, reveal inside it, or a lip past the box given outright. */
      frontFit: z.enum(LIP_FITS),
      /** The overlay, reveal or lip; blank takes the default for the fit in the shop's unit. */
      frontLipAmount: optionalLength(unit),
      bottomMount: z.enum(['groove', 'applied']),
      bottomThickness: lengthInput(unit),
      bottomMaterial: text(120).min(1, 'Name the bottom’s material.'),
      sidesMaterial: text(120).min(1, 'Name the box material.'),
      frontMaterial: text(120),
    })
    .superRefine((v, ctx) => {
      const model = models.find((m) => m.id === v.slideModel);
      if (v.slideType === 'undermount' && !model)
        ctx.addIssue({
          code: 'custom',
          path: ['slideModel'],
          message: models.some((m) => m.kind === 'undermount')
            ? 'Choose the slide model: its maker’s rule sizes the box.'
            : 'The shop has no undermount slide models yet: the owner adds them in Shop settings, from the maker’s sheet.',
        });
      else if (model && model.kind !== v.slideType)
        ctx.addIssue({ code: 'custom', path: ['slideModel'], message: `${model.name} is a ${model.kind} slide.` });
    });

export type ScheduleFormText = z.input<ReturnType<typeof scheduleFormSchema>>;
export type ScheduleFormValues = z.output<ReturnType<typeof scheduleFormSchema>>;

/** The rule the schedule keeps: the model's fields as Shop settings holds them, nothing of the form's. */
function ruleOf(choice: SlideModelChoice): SlideModelRule {
  const { id, kind, name, lengths, widthRule, widthDeduction, maxSideThickness, bottomRecess, heightClearance, rearClearance } = choice;
  return { id, kind, name, lengths, widthRule, widthDeduction, maxSideThickness, bottomRecess, heightClearance, rearClearance };
}

/** The slide the schedule is sized on: a model carries its whole rule into the schedule. */
function slideInput(v: ScheduleFormValues, models: readonly SlideModelChoice[]): DrawerScheduleInput['slide'] {
  const model = models.find((m) => m.id === v.slideModel && m.kind === v.slideType);
  if (v.slideType === 'side-mount') return { type: 'side-mount', series: v.slideSeries, ...(model ? { model: ruleOf(model) } : {}) };
  if (v.slideType === 'undermount') return { type: 'undermount', ...(model ? { model: ruleOf(model) } : {}) };
  return { type: v.slideType };
}

/** A lipped front's default overlay or reveal, in the shop's own system (⅜″ / 10 mm overlay, 1/16″ / 1.5 mm reveal). */
export const lipDefaultMm = (fit: 'overlay' | 'reveal', unit: LengthUnit) =>
  LIPPED_FRONT_DEFAULTS[unit === 'mm' ? 'metric' : 'imperial'][fit === 'overlay' ? 'overlay' : 'reveal'];

function lippedInput(v: ScheduleFormValues, unit: LengthUnit): DrawerScheduleInput['front'] {
  if (v.frontFit === 'lip') return { style: 'lipped', fit: 'lip', ...(v.frontLipAmount !== undefined ? { lip: v.frontLipAmount } : {}) };
  const amount = v.frontLipAmount ?? lipDefaultMm(v.frontFit, unit);
  return v.frontFit === 'overlay' ? { style: 'lipped', fit: 'overlay', overlay: amount } : { style: 'lipped', fit: 'reveal', reveal: amount };
}

export function toScheduleInput(v: ScheduleFormValues, models: readonly SlideModelChoice[] = [], unit: LengthUnit = 'in'): DrawerScheduleInput {
  const param = JOINT_PARAM[v.jointMethod];
  return {
    label: v.label,
    quantity: v.quantity,
    size: { from: v.sizeFrom, width: v.width, height: v.height, depth: v.depth },
    slide: slideInput(v, models),
    joint: { method: v.jointMethod, ...(param && v.jointParam !== undefined ? { [param.key]: v.jointParam } : {}) } as DrawerScheduleInput['joint'],
    thickness: { front: v.frontThickness, side: v.sideThickness, ...(v.backThickness !== undefined ? { back: v.backThickness } : {}) },
    front: v.frontStyle === 'lipped' ? lippedInput(v, unit) : { style: v.frontStyle },
    bottom: { mount: v.bottomMount, thickness: v.bottomThickness, material: v.bottomMaterial },
    materials: { sides: v.sidesMaterial, ...(v.frontMaterial ? { front: v.frontMaterial } : {}) },
  };
}

/** A saved schedule back into the form's text, in the shop's unit (exact: bare mm where the unit would round). */
export function fromSchedule(s: DrawerSchedule, units: ShopUnits): ScheduleFormText {
  const len = (mm: number | undefined) => (mm === undefined ? '' : exactLengthText(mm, units));
  const param = JOINT_PARAM[s.joint.method];
  return {
    label: s.label,
    quantity: String(s.quantity),
    sizeFrom: s.size.from,
    width: len(s.size.width),
    height: len(s.size.height),
    depth: len(s.size.depth),
    slideType: s.slide.type,
    slideSeries: s.slide.type === 'side-mount' ? s.slide.series : shopSlideSeries(units),
    slideModel: (s.slide.type === 'side-mount' || s.slide.type === 'undermount' ? s.slide.model?.id : undefined) ?? '',
    jointMethod: s.joint.method,
    jointParam: param ? len((s.joint as Record<string, unknown>)[param.key] as number | undefined) : '',
    frontThickness: len(s.thickness.front),
    sideThickness: len(s.thickness.side),
    backThickness: len(s.thickness.back),
    frontStyle: s.front.style,
    frontFit: s.front.style === 'lipped' ? s.front.fit : 'overlay',
    frontLipAmount:
      s.front.style === 'lipped' ? len(s.front.fit === 'overlay' ? s.front.overlay : s.front.fit === 'reveal' ? s.front.reveal : s.front.lip) : '',
    bottomMount: s.bottom.mount,
    bottomThickness: len(s.bottom.thickness),
    bottomMaterial: s.bottom.material,
    sidesMaterial: s.materials.sides,
    frontMaterial: s.materials.front ?? '',
  };
}

/**
 * The models the form offers: the shop's, and the rule an edited schedule was saved with when its model has since been
 * deleted (so the schedule still reads as it was sized).
 */
export function slideModelChoices(models: readonly SlideModelChoice[], saved?: DrawerSchedule): SlideModelChoice[] {
  const kept = saved && (saved.slide.type === 'side-mount' || saved.slide.type === 'undermount') ? saved.slide.model : undefined;
  if (!kept?.id || models.some((m) => m.id === kept.id)) return [...models];
  return [...models, { ...kept, id: kept.id, retired: true }];
}

/** A shop's slides are of its own unit system unless the schedule says otherwise. */
export const shopSlideSeries = (units: ShopUnits): SlideSeries => (units.system === 'metric' ? 'metric' : 'imperial');

/** The form's thickness fields, each cut from one material's stock. */
export const THICKNESS_FIELDS = ['frontThickness', 'sideThickness', 'backThickness', 'bottomThickness'] as const;
export type ThicknessField = (typeof THICKNESS_FIELDS)[number];

/** The material a thickness field's part is cut from (the front and back from the front material, else the box's). */
export function thicknessMaterial(field: ThicknessField, v: Partial<ScheduleFormText>): string {
  const box = v.sidesMaterial ?? '';
  if (field === 'sideThickness') return box;
  if (field === 'bottomThickness') return v.bottomMaterial ?? '';
  return v.frontMaterial?.trim() ? v.frontMaterial : box;
}

/**
 * A new schedule: ¾″ front and back, ½″ sides and a ¼″ bottom in Baltic birch, each thickness moved to the stock
 * room's sheet of that nominal size (¾″ finds the 18 mm sheet), so the joints are sized on the stock that is cut.
 */
export function emptySchedule(units: ShopUnits, offers: readonly StockOffer[] = []): ScheduleFormText {
  const material = 'Baltic birch';
  const stock = (mm: number) => {
    const snapped = snapThickness(material, mm, offers);
    return snapped === mm ? formatLength(mm, units) : exactLengthText(snapped, units);
  };
  return {
    label: '',
    quantity: '1',
    sizeFrom: 'opening',
    width: '',
    height: '',
    depth: '',
    slideType: 'side-mount',
    slideSeries: shopSlideSeries(units),
    slideModel: '',
    jointMethod: 'lock-rabbet',
    jointParam: '',
    frontThickness: stock(D.frontThickness),
    sideThickness: stock(D.sideThickness),
    backThickness: '',
    frontStyle: 'flush',
    frontFit: 'overlay',
    frontLipAmount: '',
    bottomMount: 'groove',
    bottomThickness: stock(D.bottomThickness),
    bottomMaterial: material,
    sidesMaterial: material,
    frontMaterial: '',
  };
}

/** Where a sizing error's path (lib/joinery) shows in the flat form. */
export function fieldOfPath(path: string): keyof ScheduleFormText {
  const table: Record<string, keyof ScheduleFormText> = {
    label: 'label',
    quantity: 'quantity',
    'size.width': 'width',
    'size.height': 'height',
    'size.depth': 'depth',
    'size.depthRule': 'depth',
    'thickness.front': 'frontThickness',
    'thickness.side': 'sideThickness',
    'thickness.back': 'backThickness',
    'front.style': 'frontStyle',
    'front.fit': 'frontFit',
    'front.overlay': 'frontLipAmount',
    'front.reveal': 'frontLipAmount',
    'front.lip': 'frontLipAmount',
    'slide.series': 'slideSeries',
    'slide.model': 'slideModel',
    'bottom.mount': 'bottomMount',
    'bottom.thickness': 'bottomThickness',
    'bottom.material': 'bottomMaterial',
    'materials.sides': 'sidesMaterial',
    'materials.front': 'frontMaterial',
  };
  if (table[path]) return table[path];
  if (path.startsWith('joint.')) return 'jointParam';
  if (path.startsWith('slide.model')) return 'slideModel';
  if (path.startsWith('slide')) return 'slideType';
  if (path.startsWith('bottom.groove')) return 'bottomThickness';
  if (path.startsWith('size')) return 'width';
  return 'label';
}
