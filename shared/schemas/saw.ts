import { z } from 'zod';
import { text } from './text';

/**
 * A saw the shop cuts sheet goods on, kept per shop in Shop settings, and the profile a nest is bounded by: no fence
 * setting above its rip capacity, no cut longer than its crosscut capacity (where that applies), no piece larger
 * than it takes, at most its number of stages of cuts, the first stage the way it is used, and never a strip
 * narrower than its safe minimum between blade and fence. All lengths are mm.
 */
export const SAW_KINDS = ['table-saw', 'sliding-table-saw', 'panel-saw', 'track-saw', 'other'] as const;
export type SawKind = (typeof SAW_KINDS)[number];

export const SAW_KIND_LABELS: Record<SawKind, string> = {
  'table-saw': 'Table saw',
  'sliding-table-saw': 'Sliding table saw',
  'panel-saw': 'Panel saw',
  'track-saw': 'Track saw',
  other: 'Other',
};

/** Stages of cuts a saw is used with: 2, 3, 4, or null for any number. */
export const SAW_STAGE_CHOICES = [2, 3, 4] as const;

const mm = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a length in mm.` })
    .finite(`${what} must be a finite length.`)
    .min(min, min === 0 ? `${what} cannot be negative.` : `${what} must be more than ${min} mm.`)
    .max(max, `${what} over ${max} mm looks like a slipped unit.`);

const capacity = (what: string) => mm(what, 1, 20_000).nullable().default(null);

const sawObject = z.object({
  kind: z.enum(SAW_KINDS, { error: 'The kind is a table saw, sliding table saw, panel saw, track saw, or the shop’s own name.' }),
  /** With kind `other`: what the shop calls it (a band saw, a beam saw…). */
  kindName: text().max(60, 'At most 60 characters.').nullable().default(null),
  name: text().min(1, 'Name the saw.').max(80, 'At most 80 characters.'),
  kerf: mm('The kerf', 0, 20),
  /** The widest fence setting, blade to fence; null when the saw has no fence to set (a track saw). */
  ripCapacity: capacity('The rip capacity'),
  /**
   * The longest cut on the sled or carriage; a track saw's is its track's length and bounds every cut it makes.
   * Null: no limit the shop needs to keep to.
   */
  crosscutCapacity: capacity('The crosscut capacity'),
  /** The largest piece the saw takes (its longer and its shorter side); null: any. */
  maxPieceLength: capacity('The largest piece’s length'),
  maxPieceWidth: capacity('The largest piece’s width'),
  /** The most stages of cuts (a stage: the cuts of one direction on a piece); null: any number. */
  maxStages: z
    .union([z.literal(2), z.literal(3), z.literal(4)], { error: 'The stages are 2, 3, 4, or any.' })
    .nullable()
    .default(null),
  /** `rip`: the first stage cuts along the stock's length (strips); `crosscut`: across it. */
  firstStage: z.enum(['rip', 'crosscut'], { error: 'The first stage is rips or crosscuts.' }).default('rip'),
  /** The narrowest strip left between blade and fence for a safe rip (the saw's manual decides). 0: no rule. */
  minFenceWidth: mm('The minimum width between blade and fence', 0, 300),
});

function checkSaw(s: z.output<typeof sawObject>, ctx: z.RefinementCtx) {
  if (s.kind === 'other' && !s.kindName) ctx.addIssue({ code: 'custom', message: 'Say what kind of saw it is.', path: ['kindName'] });
  if (s.maxPieceLength !== null && s.maxPieceWidth !== null && s.maxPieceWidth > s.maxPieceLength + 1e-6) {
    ctx.addIssue({ code: 'custom', message: 'Give the largest piece’s longer side as its length.', path: ['maxPieceWidth'] });
  }
}

export const sawSchema = sawObject.superRefine(checkSaw);

export type Saw = z.output<typeof sawSchema>;
export type SawInput = z.input<typeof sawSchema>;

/** A saw as a nest request and a saved plan carry it: the whole profile (so a saved plan keeps it), and its id. */
export const nestSawSchema = sawObject.extend({ id: z.string().max(100).optional() }).superRefine(checkSaw);
export type NestSaw = z.output<typeof nestSawSchema>;

/** A saw's kind as people say it: the shop's own name for `other`. */
export const sawKindText = (s: Pick<Saw, 'kind' | 'kindName'>) => (s.kind === 'other' ? s.kindName || 'Other saw' : SAW_KIND_LABELS[s.kind]);
