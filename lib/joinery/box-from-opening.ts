import type { Mm } from '@/lib/units/length';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import { DRAWER_DEFAULTS, MAX_SCHEDULE_LENGTH_MM, SLIDE_SERIES } from '@/lib/joinery/defaults';
import { mmText, specText } from '@/lib/joinery/format';
import type { BoxSize, FieldError, Result } from '@/lib/joinery/types';

type Opening = Extract<DrawerSchedule['size'], { from: 'opening' }>;
type DepthRule = NonNullable<Opening['depthRule']>;

/**
 * The outside box a schedule asks for: given directly, or derived from the opening by the slide (a slide model's own
 * rule, or the series' clearances) and a depth rule (the longest slide that fits, a chosen slide length, or the opening
 * less a back clearance). Refuses, field by field, any length that is not a finite number from 0 to 3 m.
 */
export function boxFromOpening(
  schedule: Pick<DrawerSchedule, 'size' | 'slide'> & { thickness?: Pick<DrawerSchedule['thickness'], 'sideMm'> },
): Result<{ box: BoxSize; slideLengthMm: Mm | null; notes: string[] }> {
  const { size, slide } = schedule;
  const unreadable = [...lengthErrors({ size, slide, thickness: schedule.thickness }), ...sizeErrors(size)];
  if (unreadable.length) return { ok: false, errors: unreadable };
  if (size.from === 'box') {
    return { ok: true, box: { widthMm: size.widthMm, heightMm: size.heightMm, depthMm: size.depthMm }, slideLengthMm: null, notes: [] };
  }

  const model = slide.type === 'side-mount' || slide.type === 'undermount' ? slide.model : undefined;
  const width = model ? modelWidth(model, size.widthMm, schedule.thickness?.sideMm) : clearanceWidth(slide, size.widthMm);
  const heightDeduction = model ? model.heightClearanceMm : slide.type === 'undermount' ? slide.heightDeductionMm : slide.heightClearanceMm;
  const heightMm = size.heightMm - heightDeduction;
  const errors: FieldError[] = [];
  if (width.widthMm <= 0) {
    errors.push({
      path: 'size.widthMm',
      message: `The opening (${mmText(size.widthMm)}) is narrower than the slides take (${mmText(size.widthMm - width.widthMm)})`,
    });
  }
  if (heightMm <= 0) {
    errors.push({
      path: 'size.heightMm',
      message: `The opening (${mmText(size.heightMm)}) is lower than the slides take (${mmText(heightDeduction)})`,
    });
  }

  const series = slide.type === 'side-mount' ? slide.series : 'imperial';
  const rule: DepthRule =
    size.depthRule ??
    (slide.type === 'side-mount' || slide.type === 'undermount'
      ? { rule: 'longest-standard-slide', series, backClearanceMm: DRAWER_DEFAULTS.backClearance }
      : { rule: 'opening-less-clearance', backClearanceMm: DRAWER_DEFAULTS.backClearance });
  const depth = model && rule.rule === 'longest-standard-slide' ? modelDepth(model, size.depthMm) : boxDepth(size.depthMm, rule);
  if (!depth.ok) errors.push(...depth.errors);
  if (errors.length > 0 || !depth.ok) return { ok: false, errors };

  const notes = [width.note(width.widthMm), ...depth.notes];
  if (model) notes.push(`Box ${mmText(heightMm)} high = opening ${mmText(size.heightMm)} − ${specText(heightDeduction)} for the ${model.name}.`);
  return { ok: true, box: { widthMm: width.widthMm, heightMm, depthMm: depth.depthMm }, slideLengthMm: depth.slideLengthMm, notes };
}

type Model = NonNullable<Extract<DrawerSchedule['slide'], { type: 'undermount' }>['model']>;

/** The box width by the series' or runners' clearance each side, or the generic undermount deduction. */
function clearanceWidth(slide: DrawerSchedule['slide'], openingWidth: Mm) {
  if (slide.type === 'undermount') {
    const widthMm = openingWidth - slide.widthDeductionMm;
    return {
      widthMm,
      note: (w: Mm) =>
        `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − ${specText(slide.widthDeductionMm)} undermount deduction; check the slide maker's spec.`,
    };
  }
  const each = slide.sideClearanceMm;
  const name = slide.type === 'side-mount' ? `${slide.series} side-mount slide` : slide.type;
  return {
    widthMm: openingWidth - 2 * each,
    note: (w: Mm) => `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − 2 × ${specText(each)} ${name} clearance.`,
  };
}

/**
 * The maker's width rule: the box's outside width is the opening less the deduction, or its inside width is, and the
 * sides stand outside that (so the box is 2 × the side thickness wider).
 */
function modelWidth(model: Model, openingWidth: Mm, sideMm: Mm | undefined) {
  if (model.widthRule === 'outside') {
    return {
      widthMm: openingWidth - model.widthDeductionMm,
      note: (w: Mm) =>
        `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − ${specText(model.widthDeductionMm)}, the ${model.name}'s outside-width rule.`,
    };
  }
  const side = sideMm ?? DRAWER_DEFAULTS.sideThickness;
  const inside = openingWidth - model.widthDeductionMm;
  return {
    widthMm: inside + 2 * side,
    note: (w: Mm) =>
      `Box ${mmText(w)} wide: inside ${mmText(inside)} = opening ${mmText(openingWidth)} − ${specText(model.widthDeductionMm)} (the ${model.name}'s inside-width rule), plus 2 × ${specText(side)} sides.`,
  };
}

/** The longest length the model is made in that fits the opening less its rear clearance; the box is that long. */
function modelDepth(model: Model, openingDepth: Mm): Result<{ depthMm: Mm; slideLengthMm: Mm; notes: string[] }> {
  const room = openingDepth - model.rearClearanceMm;
  const fitting = model.lengthsMm.filter((l) => l <= room + 1e-9);
  if (fitting.length === 0) {
    return {
      ok: false,
      errors: [
        {
          path: 'size.depthMm',
          message: `No ${model.name} fits: ${mmText(room)} of depth after its ${specText(model.rearClearanceMm)} rear clearance, and its shortest length is ${specText(model.lengthsMm[0])}`,
        },
      ],
    };
  }
  const slideLengthMm = Math.max(...fitting);
  return {
    ok: true,
    depthMm: slideLengthMm,
    slideLengthMm,
    notes: [
      `Box ${mmText(slideLengthMm)} long, as long as its slide: the longest ${model.name} that fits ${mmText(openingDepth)} less ${specText(model.rearClearanceMm)} rear clearance.`,
    ],
  };
}

/** An opening or a box has a size: under half a millimetre is a typing slip. */
function sizeErrors(size: DrawerSchedule['size']): FieldError[] {
  return (['widthMm', 'heightMm', 'depthMm'] as const)
    .filter((k) => Number.isFinite(size[k]) && size[k] < 0.5)
    .map((k) => ({
      path: `size.${k}`,
      message: `The ${size.from === 'box' ? 'box' : 'opening'} needs a size: ${size[k]} mm is under half a millimetre`,
    }));
}

/** One error per number in the sizes and slide that is not a length from 0 to 3 m (NaN, ±Infinity, negatives, absurd). */
function lengthErrors(value: unknown, path = ''): FieldError[] {
  if (typeof value === 'number') {
    if (Number.isFinite(value) && value >= 0 && value <= MAX_SCHEDULE_LENGTH_MM) return [];
    return [
      {
        path,
        message: `${Number.isFinite(value) ? `${value} mm is` : 'That is'} not a length Kerfwise can size a drawer from (a finite number from 0 to ${MAX_SCHEDULE_LENGTH_MM / 1000} m)`,
      },
    ];
  }
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => lengthErrors(v, path ? `${path}.${k}` : k));
  return [];
}

function boxDepth(openingDepth: Mm, rule: DepthRule): Result<{ depthMm: Mm; slideLengthMm: Mm | null; notes: string[] }> {
  switch (rule.rule) {
    case 'longest-standard-slide': {
      const room = openingDepth - rule.backClearanceMm;
      const lengths = SLIDE_SERIES[rule.series].lengthsMm;
      const fitting = lengths.filter((l) => l <= room + 1e-9);
      if (fitting.length === 0) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depthMm',
              message: `No standard ${rule.series} slide fits: ${mmText(room)} of depth after the back clearance, the shortest slide is ${specText(lengths[0])}`,
            },
          ],
        };
      }
      const slideLengthMm = Math.max(...fitting);
      return {
        ok: true,
        depthMm: slideLengthMm,
        slideLengthMm,
        notes: [`Box ${mmText(slideLengthMm)} deep to suit the longest standard ${rule.series} slide that fits the opening (${rangeText(lengths)}).`],
      };
    }
    case 'slide-length':
      if (rule.slideLengthMm > openingDepth) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depthRule.slideLengthMm',
              message: `A ${mmText(rule.slideLengthMm)} slide is longer than the opening is deep (${mmText(openingDepth)})`,
            },
          ],
        };
      }
      return { ok: true, depthMm: rule.slideLengthMm, slideLengthMm: rule.slideLengthMm, notes: [] };
    case 'opening-less-clearance': {
      const depthMm = openingDepth - rule.backClearanceMm;
      if (depthMm <= 0) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depthRule.backClearanceMm',
              message: `The back clearance (${mmText(rule.backClearanceMm)}) leaves no depth in a ${mmText(openingDepth)} opening`,
            },
          ],
        };
      }
      return { ok: true, depthMm, slideLengthMm: null, notes: [] };
    }
  }
}

const rangeText = (lengths: readonly Mm[]) => `${specText(lengths[0])}–${specText(lengths[lengths.length - 1])}`;
