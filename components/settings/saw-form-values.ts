import { exactLengthText } from '@/lib/cut-list/exact-length';
import { parseLength } from '@/lib/units/parse-length';
import { sawKindText, sawSchema, SAW_KINDS, SAW_KIND_LABELS, type Saw } from '@/shared/schemas/saw';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';

/** A saw as the Shop settings form shows it: every length as text in the shop's unit, blank where there is no limit. */
export interface SawFormText {
  kind: string;
  kindName: string;
  name: string;
  kerf: string;
  ripCapacity: string;
  crosscutCapacity: string;
  maxPieceLength: string;
  maxPieceWidth: string;
  maxStages: string;
  firstStage: string;
  minFenceWidth: string;
}

const ZERO = /^\s*0+(\.0*)?\s*(mm|in|″|")?\s*$/i;

export const blankSawText = (): SawFormText => ({
  kind: 'table-saw',
  kindName: '',
  name: '',
  kerf: '',
  ripCapacity: '',
  crosscutCapacity: '',
  maxPieceLength: '',
  maxPieceWidth: '',
  maxStages: '3',
  firstStage: 'rip',
  minFenceWidth: '',
});

export function sawText(s: Saw, units: ShopUnits): SawFormText {
  const len = (mm: number | null) => (mm === null ? '' : mm === 0 ? '0' : exactLengthText(mm, units));
  return {
    kind: s.kind,
    kindName: s.kindName ?? '',
    name: s.name,
    kerf: len(s.kerf),
    ripCapacity: len(s.ripCapacity),
    crosscutCapacity: len(s.crosscutCapacity),
    maxPieceLength: len(s.maxPieceLength),
    maxPieceWidth: len(s.maxPieceWidth),
    maxStages: s.maxStages === null ? 'any' : String(s.maxStages),
    firstStage: s.firstStage,
    minFenceWidth: len(s.minFenceWidth),
  };
}

const FIELD: Record<string, keyof SawFormText> = {
  kind: 'kind',
  kindName: 'kindName',
  name: 'name',
  kerf: 'kerf',
  ripCapacity: 'ripCapacity',
  crosscutCapacity: 'crosscutCapacity',
  maxPieceLength: 'maxPieceLength',
  maxPieceWidth: 'maxPieceWidth',
  maxStages: 'maxStages',
  firstStage: 'firstStage',
  minFenceWidth: 'minFenceWidth',
};
/** The form field an API field message belongs to. */
export const sawFormField = (apiField: string): keyof SawFormText => FIELD[apiField] ?? 'name';

/** The form's text as a saw, or one message per field (keys are the form's field names). */
export function readSawForm(text: SawFormText, units: ShopUnits): { ok: true; saw: Saw } | { ok: false; errors: Record<string, string> } {
  const unit = shopLengthUnit(units);
  const errors: Record<string, string> = {};
  const length = (field: keyof SawFormText, opts: { zero?: boolean; blank?: 'null' } = {}): number | null | undefined => {
    const value = text[field];
    if (value.trim() === '') {
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
  const candidate = {
    kind: text.kind,
    kindName: text.kind === 'other' ? text.kindName.trim() || null : null,
    name: text.name,
    kerf: length('kerf', { zero: true }),
    ripCapacity: length('ripCapacity', { blank: 'null' }),
    crosscutCapacity: length('crosscutCapacity', { blank: 'null' }),
    maxPieceLength: length('maxPieceLength', { blank: 'null' }),
    maxPieceWidth: length('maxPieceWidth', { blank: 'null' }),
    maxStages: text.maxStages === 'any' ? null : Number(text.maxStages),
    firstStage: text.firstStage,
    minFenceWidth: length('minFenceWidth', { zero: true }),
  };
  if (text.kind === 'other' && !text.kindName.trim()) errors.kindName = 'Say what kind of saw it is.';
  const parsed = sawSchema.safeParse(candidate);
  if (!parsed.success) for (const issue of parsed.error.issues) errors[sawFormField(String(issue.path[0]))] ??= issue.message;
  return Object.keys(errors).length || !parsed.success ? { ok: false, errors } : { ok: true, saw: parsed.data };
}

/** What the saw takes, in the shop's units, one fact a line. */
export function sawFacts(s: Saw, units: ShopUnits): { label: string; value: string }[] {
  // Exact where the shop's precision would round (a 3/32″ kerf in sixteenths), as the maker gives it.
  const len = (mm: number) => exactLengthText(mm, units);
  const limit = (mm: number | null, none: string) => (mm === null ? none : len(mm));
  return [
    { label: 'Kerf', value: len(s.kerf) },
    { label: 'Rip capacity', value: limit(s.ripCapacity, s.kind === 'track-saw' ? 'no fence' : 'no limit') },
    { label: s.kind === 'track-saw' ? 'Track length' : 'Crosscut capacity', value: limit(s.crosscutCapacity, 'no limit') },
    {
      label: 'Largest piece',
      value:
        s.maxPieceLength === null && s.maxPieceWidth === null
          ? 'any'
          : `${limit(s.maxPieceLength, 'any length')} × ${limit(s.maxPieceWidth, 'any width')}`,
    },
    {
      label: 'Stages',
      value: `${s.maxStages === null ? 'any number' : `at most ${s.maxStages}`}, ${s.firstStage === 'rip' ? 'rips' : 'crosscuts'} first`,
    },
    { label: 'Narrowest rip at the fence', value: s.minFenceWidth === 0 ? 'no minimum set' : len(s.minFenceWidth) },
  ];
}

export { SAW_KINDS, SAW_KIND_LABELS, sawKindText };
