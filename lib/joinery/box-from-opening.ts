import type { Mm } from '@/lib/units/length';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import { DRAWER_DEFAULTS, SLIDE_SERIES } from '@/lib/joinery/defaults';
import { mmText } from '@/lib/joinery/format';
import type { BoxSize, FieldError, Result } from '@/lib/joinery/types';

type Opening = Extract<DrawerSchedule['size'], { from: 'opening' }>;
type DepthRule = NonNullable<Opening['depthRule']>;

/**
 * The outside box a schedule asks for: given directly, or derived from the opening, the slide's clearances and a
 * depth rule (a standard slide length, or the opening less a back clearance).
 */
export function boxFromOpening(
  schedule: Pick<DrawerSchedule, 'size' | 'slide'>,
): Result<{ box: BoxSize; slideLengthMm: Mm | null; notes: string[] }> {
  const { size, slide } = schedule;
  if (size.from === 'box') {
    return { ok: true, box: { widthMm: size.widthMm, heightMm: size.heightMm, depthMm: size.depthMm }, slideLengthMm: null, notes: [] };
  }

  const notes: string[] = [];
  const errors: FieldError[] = [];
  const widthDeduction = slide.type === 'undermount' ? slide.widthDeductionMm : 2 * slide.sideClearanceMm;
  const heightDeduction = slide.type === 'undermount' ? slide.heightDeductionMm : slide.heightClearanceMm;
  const widthMm = size.widthMm - widthDeduction;
  const heightMm = size.heightMm - heightDeduction;
  if (widthMm <= 0) {
    errors.push({
      path: 'size.widthMm',
      message: `The opening (${mmText(size.widthMm)}) is narrower than the slides take (${mmText(widthDeduction)})`,
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
  const depth = boxDepth(size.depthMm, rule);
  if (!depth.ok) errors.push(...depth.errors);
  if (errors.length > 0 || !depth.ok) return { ok: false, errors };

  notes.push(
    slide.type === 'undermount'
      ? `Box ${mmText(widthMm)} wide = opening ${mmText(size.widthMm)} − ${mmText(widthDeduction)} undermount deduction; check the slide maker's spec.`
      : `Box ${mmText(widthMm)} wide = opening ${mmText(size.widthMm)} − 2 × ${mmText(widthDeduction / 2)} ${slide.type === 'side-mount' ? `${slide.series} side-mount slide` : slide.type} clearance.`,
  );
  notes.push(...depth.notes);
  return { ok: true, box: { widthMm, heightMm, depthMm: depth.depthMm }, slideLengthMm: depth.slideLengthMm, notes };
}

function boxDepth(
  openingDepth: Mm,
  rule: DepthRule,
): Result<{ depthMm: Mm; slideLengthMm: Mm | null; notes: string[] }> {
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
              message: `No standard ${rule.series} slide fits: ${mmText(room)} of depth after the back clearance, the shortest slide is ${mmText(lengths[0])}`,
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

const rangeText = (lengths: readonly Mm[]) => `${mmText(lengths[0])}–${mmText(lengths[lengths.length - 1])}`;
