import type { Mm } from '@/lib/units/length';
import type { GrainRule, JointMethod } from '@/shared/schemas/drawer-schedule';

/** A problem with one input field; `path` is dotted, as in the schedule form (`joint.lap`). */
export interface FieldError {
  path: string;
  message: string;
}

export type Result<T> = ({ ok: true } & T) | { ok: false; errors: FieldError[] };

export interface BoxSize {
  width: Mm;
  height: Mm;
  depth: Mm;
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
  length: Mm;
  width: Mm;
  thickness: Mm;
  material: string;
  grain: GrainRule;
  /** Length beyond the inside span the part bridges that its joints need (both ends together); part of `length`. */
  jointAllowance: Mm;
  /**
   * How far each end enters or covers the mating part's thickness, measured from that part's inside face
   * (sides: [front end, back end]; front/back: [left, right]). Empty for bottoms and applied fronts.
   */
  endEngagement: Mm[];
  /** Length past the box's outside on each end (a lipped front); part of `length`, not of the allowance. */
  overhang: Mm;
  /** What to cut on this part beyond its rectangle: joints, grooves, where. */
  machining: string[];
}

export interface SizedBox extends BoxSize {
  /** Between the sides' inside faces. */
  insideWidth: Mm;
  /** Between the front's and back's inside faces. */
  insideDepth: Mm;
  /** Height of sides, front and back (box height less an applied bottom). */
  wallHeight: Mm;
}

export interface SetupCardKey {
  joint: JointMethod;
  stockThickness: Mm;
}

/** The drawer's face against the opening it closes: what the preview draws and the fit warnings read. */
export interface DrawerFace {
  /** The box front when it is the face (flush or lipped), else the applied front. */
  role: 'front' | 'applied-front';
  width: Mm;
  height: Mm;
  /** Null when the schedule gives the box size instead of the opening. */
  opening: { width: Mm; height: Mm } | null;
  /** (opening − face) / 2: positive is a reveal inside the opening, negative an overlay past it. */
  sideMargin: Mm | null;
  lipped: boolean;
}
