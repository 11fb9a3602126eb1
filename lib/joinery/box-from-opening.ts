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
  schedule: Pick<DrawerSchedule, 'size' | 'slide'> & { thickness?: Pick<DrawerSchedule['thickness'], 'side'> },
): Result<{ box: BoxSize; slideLength: Mm | null; notes: string[] }> {
  const { size, slide } = schedule;
  const unreadable = [...lengthErrors({ size, slide, thickness: schedule.thickness }), ...sizeErrors(size)];
  if (unreadable.length) return { ok: false, errors: unreadable };
  if (size.from === 'box') {
    return { ok: true, box: { width: size.width, height: size.height, depth: size.depth }, slideLength: null, notes: [] };
  }

  const model = slide.type === 'side-mount' || slide.type === 'undermount' ? slide.model : undefined;
  const width = model ? modelWidth(model, size.width, schedule.thickness?.side) : clearanceWidth(slide, size.width);
  const heightDeduction = model ? model.heightClearance : slide.type === 'undermount' ? slide.heightDeduction : slide.heightClearance;
  const height = size.height - heightDeduction;
  const errors: FieldError[] = [];
  if (width.width <= 0) {
    errors.push({
      path: 'size.width',
      message: `The opening (${mmText(size.width)}) is narrower than the slides take (${mmText(size.width - width.width)})`,
    });
  }
  if (height <= 0) {
    errors.push({
      path: 'size.height',
      message: `The opening (${mmText(size.height)}) is lower than the slides take (${mmText(heightDeduction)})`,
    });
  }

  const series = slide.type === 'side-mount' ? slide.series : 'imperial';
  const rule: DepthRule =
    size.depthRule ??
    (slide.type === 'side-mount' || slide.type === 'undermount'
      ? { rule: 'longest-standard-slide', series, backClearance: DRAWER_DEFAULTS.backClearance }
      : { rule: 'opening-less-clearance', backClearance: DRAWER_DEFAULTS.backClearance });
  const depth = model && rule.rule === 'longest-standard-slide' ? modelDepth(model, size.depth) : boxDepth(size.depth, rule);
  if (!depth.ok) errors.push(...depth.errors);
  if (errors.length > 0 || !depth.ok) return { ok: false, errors };

  const notes = [width.note(width.width), ...depth.notes];
  if (model) notes.push(`Box ${mmText(height)} high = opening ${mmText(size.height)} − ${specText(heightDeduction)} for the ${model.name}.`);
  return { ok: true, box: { width: width.width, height, depth: depth.depth }, slideLength: depth.slideLength, notes };
}

type Model = NonNullable<Extract<DrawerSchedule['slide'], { type: 'undermount' }>['model']>;

/** The box width by the series' or runners' clearance each side, or the generic undermount deduction. */
function clearanceWidth(slide: DrawerSchedule['slide'], openingWidth: Mm) {
  if (slide.type === 'undermount') {
    const width = openingWidth - slide.widthDeduction;
    return {
      width,
      note: (w: Mm) =>
        `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − ${specText(slide.widthDeduction)} undermount deduction; check the slide maker's spec.`,
    };
  }
  const each = slide.sideClearance;
  const name = slide.type === 'side-mount' ? `${slide.series} side-mount slide` : slide.type;
  return {
    width: openingWidth - 2 * each,
    note: (w: Mm) => `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − 2 × ${specText(each)} ${name} clearance.`,
  };
}

/**
 * The maker's width rule: the box's outside width is the opening less the deduction, or its inside width is, and the
 * sides stand outside that (so the box is 2 × the side thickness wider).
 */
function modelWidth(model: Model, openingWidth: Mm, givenSide: Mm | undefined) {
  if (model.widthRule === 'outside') {
    return {
      width: openingWidth - model.widthDeduction,
      note: (w: Mm) =>
        `Box ${mmText(w)} wide = opening ${mmText(openingWidth)} − ${specText(model.widthDeduction)}, the ${model.name}'s outside-width rule.`,
    };
  }
  const side = givenSide ?? DRAWER_DEFAULTS.sideThickness;
  const inside = openingWidth - model.widthDeduction;
  return {
    width: inside + 2 * side,
    note: (w: Mm) =>
      `Box ${mmText(w)} wide: inside ${mmText(inside)} = opening ${mmText(openingWidth)} − ${specText(model.widthDeduction)} (the ${model.name}'s inside-width rule), plus 2 × ${specText(side)} sides.`,
  };
}

/** The longest length the model is made in that fits the opening less its rear clearance; the box is that long. */
function modelDepth(model: Model, openingDepth: Mm): Result<{ depth: Mm; slideLength: Mm; notes: string[] }> {
  const room = openingDepth - model.rearClearance;
  const fitting = model.lengths.filter((l) => l <= room + 1e-9);
  if (fitting.length === 0) {
    return {
      ok: false,
      errors: [
        {
          path: 'size.depth',
          message: `No ${model.name} fits: ${mmText(room)} of depth after its ${specText(model.rearClearance)} rear clearance, and its shortest length is ${specText(model.lengths[0])}`,
        },
      ],
    };
  }
  const slideLength = Math.max(...fitting);
  return {
    ok: true,
    depth: slideLength,
    slideLength,
    notes: [
      `Box ${mmText(slideLength)} long, as long as its slide: the longest ${model.name} that fits ${mmText(openingDepth)} less ${specText(model.rearClearance)} rear clearance.`,
    ],
  };
}

/** An opening or a box has a size: under half a millimetre is a typing slip. */
function sizeErrors(size: DrawerSchedule['size']): FieldError[] {
  return (['width', 'height', 'depth'] as const)
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

function boxDepth(openingDepth: Mm, rule: DepthRule): Result<{ depth: Mm; slideLength: Mm | null; notes: string[] }> {
  switch (rule.rule) {
    case 'longest-standard-slide': {
      const room = openingDepth - rule.backClearance;
      const lengths = SLIDE_SERIES[rule.series].lengths;
      const fitting = lengths.filter((l) => l <= room + 1e-9);
      if (fitting.length === 0) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depth',
              message: `No standard ${rule.series} slide fits: ${mmText(room)} of depth after the back clearance, the shortest slide is ${specText(lengths[0])}`,
            },
          ],
        };
      }
      const slideLength = Math.max(...fitting);
      return {
        ok: true,
        depth: slideLength,
        slideLength,
        notes: [`Box ${mmText(slideLength)} deep to suit the longest standard ${rule.series} slide that fits the opening (${rangeText(lengths)}).`],
      };
    }
    case 'slide-length':
      if (rule.slideLength > openingDepth) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depthRule.slideLength',
              message: `A ${mmText(rule.slideLength)} slide is longer than the opening is deep (${mmText(openingDepth)})`,
            },
          ],
        };
      }
      return { ok: true, depth: rule.slideLength, slideLength: rule.slideLength, notes: [] };
    case 'opening-less-clearance': {
      const depth = openingDepth - rule.backClearance;
      if (depth <= 0) {
        return {
          ok: false,
          errors: [
            {
              path: 'size.depthRule.backClearance',
              message: `The back clearance (${mmText(rule.backClearance)}) leaves no depth in a ${mmText(openingDepth)} opening`,
            },
          ],
        };
      }
      return { ok: true, depth, slideLength: null, notes: [] };
    }
  }
}

const rangeText = (lengths: readonly Mm[]) => `${specText(lengths[0])}–${specText(lengths[lengths.length - 1])}`;
