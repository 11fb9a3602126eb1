/**
 * Saw profiles: what a saw can cut, and which saw makes each cut of a plan.
 *
 * - Stage rule: the saw's most stages and its first direction bound the cut tree of the trimmed area (trim cuts
 *   excluded). Without a saw, the cutting style is the rule: `strips` is 3 stages, rips first (the same rule a saw
 *   with 3 stages, rip first keeps); `panel` any.
 * - Each saw-order step is made on the second saw (`settings.saw`) when it can make it, else on the breakdown saw.
 *   A saw can make a cut when the piece fits it (largest piece: longer side against its length, shorter against
 *   its width), a rip's fence setting is within its rip capacity (a saw with no rip capacity has no fence limit),
 *   the cut's length is within its crosscut capacity (crosscuts only; a track saw's track bounds every cut), and a
 *   rip leaves at least its safe minimum between blade and fence (unless the step is marked `narrow`: for a sled).
 * - The stage rule of each saw is counted on the steps it makes, from the piece it is handed (trim steps left out).
 */
import type { Rect } from '@/lib/geometry/rect';
import type { Axis } from '@/lib/geometry/axis';
import { EPS, STRIP_STAGES } from '@/lib/nesting/guillotine';
import type { NestSettings, SawStep } from '@/shared/schemas/nesting';
import type { NestSaw } from '@/shared/schemas/saw';

export interface StageRule {
  maxStages: number;
  /** The first stage's direction (`y`: rips); undefined when either way will do (any number of stages). */
  firstAxis?: Axis;
}

const axisOfStage = (first: NestSaw['firstStage']): Axis => (first === 'rip' ? 'y' : 'x');

/** The stage rule of one saw. */
export function sawStageRule(saw: NestSaw): StageRule {
  return saw.maxStages === null ? { maxStages: Infinity } : { maxStages: saw.maxStages, firstAxis: axisOfStage(saw.firstStage) };
}

/** The rule the whole cut tree of a piece keeps: the second saw's (it cuts the parts), else the style's. */
export function stageRule(settings: Pick<NestSettings, 'style' | 'saw'>): StageRule {
  if (settings.saw) return sawStageRule(settings.saw);
  return settings.style === 'strips' ? { maxStages: STRIP_STAGES, firstAxis: 'y' } : { maxStages: Infinity };
}

/** The request's saws, second saw first (the one preferred for each cut). */
export function requestSaws(settings: Pick<NestSettings, 'saw' | 'breakdownSaw'>): NestSaw[] {
  return [settings.saw, settings.breakdownSaw].filter((s): s is NestSaw => !!s);
}

/** Does a piece of this size go on the saw? */
export function pieceFits(saw: NestSaw, piece: Pick<Rect, 'w' | 'h'>): boolean {
  const long = Math.max(piece.w, piece.h);
  const short = Math.min(piece.w, piece.h);
  return (saw.maxPieceLength === null || long <= saw.maxPieceLength + EPS) && (saw.maxPieceWidth === null || short <= saw.maxPieceWidth + EPS);
}

/** The longest cut of this kind the saw makes (Infinity: no limit): a track saw's track bounds every cut. */
export function cutLengthLimit(saw: NestSaw, kind: SawStep['kind']): number {
  if (saw.crosscutCapacity === null) return Infinity;
  return kind === 'crosscut' || saw.kind === 'track-saw' ? saw.crosscutCapacity : Infinity;
}

export interface CutProblem {
  code: 'saw-piece-too-large' | 'rip-capacity' | 'crosscut-capacity' | 'unsafe-fence';
  message: string;
}

const mmText = (mm: number) => `${Math.round(mm * 10) / 10} mm`;

/** Why `saw` cannot make this cut (empty: it can). `piece` is the piece being cut. */
export function cutProblems(saw: NestSaw, step: Pick<SawStep, 'kind' | 'fence' | 'length' | 'narrow'>, piece: Pick<Rect, 'w' | 'h'>): CutProblem[] {
  const out: CutProblem[] = [];
  if (!pieceFits(saw, piece)) {
    out.push({
      code: 'saw-piece-too-large',
      message: `a ${mmText(Math.max(piece.w, piece.h))} × ${mmText(Math.min(piece.w, piece.h))} piece is larger than ${saw.name} takes`,
    });
  }
  if (step.kind === 'rip' && saw.ripCapacity !== null && step.fence > saw.ripCapacity + EPS) {
    out.push({
      code: 'rip-capacity',
      message: `a fence setting of ${mmText(step.fence)} is beyond ${saw.name}’s ${mmText(saw.ripCapacity)} rip capacity`,
    });
  }
  const limit = cutLengthLimit(saw, step.kind);
  if (step.length > limit + EPS) {
    out.push({
      code: 'crosscut-capacity',
      message: `a ${mmText(step.length)} ${step.kind} is longer than ${saw.name}’s ${mmText(limit)} ${saw.kind === 'track-saw' ? 'track' : 'crosscut capacity'}`,
    });
  }
  if (step.kind === 'rip' && !step.narrow && step.fence < saw.minFenceWidth - EPS) {
    out.push({
      code: 'unsafe-fence',
      message: `${mmText(step.fence)} between blade and fence is under ${saw.name}’s ${mmText(saw.minFenceWidth)} safe minimum`,
    });
  }
  return out;
}

/**
 * Stages counted on the steps each saw makes: a piece keeps, per saw, the direction and stage of the last cut that
 * saw made on it (or on the piece it came from). A step in the same direction on the same saw stays in the stage; the
 * other direction starts the next; a saw's first cut on a piece handed to it is stage 1, or 2 when it runs against
 * the saw's first direction. Trim steps count as nothing. Returns each step's stage (0 for trim steps).
 */
export function stepStages(steps: readonly SawStep[], rootName: string, saws: readonly NestSaw[]): number[] {
  type State = { saw: string; axis: Axis; stage: number } | null;
  const state = new Map<string, State>([[rootName, null]]);
  return steps.map((step) => {
    const before = state.get(step.piece) ?? null;
    state.delete(step.piece);
    let after: State = before;
    let stage = 0;
    if (!step.trim) {
      const axis: Axis = step.kind === 'rip' ? 'y' : 'x';
      const saw = saws.find((s) => s.name === step.saw) ?? saws[0];
      const sawName = saw?.name ?? '';
      if (before && before.saw === sawName) stage = before.axis === axis ? before.stage : before.stage + 1;
      else {
        const rule = saw ? sawStageRule(saw) : { maxStages: Infinity };
        stage = rule.firstAxis && rule.firstAxis !== axis ? 2 : 1;
      }
      after = { saw: sawName, axis, stage };
    }
    for (const p of step.produces) state.set(p.name, after);
    return stage;
  });
}
