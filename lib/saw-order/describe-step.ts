/**
 * Saw-order steps in the cutter's words: what to cut, where to set the fence, and what each cut frees. Lengths are
 * shown in the shop's unit; the plan stays in mm.
 */
import { formatLength, type LengthStyle } from '@/lib/units/format-length';
import type { PlanPiece, SawPiece, SawStep } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';

/** What a narrow rip asks for instead of the rip fence. */
export const NARROW_HOW = 'on a sled, with a track saw or on the band saw: too narrow to rip between blade and fence';

export const STEP_KIND_LABELS: Record<SawStep['kind'], string> = { rip: 'Rip', crosscut: 'Crosscut' };

const instanceKey = (partId: string, instance: number) => `${partId}#${instance}`;

/** Each part instance on the piece as the cutter reads it: its label and which one of its quantity it is. */
export function partInstanceLabels(piece: PlanPiece): Map<string, string> {
  return new Map(piece.placements.map((p) => [instanceKey(p.partId, p.instance), `${p.label || 'Part'} #${p.instance}`]));
}

export interface ProducedText {
  name: string;
  role: SawPiece['role'];
  size: string;
  /** The part it is (role `part`), else empty. */
  part: string;
}

export interface StepText {
  n: number;
  kind: SawStep['kind'];
  kindLabel: string;
  piece: string;
  /** The fence setting in the shop's unit. */
  fence: string;
  length: string;
  trim: boolean;
  /** Both sides too narrow to ride the rip fence: a sled, track saw or band saw cut. */
  narrow: boolean;
  /** One line the cutter reads aloud. */
  summary: string;
  /** The saw the cut is made on, when the plan names saws. */
  saw?: string;
  /** Labels of the parts this cut frees, in order. */
  frees: string[];
  produced: ProducedText[];
}

export function describeStep(step: SawStep, labels: Map<string, string>, units: ShopUnits, style: LengthStyle = 'hyphen'): StepText {
  const len = (mm: number) => formatLength(mm, units, { style });
  const times = style === 'ascii' ? ' x ' : ' × ';
  const produced = step.produces.map((p) => ({
    name: p.name,
    role: p.role,
    size: `${len(p.w)}${times}${len(p.h)}`,
    part: p.role === 'part' && p.parts[0] ? (labels.get(instanceKey(p.parts[0].partId, p.parts[0].instance)) ?? 'Part') : '',
  }));
  const kindLabel = STEP_KIND_LABELS[step.kind];
  const fence = len(step.fence);
  const what = step.trim ? `${kindLabel} a trim cut off ${step.piece}` : `${kindLabel} ${step.piece}`;
  const narrow = step.narrow === true;
  return {
    n: step.n,
    kind: step.kind,
    kindLabel,
    piece: step.piece,
    fence,
    length: len(step.length),
    trim: step.trim,
    narrow,
    ...(step.saw ? { saw: step.saw } : {}),
    summary:
      (narrow ? `${step.n}. ${what} ${fence} wide ${NARROW_HOW}` : `${step.n}. ${what}, fence at ${fence}`) + (step.saw ? ` (on ${step.saw})` : ''),
    frees: produced.filter((p) => p.role === 'part').map((p) => p.part),
    produced,
  };
}

/** Every step of a piece, described. */
export function describeSawOrder(piece: PlanPiece, units: ShopUnits, style: LengthStyle = 'hyphen'): StepText[] {
  const labels = partInstanceLabels(piece);
  return (piece.sawOrder ?? []).map((s) => describeStep(s, labels, units, style));
}

export const ROLE_LABELS: Record<SawPiece['role'], string> = { part: 'Part', piece: 'Cut on', offcut: 'Offcut — keep', waste: 'Waste' };

/** "Sheet A", "Board B", "Offcut C" with its material, thickness and size. */
export function stockPieceTitle(piece: PlanPiece, name: string, units: ShopUnits, style: LengthStyle = 'hyphen') {
  const len = (mm: number) => formatLength(mm, units, { style });
  const kind = { sheet: 'Sheet', board: 'Board', offcut: 'Offcut' }[piece.kind];
  const times = style === 'ascii' ? ' x ' : ' × ';
  return { heading: `${kind} ${name}`, detail: `${piece.material} ${len(piece.thickness)} · ${len(piece.length)}${times}${len(piece.width)}` };
}
