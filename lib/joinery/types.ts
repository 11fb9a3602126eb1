import type { Mm } from '@/lib/units/length';
import type { GrainRule, JointMethod } from '@/shared/schemas/drawer-schedule';

/** A problem with one input field; `path` is dotted, as in the schedule form (`joint.lapMm`). */
export interface FieldError {
  path: string;
  message: string;
}

export type Result<T> = ({ ok: true } & T) | { ok: false; errors: FieldError[] };

export interface BoxSize {
  widthMm: Mm;
  heightMm: Mm;
  depthMm: Mm;
}

export type DrawerPartRole = 'front' | 'back' | 'side' | 'bottom' | 'applied-front';

export interface DrawerPart {
  /** The schedule's label. */
  schedule: string;
  role: DrawerPartRole;
  /** Per box. */
  quantityPerBox: number;
  /** Per schedule: per box × boxes. */
  quantity: number;
  /** Along the grain when `grain` is `along-length`. */
  lengthMm: Mm;
  widthMm: Mm;
  thicknessMm: Mm;
  material: string;
  grain: GrainRule;
  /** Length beyond the inside span the part bridges that its joints need (both ends together); part of `lengthMm`. */
  jointAllowanceMm: Mm;
  /**
   * How far each end enters or covers the mating part's thickness, measured from that part's inside face
   * (sides: [front end, back end]; front/back: [left, right]). Empty for bottoms and applied fronts.
   */
  endEngagementMm: Mm[];
  /** Length past the box's outside on each end (a lipped front); part of `lengthMm`, not of the allowance. */
  overhangMm: Mm;
  /** What to cut on this part beyond its rectangle: joints, grooves, where. */
  machining: string[];
}

export interface SizedBox extends BoxSize {
  /** Between the sides' inside faces. */
  insideWidthMm: Mm;
  /** Between the front's and back's inside faces. */
  insideDepthMm: Mm;
  /** Height of sides, front and back (box height less an applied bottom). */
  wallHeightMm: Mm;
}

export interface SetupCardKey {
  joint: JointMethod;
  stockThicknessMm: Mm;
}

/** The drawer's face against the opening it closes: what the preview draws and the fit warnings read. */
export interface DrawerFace {
  /** The box front when it is the face (flush or lipped), else the applied front. */
  role: 'front' | 'applied-front';
  widthMm: Mm;
  heightMm: Mm;
  /** Null when the schedule gives the box size instead of the opening. */
  opening: { widthMm: Mm; heightMm: Mm } | null;
  /** (opening − face) / 2: positive is a reveal inside the opening, negative an overlay past it. */
  sideMarginMm: Mm | null;
  lipped: boolean;
}
