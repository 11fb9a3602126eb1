import type { Mm } from '@/lib/units/length';
import type { Joint, JointMethod } from '@/shared/schemas/drawer-schedule';
import { mmText } from '@/lib/joinery/format';
import { requireStock } from '@/lib/joinery/defaults';
import type { FieldError } from '@/lib/joinery/types';

/** The trade's name for each joint method, for messages and notes. */
export const JOINT_NAMES: Record<JointMethod, string> = {
  'lock-rabbet': 'lock rabbet',
  'rabbet-and-dado': 'rabbet and dado',
  'butt-pocket-screw': 'butt joint with pocket screws',
  'butt-loose-tenon': 'butt joint with loose tenons',
  'half-blind-dovetail': 'half-blind dovetail',
  'through-dovetail': 'through dovetail',
  'box-joint': 'box joint',
};

/** Stock thicknesses of a box: front, back and sides. */
export interface BoxThickness {
  front: Mm;
  back: Mm;
  side: Mm;
}

/**
 * One corner of a box, between a side and the front (or back). Every joint is described by two numbers:
 * how far the side's end enters the front's thickness, and how far the front's end enters (or covers) the side's
 * thickness, each measured from the mating part's inside face. A corner is closed when at least one of them reaches
 * the outside face (engagement = that part's thickness).
 */
export interface Corner {
  sideEngagementMm: Mm;
  panelEngagementMm: Mm;
}

export interface JointCorners {
  front: Corner;
  back: Corner;
}

const sidesFullDepth = (panelThickness: Mm, panelEngagementMm: Mm): Corner => ({
  sideEngagementMm: panelThickness,
  panelEngagementMm,
});
const panelFullWidth = (sideThickness: Mm, sideEngagementMm: Mm): Corner => ({
  sideEngagementMm,
  panelEngagementMm: sideThickness,
});

/**
 * Refuses stock thicknesses and joint figures no joint is cut from (NaN, ±Infinity, negatives, over 100 mm): the
 * corner arithmetic would carry them into every part. The schedule's schema refuses them first; this is the backstop.
 */
function checked(joint: Joint, t: BoxThickness) {
  requireStock('front', t.front);
  requireStock('back', t.back);
  requireStock('side', t.side);
  for (const [key, value] of Object.entries(joint)) {
    if (typeof value === 'number' && (!Number.isFinite(value) || value < 0 || value > 100))
      throw new RangeError(`The joint's ${key} must be a length from 0 to 100 mm (got ${value}).`);
  }
}

/** The corner geometry each joint method makes (RULES.md explains each in words). */
export function jointCorners(joint: Joint, t: BoxThickness): JointCorners {
  checked(joint, t);
  switch (joint.method) {
    case 'lock-rabbet':
      // Layout B: front and back run the full width; the side's tongue stops `faceLeft` short of their outside face.
      return {
        front: panelFullWidth(t.side, t.front - joint.faceLeftMm),
        back: panelFullWidth(t.side, t.back - joint.faceLeftMm),
      };
    case 'rabbet-and-dado':
      // Layout A: sides run the full depth; front and back tongues sit in dados `dadoDepth` into the sides.
      return { front: sidesFullDepth(t.front, joint.dadoDepthMm), back: sidesFullDepth(t.back, joint.dadoDepthMm) };
    case 'butt-pocket-screw':
    case 'butt-loose-tenon':
      return joint.layout === 'sides-full-depth'
        ? { front: sidesFullDepth(t.front, 0), back: sidesFullDepth(t.back, 0) }
        : { front: panelFullWidth(t.side, 0), back: panelFullWidth(t.side, 0) };
    case 'half-blind-dovetail':
      // Half-blind at the front (the lap hides the tails), through dovetails at the back.
      return {
        front: panelFullWidth(t.side, t.front - joint.lapMm),
        back: { sideEngagementMm: t.back, panelEngagementMm: t.side },
      };
    case 'through-dovetail':
    case 'box-joint':
      // Pins/fingers of each part run through the other: every part is cut to the full outside size.
      return {
        front: { sideEngagementMm: t.front, panelEngagementMm: t.side },
        back: { sideEngagementMm: t.back, panelEngagementMm: t.side },
      };
  }
}

/** Why a joint's parameters cannot make a box from this stock, per field; empty when they can. */
export function jointErrors(joint: Joint, t: BoxThickness, wallHeightMm: Mm): FieldError[] {
  checked(joint, t);
  if (!Number.isFinite(wallHeightMm) || wallHeightMm <= 0) throw new RangeError(`The wall height must be a positive length (got ${wallHeightMm}).`);
  const errors: FieldError[] = [];
  const thinnerPanel = Math.min(t.front, t.back);
  const push = (field: string, message: string) => errors.push({ path: `joint.${field}`, message });
  switch (joint.method) {
    case 'lock-rabbet':
      if (joint.faceLeftMm <= 0) push('faceLeftMm', 'The face left outside the tongue must be more than 0 mm, or the cut goes through the front');
      else if (joint.faceLeftMm >= thinnerPanel)
        push(
          'faceLeftMm',
          `The face left (${mmText(joint.faceLeftMm)}) must be less than the front/back thickness (${mmText(thinnerPanel)}), or the side's tongue has nothing to enter`,
        );
      break;
    case 'rabbet-and-dado':
      if (joint.dadoDepthMm <= 0) push('dadoDepthMm', 'The dado depth must be more than 0 mm (for none, choose a butt joint)');
      else if (joint.dadoDepthMm >= t.side)
        push('dadoDepthMm', `The dado (${mmText(joint.dadoDepthMm)} deep) must be shallower than the side is thick (${mmText(t.side)})`);
      if (joint.dadoWidthMm >= thinnerPanel)
        push('dadoWidthMm', `The tongue (dado width ${mmText(joint.dadoWidthMm)}) must be thinner than the front/back (${mmText(thinnerPanel)})`);
      break;
    case 'butt-loose-tenon': {
      const faceThickness = joint.layout === 'sides-full-depth' ? t.side : thinnerPanel;
      if (joint.mortiseDepthMm >= faceThickness)
        push(
          'mortiseDepthMm',
          `The mortise in the face (${mmText(joint.mortiseDepthMm)} deep) must be shallower than that part is thick (${mmText(faceThickness)})`,
        );
      const thinnest = Math.min(t.side, thinnerPanel);
      if (joint.tenonThicknessMm >= thinnest)
        push('tenonThicknessMm', `The tenon (${mmText(joint.tenonThicknessMm)}) must be thinner than the thinnest part (${mmText(thinnest)})`);
      break;
    }
    case 'half-blind-dovetail':
      if (joint.lapMm <= 0) push('lapMm', 'The lap must be more than 0 mm (for none, choose through dovetails)');
      else if (joint.lapMm >= t.front) push('lapMm', `The lap (${mmText(joint.lapMm)}) must be less than the front thickness (${mmText(t.front)})`);
      break;
    case 'box-joint':
      if (joint.fingerWidthMm > wallHeightMm)
        push('fingerWidthMm', `A ${mmText(joint.fingerWidthMm)} finger is wider than the box is tall (${mmText(wallHeightMm)})`);
      break;
    case 'butt-pocket-screw':
    case 'through-dovetail':
      break;
  }
  return errors;
}

/**
 * What the saw or router must cut at the ends of a front, back or side for this joint. `setInMm` on the front
 * and back is how far the joint sits from the end (the side engagement plus any lip).
 */
export function jointMachining(joint: Joint, role: 'front' | 'back' | 'side', corners: JointCorners, t: BoxThickness, lipMm: Mm): string[] {
  checked(joint, t);
  if (!Number.isFinite(lipMm) || lipMm < 0) throw new RangeError(`The lip must be zero or a positive length (got ${lipMm}).`);
  const panel = role === 'front' ? corners.front : corners.back;
  const setIn = panel.panelEngagementMm + (role === 'front' ? lipMm : 0);
  const lipText = role === 'front' && lipMm > 0 ? ` (${mmText(t.side)} side + ${mmText(lipMm)} lip: the deeper cut for the overhang)` : '';
  switch (joint.method) {
    case 'lock-rabbet':
      return role === 'side'
        ? [
            `Lock-rabbet tongue on both ends: enters the front ${mmText(corners.front.sideEngagementMm)} and the back ${mmText(corners.back.sideEngagementMm)}, leaving ${mmText(joint.faceLeftMm)} of their face outside.`,
          ]
        : [`Lock-rabbet groove in the inside face at both ends, set ${mmText(setIn)} from the end${lipText}; measured to the side thickness.`];
    case 'rabbet-and-dado':
      return role === 'side'
        ? [
            `Dado ${mmText(joint.dadoWidthMm)} wide × ${mmText(joint.dadoDepthMm)} deep across the inside face at both ends, its near edge ${mmText(t.front - joint.dadoWidthMm)} from the front end and ${mmText(t.back - joint.dadoWidthMm)} from the back end.`,
          ]
        : [
            `Rabbet on the outside face of both ends, ${mmText(joint.dadoDepthMm)} long, leaving a ${mmText(joint.dadoWidthMm)} tongue at the inside face.`,
          ];
    case 'butt-pocket-screw': {
      const drilled = joint.layout === 'sides-full-depth' ? role !== 'side' : role === 'side';
      return drilled
        ? ['Pocket holes in the inside face at both ends; check the jig’s setting for this thickness.']
        : ['Square ends; takes the pocket screws.'];
    }
    case 'butt-loose-tenon': {
      const endGrain = joint.layout === 'sides-full-depth' ? role !== 'side' : role === 'side';
      return [
        endGrain
          ? `${joint.tenonsPerCorner} mortise(s) ${mmText(joint.tenonThicknessMm)} wide in each end grain, ${mmText(joint.mortiseDepthMm)} deep.`
          : `${joint.tenonsPerCorner} mortise(s) ${mmText(joint.tenonThicknessMm)} wide in the inside face at both ends, ${mmText(joint.mortiseDepthMm)} deep, centred on the mating part's thickness.`,
      ];
    }
    case 'half-blind-dovetail':
      if (role === 'front')
        return [
          `Half-blind dovetail sockets at both ends, ${mmText(t.side)} deep, set ${mmText(setIn)} from the end${lipText}, leaving a ${mmText(joint.lapMm)} lap.`,
        ];
      if (role === 'back') return [`Through-dovetail pins at both ends, ${mmText(t.side)} long.`];
      return [`Front end: half-blind tails ${mmText(corners.front.sideEngagementMm)} long. Back end: through tails ${mmText(t.back)} long.`];
    case 'through-dovetail':
      return role === 'side'
        ? [`Through tails at both ends: ${mmText(t.front)} long at the front, ${mmText(t.back)} at the back.`]
        : [`Through pins at both ends, ${mmText(t.side)} long.`];
    case 'box-joint':
      return role === 'side'
        ? [`Box-joint fingers ${mmText(joint.fingerWidthMm)} wide at both ends: ${mmText(t.front)} long at the front, ${mmText(t.back)} at the back.`]
        : [`Box-joint fingers ${mmText(joint.fingerWidthMm)} wide at both ends, ${mmText(t.side)} long.`];
  }
}
