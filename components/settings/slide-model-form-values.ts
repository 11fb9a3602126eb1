import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatLength } from '@/lib/units/format-length';
import { parseLength, type LengthUnit } from '@/lib/units/parse-length';
import { slideModelSchema, SLIDE_MODEL_KINDS, SLIDE_WIDTH_RULES, type SlideModel } from '@/shared/schemas/slide-model';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';

/** A slide model as the Shop settings form shows it: every length as text in the shop's unit. */
export interface SlideModelFormText {
  kind: string;
  name: string;
  lengths: string;
  widthRule: string;
  widthDeduction: string;
  maxSideThickness: string;
  bottomRecess: string;
  heightClearance: string;
  rearClearance: string;
}

export const KIND_LABELS: Record<SlideModel['kind'], string> = { undermount: 'Undermount', 'side-mount': 'Side-mount' };
export const WIDTH_RULE_LABELS: Record<SlideModel['widthRule'], string> = {
  inside: 'Inside width = opening − the deduction',
  outside: 'Box width (outside) = opening − the deduction',
};

/** Lengths are listed with a comma and a space, or semicolons, so "502,5" stays a decimal and "1,200" stays refused. */
const LIST_SEPARATOR = /\s*;\s*|\s*\n\s*|,\s+/;
/** Clearances may be none at all: "0" in any unit. */
const ZERO = /^\s*0+(\.0*)?\s*(mm|in|″|")?\s*$/i;

export const blankSlideModelText = (): SlideModelFormText => ({
  kind: 'undermount',
  name: '',
  lengths: '',
  widthRule: 'inside',
  widthDeduction: '',
  maxSideThickness: '',
  bottomRecess: '',
  heightClearance: '',
  rearClearance: '',
});

export function slideModelText(m: SlideModel, units: ShopUnits): SlideModelFormText {
  const len = (mm: number) => (mm === 0 ? '0' : exactLengthText(mm, units));
  return {
    kind: m.kind,
    name: m.name,
    lengths: m.lengths.map(len).join(', '),
    widthRule: m.widthRule,
    widthDeduction: len(m.widthDeduction),
    maxSideThickness: m.maxSideThickness === null ? '' : len(m.maxSideThickness),
    bottomRecess: len(m.bottomRecess),
    heightClearance: len(m.heightClearance),
    rearClearance: len(m.rearClearance),
  };
}

/** The form's text as a slide model, or one message per field (keys are the form's field names). */
export function readSlideModelForm(
  text: SlideModelFormText,
  units: ShopUnits,
): { ok: true; model: SlideModel } | { ok: false; errors: Record<string, string> } {
  const unit = shopLengthUnit(units);
  const errors: Record<string, string> = {};
  const length = lengthReader(unit, errors);
  const candidate = {
    kind: text.kind,
    name: text.name,
    lengths: readLengths(text.lengths, unit, errors),
    widthRule: text.widthRule,
    widthDeduction: length('widthDeduction', text.widthDeduction, { zero: true }),
    maxSideThickness: length('maxSideThickness', text.maxSideThickness, { blank: 'null' }),
    bottomRecess: length('bottomRecess', text.bottomRecess, { zero: true, blank: 'zero' }),
    heightClearance: length('heightClearance', text.heightClearance, { zero: true }),
    rearClearance: length('rearClearance', text.rearClearance, { zero: true, blank: 'zero' }),
  };
  const parsed = slideModelSchema.safeParse(candidate);
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      const key = FORM_FIELD_OF[String(issue.path[0])] ?? 'name';
      errors[key] ??= issue.message;
    }
  return Object.keys(errors).length || !parsed.success ? { ok: false, errors } : { ok: true, model: parsed.data };
}

/** The form's field for each of the model's (where the schema's message goes). */
const FORM_FIELD_OF: Record<string, keyof SlideModelFormText> = {
  kind: 'kind',
  name: 'name',
  lengths: 'lengths',
  widthRule: 'widthRule',
  widthDeduction: 'widthDeduction',
  maxSideThickness: 'maxSideThickness',
  bottomRecess: 'bottomRecess',
  heightClearance: 'heightClearance',
  rearClearance: 'rearClearance',
};

/** A length field read in the shop's unit: a blank is an error, 0 or null as `blank` says; `zero` accepts 0 written out. */
function lengthReader(unit: LengthUnit, errors: Record<string, string>) {
  return (field: keyof SlideModelFormText, value: string, opts: { zero?: boolean; blank?: 'zero' | 'null' } = {}): number | null | undefined => {
    if (value.trim() === '') {
      if (opts.blank === 'zero') return 0;
      if (opts.blank === 'null') return null;
      errors[field] = 'Enter a length.';
      return undefined;
    }
    if (opts.zero && ZERO.test(value)) return 0;
    const parsed = parseLength(value, { unit });
    if (parsed.ok) return parsed.mm;
    errors[field] = parsed.error;
    return undefined;
  };
}

/** The lengths the slide is made in, as a list ("12, 15, 18"); the first that does not read is the message. */
function readLengths(text: string, unit: LengthUnit, errors: Record<string, string>): number[] {
  const pieces = text
    .split(LIST_SEPARATOR)
    .map((p) => p.trim())
    .filter(Boolean);
  const lengths: number[] = [];
  for (const piece of pieces) {
    const parsed = parseLength(piece, { unit });
    if (parsed.ok) lengths.push(parsed.mm);
    else errors.lengths ??= `“${piece}”: ${parsed.error} Separate lengths with a comma and a space, or a semicolon.`;
  }
  if (pieces.length === 0) errors.lengths = 'Give the lengths the slide is made in, such as 12, 15, 18, 21.';
  return lengths;
}

/** The model's rule in one line, in the shop's unit: "Inside width = opening − 1-5/8″". */
export function widthRuleText(
  m: Pick<SlideModel, 'widthRule' | 'widthDeduction'>,
  units: ShopUnits,
  len: (mm: number) => string = (mm) => formatLength(mm, units),
): string {
  return `${m.widthRule === 'inside' ? 'Inside width' : 'Box width'} = opening − ${len(m.widthDeduction)}`;
}

export { SLIDE_MODEL_KINDS, SLIDE_WIDTH_RULES };
