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
  sideEngagement: Mm;
  panelEngagement: Mm;
}

export interface JointCorners {
  front: Corner;
  back: Corner;
}

const sidesFullDepth = (panelThickness: Mm, panelEngagement: Mm): Corner => ({
  sideEngagement: panelThickness,
  panelEngagement,
});
const panelFullWidth = (sideThickness: Mm, sideEngagement: Mm): Corner => ({
  sideEngagement,
  panelEngagement: sideThickness,
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
        front: panelFullWidth(t.side, t.front - joint.faceLeft),
        back: panelFullWidth(t.side, t.back - joint.faceLeft),
      };
    case 'rabbet-and-dado':
      // Layout A: sides run the full depth; front and back tongues sit in dados `dadoDepth` into the sides.
      return { front: sidesFullDepth(t.front, joint.dadoDepth), back: sidesFullDepth(t.back, joint.dadoDepth) };
    case 'butt-pocket-screw':
    case 'butt-loose-tenon':
      return joint.layout === 'sides-full-depth'
        ? { front: sidesFullDepth(t.front, 0), back: sidesFullDepth(t.back, 0) }
        : { front: panelFullWidth(t.side, 0), back: panelFullWidth(t.side, 0) };
    case 'half-blind-dovetail':
      // Half-blind at the front (the lap hides the tails), through dovetails at the back.
      return {
        front: panelFullWidth(t.side, t.front - joint.lap),
        back: { sideEngagement: t.back, panelEngagement: t.side },
      };
    case 'through-dovetail':
    case 'box-joint':
      // Pins/fingers of each part run through the other: every part is cut to the full outside size.
      return {
        front: { sideEngagement: t.front, panelEngagement: t.side },
        back: { sideEngagement: t.back, panelEngagement: t.side },
      };
  }
}

/** Why a joint's parameters cannot make a box from this stock, per field; empty when they can. */
export function jointErrors(joint: Joint, t: BoxThickness, wallHeight: Mm): FieldError[] {
  checked(joint, t);
  if (!Number.isFinite(wallHeight) || wallHeight <= 0) throw new RangeError(`The wall height must be a positive length (got ${wallHeight}).`);
  const errors: FieldError[] = [];
  const thinnerPanel = Math.min(t.front, t.back);
  const push = (field: string, message: string) => errors.push({ path: `joint.${field}`, message });
  switch (joint.method) {
    case 'lock-rabbet':
      if (joint.faceLeft <= 0) push('faceLeft', 'The face left outside the tongue must be more than 0 mm, or the cut goes through the front');
      else if (joint.faceLeft >= thinnerPanel)
        push(
          'faceLeft',
          `The face left (${mmText(joint.faceLeft)}) must be less than the front/back thickness (${mmText(thinnerPanel)}), or the side's tongue has nothing to enter`,
        );
      break;
    case 'rabbet-and-dado':
      if (joint.dadoDepth <= 0) push('dadoDepth', 'The dado depth must be more than 0 mm (for none, choose a butt joint)');
      else if (joint.dadoDepth >= t.side)
        push('dadoDepth', `The dado (${mmText(joint.dadoDepth)} deep) must be shallower than the side is thick (${mmText(t.side)})`);
      if (joint.dadoWidth >= thinnerPanel)
        push('dadoWidth', `The tongue (dado width ${mmText(joint.dadoWidth)}) must be thinner than the front/back (${mmText(thinnerPanel)})`);
      break;
    case 'butt-loose-tenon': {
      const faceThickness = joint.layout === 'sides-full-depth' ? t.side : thinnerPanel;
      if (joint.mortiseDepth >= faceThickness)
        push(
          'mortiseDepth',
          `The mortise in the face (${mmText(joint.mortiseDepth)} deep) must be shallower than that part is thick (${mmText(faceThickness)})`,
        );
      const thinnest = Math.min(t.side, thinnerPanel);
      if (joint.tenonThickness >= thinnest)
        push('tenonThickness', `The tenon (${mmText(joint.tenonThickness)}) must be thinner than the thinnest part (${mmText(thinnest)})`);
      break;
    }
    case 'half-blind-dovetail':
      if (joint.lap <= 0) push('lap', 'The lap must be more than 0 mm (for none, choose through dovetails)');
      else if (joint.lap >= t.front) push('lap', `The lap (${mmText(joint.lap)}) must be less than the front thickness (${mmText(t.front)})`);
      break;
    case 'box-joint':
      if (joint.fingerWidth > wallHeight)
        push('fingerWidth', `A ${mmText(joint.fingerWidth)} finger is wider than the box is tall (${mmText(wallHeight)})`);
      break;
    case 'butt-pocket-screw':
    case 'through-dovetail':
      break;
  }
  return errors;
}

/**
 * What the saw or router must cut at the ends of a front, back or side for this joint. `setIn` on the front
 * and back is how far the joint sits from the end (the side engagement plus any lip).
 */
export function jointMachining(joint: Joint, role: 'front' | 'back' | 'side', corners: JointCorners, t: BoxThickness, lip: Mm): string[] {
  checked(joint, t);
  if (!Number.isFinite(lip) || lip < 0) throw new RangeError(`The lip must be zero or a positive length (got ${lip}).`);
  const panel = role === 'front' ? corners.front : corners.back;
  const setIn = panel.panelEngagement + (role === 'front' ? lip : 0);
  const lipText = role === 'front' && lip > 0 ? ` (${mmText(t.side)} side + ${mmText(lip)} lip: the deeper cut for the overhang)` : '';
  switch (joint.method) {
    case 'lock-rabbet':
      return role === 'side'
        ? [
            `Lock-rabbet tongue on both ends: enters the front ${mmText(corners.front.sideEngagement)} and the back ${mmText(corners.back.sideEngagement)}, leaving ${mmText(joint.faceLeft)} of their face outside.`,
          ]
        : [`Lock-rabbet groove in the inside face at both ends, set ${mmText(setIn)} from the end${lipText}; measured to the side thickness.`];
    case 'rabbet-and-dado':
      return role === 'side'
        ? [
            `Dado ${mmText(joint.dadoWidth)} wide × ${mmText(joint.dadoDepth)} deep across the inside face at both ends, its near edge ${mmText(t.front - joint.dadoWidth)} from the front end and ${mmText(t.back - joint.dadoWidth)} from the back end.`,
          ]
        : [
            `Rabbet on the outside face of both ends, ${mmText(joint.dadoDepth)} long, leaving a ${mmText(joint.dadoWidth)} tongue at the inside face.`,
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
          ? `${joint.tenonsPerCorner} mortise(s) ${mmText(joint.tenonThickness)} wide in each end grain, ${mmText(joint.mortiseDepth)} deep.`
          : `${joint.tenonsPerCorner} mortise(s) ${mmText(joint.tenonThickness)} wide in the inside face at both ends, ${mmText(joint.mortiseDepth)} deep, centred on the mating part's thickness.`,
      ];
    }
    case 'half-blind-dovetail':
      if (role === 'front')
        return [
          `Half-blind dovetail sockets at both ends, ${mmText(t.side)} deep, set ${mmText(setIn)} from the end${lipText}, leaving a ${mmText(joint.lap)} lap.`,
        ];
      if (role === 'back') return [`Through-dovetail pins at both ends, ${mmText(t.side)} long.`];
      return [`Front end: half-blind tails ${mmText(corners.front.sideEngagement)} long. Back end: through tails ${mmText(t.back)} long.`];
    case 'through-dovetail':
      return role === 'side'
        ? [`Through tails at both ends: ${mmText(t.front)} long at the front, ${mmText(t.back)} at the back.`]
        : [`Through pins at both ends, ${mmText(t.side)} long.`];
    case 'box-joint':
      return role === 'side'
        ? [`Box-joint fingers ${mmText(joint.fingerWidth)} wide at both ends: ${mmText(t.front)} long at the front, ${mmText(t.back)} at the back.`]
        : [`Box-joint fingers ${mmText(joint.fingerWidth)} wide at both ends, ${mmText(t.side)} long.`];
  }
}
