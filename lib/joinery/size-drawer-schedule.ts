import { withLengthText, type LengthText } from '@/lib/joinery/format';
import type { Mm } from '@/lib/units/length';
import { drawerScheduleSchema, type DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import { boxFromOpening } from '@/lib/joinery/box-from-opening';
import { POCKET_SCREW_MIN_STOCK, UNDERMOUNT_MAX_SIDE } from '@/lib/joinery/defaults';
import { mmText, specText } from '@/lib/joinery/format';
import { JOINT_NAMES, jointCorners, jointErrors, jointMachining, type BoxThickness, type JointCorners } from '@/lib/joinery/joint-rules';
import { requiredSetupCards } from '@/lib/joinery/setup-cards';
import { SLIDE_SIDE_TOLERANCE_MM } from '@/shared/schemas/slide-model';
import type { BoxSize, DrawerFace, DrawerPart, FieldError, Result, SetupCardKey, SizedBox } from '@/lib/joinery/types';

export type SizeDrawerScheduleResult =
  | { ok: true; parts: DrawerPart[]; box: SizedBox; face: DrawerFace; setupCardKeys: SetupCardKey[]; notes: string[]; warnings: string[] }
  | { ok: false; errors: FieldError[] };

/** Below this gap on each side a front inside its opening rubs or binds: about 1.5 mm is usual [CP]. */
export const MIN_FRONT_REVEAL_MM = 1;

/**
 * Turns a drawer schedule into every part of its boxes, sized exactly, or into one error per field that makes the
 * box impossible. Input is untrusted: it is parsed here. Rules: lib/joinery/RULES.md.
 */
/**
 * Every part of a drawer schedule, or one error per field that makes the box impossible. `lengthText` writes the
 * lengths inside notes and messages (default mm); the parts' numbers are always exact mm.
 */
export function sizeDrawerSchedule(
  input: unknown,
  { lengthText, exactText }: { lengthText?: LengthText; exactText?: LengthText } = {},
): SizeDrawerScheduleResult {
  return withLengthText(lengthText, () => sizeInput(input), exactText);
}

function sizeInput(input: unknown): SizeDrawerScheduleResult {
  const parsed = drawerScheduleSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      errors: parsed.error.issues.map((issue) => ({ path: issue.path.join('.'), message: readableIssue(issue) })),
    };
  }
  return sizeParsedSchedule(parsed.data);
}

/** zod's own wording for a missing or mistyped field ("expected string, received undefined") in the trade's words. */
function readableIssue(issue: { code: string; path: PropertyKey[]; message: string; input?: unknown }): string {
  // Fields with their own message keep it; only zod's generic "Invalid input: …" is reworded.
  if ((issue.code !== 'invalid_type' && issue.code !== 'invalid_union') || !issue.message.startsWith('Invalid input')) return issue.message;
  const field = issue.path.length ? String(issue.path[issue.path.length - 1]) : 'the schedule';
  return issue.input === undefined ? `Give the ${field}: it is missing` : `The ${field} is not what a drawer schedule takes there: check it`;
}

function sizeParsedSchedule(s: DrawerSchedule): SizeDrawerScheduleResult {
  const outside = boxFromOpening(s);
  if (!outside.ok) return outside;
  const t: BoxThickness = { front: s.thickness.front, back: s.thickness.back ?? s.thickness.front, side: s.thickness.side };
  const box = sizedBox(s, outside.box, t);
  const corners = jointCorners(s.joint, t);
  const lipCheck = lipPastBox(s, box);
  const lip = lipCheck.ok ? lipCheck.lip : 0;

  const errors = [
    ...(lipCheck.ok ? [] : lipCheck.errors),
    ...slideModelErrors(s, t),
    ...boxErrors(box, t),
    ...jointErrors(s.joint, t, box.wallHeight),
    ...bottomErrors(s, box, t),
    ...frontStyleErrors(s, corners, t),
  ];
  if (errors.length > 0) return { ok: false, errors };

  const parts: DrawerPart[] = [...wallParts({ s, box, t, corners, lip }), bottomPart(s, box, t)];
  const applied = appliedFrontPart(s);
  if (applied) parts.push(applied);
  const face = drawerFace(s, box, applied ?? parts[0]);

  return {
    ok: true,
    parts,
    box,
    face,
    setupCardKeys: requiredSetupCards(s),
    notes: [...outside.notes, ...scheduleNotes(s, t)],
    warnings: faceWarnings(face),
  };
}

/** The box's inside sizes and wall height from its outside sizes, wall thicknesses and how the bottom is held. */
function sizedBox(s: DrawerSchedule, size: Extract<ReturnType<typeof boxFromOpening>, { ok: true }>['box'], t: BoxThickness): SizedBox {
  return {
    ...size,
    insideWidth: size.width - 2 * t.side,
    insideDepth: size.depth - t.front - t.back,
    wallHeight: size.height - (s.bottom.mount === 'applied' ? s.bottom.thickness : 0),
  };
}

interface WallContext {
  s: DrawerSchedule;
  box: SizedBox;
  t: BoxThickness;
  corners: ReturnType<typeof jointCorners>;
  /** How far a front that hides the slides reaches past the box at each end (0 for a plain front). */
  lip: Mm;
}

/**
 * The four walls: front and back at the box's full width (plus what the joint engages at each end, and the lip of a
 * front that hides the slides), two sides at the inside depth plus their engagement at the front and the back.
 */
function wallParts(c: WallContext): DrawerPart[] {
  const { s, box, t, corners, lip } = c;
  const frontMaterial = s.materials.front ?? s.materials.sides;
  return [
    wallPart(
      c,
      'front',
      box.insideWidth + 2 * corners.front.panelEngagement + 2 * lip,
      [corners.front.panelEngagement, corners.front.panelEngagement],
      t.front,
      frontMaterial,
      lip,
    ),
    wallPart(
      c,
      'back',
      box.insideWidth + 2 * corners.back.panelEngagement,
      [corners.back.panelEngagement, corners.back.panelEngagement],
      t.back,
      s.materials.back ?? frontMaterial,
    ),
    wallPart(
      c,
      'side',
      box.insideDepth + corners.front.sideEngagement + corners.back.sideEngagement,
      [corners.front.sideEngagement, corners.back.sideEngagement],
      t.side,
      s.materials.sides,
    ),
  ];
}

function wallPart(
  { s, box, t, corners, lip }: WallContext,
  role: 'front' | 'back' | 'side',
  length: Mm,
  endEngagement: Mm[],
  thickness: Mm,
  material: string,
  overhang = 0,
): DrawerPart {
  return {
    ...partBase(s, role, role === 'side' ? 2 : 1),
    length,
    width: box.wallHeight,
    thickness,
    material,
    grain: 'along-length',
    jointAllowance: endEngagement[0] + endEngagement[1],
    endEngagement,
    overhang,
    machining: [
      ...(overhang > 0 ? [`Overhangs the box ${mmText(overhang)} at each end to cover the slides.`] : []),
      ...jointMachining(s.joint, role, corners, t, lip),
      ...grooveMachining(s, role),
    ],
  };
}

/**
 * How far a lipped front runs past each side of the box: what its overlay or reveal on the opening leaves after the
 * slides' gap, or the lip given outright. Flush and applied fronts have none.
 */
function lipPastBox(s: DrawerSchedule, box: SizedBox): Result<{ lip: Mm }> {
  const f = s.front;
  if (f.style !== 'lipped') return { ok: true, lip: 0 };
  if (f.fit === 'lip') return { ok: true, lip: f.lip! };
  if (s.size.from !== 'opening')
    return {
      ok: false,
      errors: [
        { path: 'front.fit', message: 'A box given by its own size has no opening to lap or stop short of: give the lip past each side of the box' },
      ],
    };
  const frontWidth = f.fit === 'overlay' ? s.size.width + 2 * f.overlay! : s.size.width - 2 * f.reveal!;
  const lip = (frontWidth - box.width) / 2;
  if (lip <= 0)
    return {
      ok: false,
      errors: [
        {
          path: 'front.reveal',
          message: `With ${specText(f.reveal!)} reveals the front (${mmText(frontWidth)}) is no wider than the box (${mmText(box.width)}), so it hides no slide: use a smaller reveal, or a flush front`,
        },
      ],
    };
  return { ok: true, lip };
}

/** The drawer's face (its box front, or the applied front) against the opening it closes, when there is one. */
function drawerFace(s: DrawerSchedule, box: SizedBox, facePart: DrawerPart): DrawerFace {
  const opening = s.size.from === 'opening' ? { width: s.size.width, height: s.size.height } : null;
  const face = {
    role: facePart.role as DrawerFace['role'],
    width: facePart.length,
    height: facePart.role === 'applied-front' ? facePart.width : box.height,
    opening,
  };
  return { ...face, sideMargin: opening ? (opening.width - face.width) / 2 : null, lipped: s.front.style === 'lipped' };
}

/** A front meant to sit inside its opening with less than a working gap each side will rub or bind. */
function faceWarnings(face: DrawerFace): string[] {
  if (!face.opening || face.sideMargin === null || face.sideMargin < -1e-9 || face.sideMargin >= MIN_FRONT_REVEAL_MM - 1e-9) return [];
  if (!face.lipped && face.role === 'front') return [];
  const gap = Math.max(0, face.sideMargin);
  return [
    `The ${face.role === 'applied-front' ? 'applied front' : 'lipped front'} (${mmText(face.width)}) leaves ${gap === 0 ? 'no gap' : `only ${specText(gap)}`} each side of the ${mmText(face.opening.width)} opening: it will rub or bind. Fronts inside an opening want about 1.5 mm each side; or lap the opening with an overlay.`,
  ];
}

function partBase(s: DrawerSchedule, role: DrawerPart['role'], quantityPerBox: number) {
  return { schedule: s.label, role, quantityPerBox, quantity: quantityPerBox * s.quantity };
}

/** Sides thicker than the chosen slide model is made for cannot be hung on it. */
function slideModelErrors(s: DrawerSchedule, t: BoxThickness): FieldError[] {
  const model = s.slide.type === 'side-mount' || s.slide.type === 'undermount' ? s.slide.model : undefined;
  if (!model || model.maxSideThickness === null || t.side <= model.maxSideThickness + SLIDE_SIDE_TOLERANCE_MM) return [];
  return [
    {
      path: 'thickness.side',
      message: `The ${model.name} takes sides up to ${specText(model.maxSideThickness)}; these are ${specText(t.side)}: use thinner sides or another slide`,
    },
  ];
}

function boxErrors(box: SizedBox, t: BoxThickness): FieldError[] {
  const errors: FieldError[] = [];
  if (box.insideWidth <= 0)
    errors.push({ path: 'thickness.side', message: `Two ${mmText(t.side)} sides fill the whole box width (${mmText(box.width)})` });
  if (box.insideDepth <= 0)
    errors.push({
      path: 'thickness.front',
      message: `The front and back (${mmText(t.front + t.back)}) fill the whole box depth (${mmText(box.depth)})`,
    });
  if (box.wallHeight <= 0)
    errors.push({ path: 'bottom.thickness', message: `The applied bottom is as thick as the box is tall (${mmText(box.height)})` });
  return errors;
}

function bottomErrors(s: DrawerSchedule, box: SizedBox, t: BoxThickness): FieldError[] {
  const errors: FieldError[] = [];
  const { bottom, slide } = s;
  if (bottom.mount === 'applied') {
    if (slide.type === 'undermount')
      errors.push({ path: 'bottom.mount', message: 'Undermount slides need the bottom recessed in a groove, not applied under the box' });
    return errors;
  }
  const g = bottom.groove;
  const thinnest = Math.min(t.side, t.front, t.back);
  if (g.depth >= thinnest)
    errors.push({
      path: 'bottom.groove.depth',
      message: `The groove (${mmText(g.depth)} deep) must be shallower than the thinnest wall (${mmText(thinnest)})`,
    });
  if (bottom.thickness > g.width)
    errors.push({
      path: 'bottom.thickness',
      message: `The bottom (${mmText(bottom.thickness)}) is thicker than its groove is wide (${mmText(g.width)})`,
    });
  if (g.height + g.width >= box.wallHeight)
    errors.push({
      path: 'bottom.groove.height',
      message: `The groove (${mmText(g.height)} up, ${mmText(g.width)} wide) does not fit in a ${mmText(box.wallHeight)} tall box`,
    });
  if (g.clearance >= 2 * g.depth)
    errors.push({
      path: 'bottom.groove.clearance',
      message: `With ${mmText(g.clearance)} of clearance the bottom would not reach into ${mmText(g.depth)} deep grooves`,
    });
  const recess = slide.type === 'undermount' ? (slide.model?.bottomRecess ?? slide.bottomRecess) : 0;
  if (slide.type === 'undermount' && g.height < recess - 1e-9)
    errors.push({
      path: 'bottom.groove.height',
      message: `${slide.model ? `The ${slide.model.name}` : 'Undermount slides'} need the bottom at least ${specText(recess)} up; the groove is ${specText(g.height)} up`,
    });
  return errors;
}

function frontStyleErrors(s: DrawerSchedule, corners: JointCorners, t: BoxThickness): FieldError[] {
  const f = s.front;
  if (f.style === 'lipped') {
    // A lip extends the front past the side; only a joint that hides the side's end behind the front allows it.
    const frontCoversSide = corners.front.panelEngagement >= t.side && corners.front.sideEngagement < t.front;
    return frontCoversSide
      ? []
      : [
          {
            path: 'front.style',
            message: `A ${JOINT_NAMES[s.joint.method]} shows the side's end on the front; a lipped front needs a joint that hides it (lock rabbet, half-blind dovetail, or a butt joint with the front full width), or use an applied front`,
          },
        ];
  }
  if (f.style === 'applied' && s.size.from === 'box') {
    const missing: FieldError[] = [];
    if (f.width === undefined) missing.push({ path: 'front.width', message: 'Give the applied front width, or size the schedule from its opening' });
    if (f.height === undefined)
      missing.push({ path: 'front.height', message: 'Give the applied front height, or size the schedule from its opening' });
    return missing;
  }
  if (f.style === 'applied' && f.fit === 'inset' && s.size.from === 'opening') {
    const smaller = Math.min(s.size.width, s.size.height);
    if (2 * f.reveal >= smaller)
      return [{ path: 'front.reveal', message: `Reveals of ${mmText(f.reveal)} leave no front in a ${mmText(smaller)} opening` }];
  }
  return [];
}

function grooveMachining(s: DrawerSchedule, role: 'front' | 'back' | 'side'): string[] {
  if (s.bottom.mount !== 'groove') return [];
  const g = s.bottom.groove;
  const stopped = role === 'side' && s.joint.method !== 'lock-rabbet' && s.joint.method !== 'rabbet-and-dado';
  return [
    `Bottom groove ${mmText(g.width)} wide × ${mmText(g.depth)} deep along the inside face, its lower edge ${mmText(g.height)} above the bottom edge${stopped ? '; stop it or hide it in a joint where it would show at the ends' : ''}.`,
  ];
}

function bottomPart(s: DrawerSchedule, box: SizedBox, t: BoxThickness): DrawerPart {
  const base = {
    ...partBase(s, 'bottom', 1),
    thickness: s.bottom.thickness,
    material: s.bottom.material,
    grain: s.bottom.grain,
    endEngagement: [],
    overhang: 0,
  };
  if (s.bottom.mount === 'applied') {
    return {
      ...base,
      length: box.width,
      width: box.depth,
      jointAllowance: 2 * t.side,
      machining: ['Applied under the box, flush with its outside faces; glue and fasten.'],
    };
  }
  const reach = 2 * s.bottom.groove.depth - s.bottom.groove.clearance;
  return {
    ...base,
    // Length runs side to side, so a solid-wood bottom moves front to back, where the grooves leave room.
    length: box.insideWidth + reach,
    width: box.insideDepth + reach,
    jointAllowance: reach,
    machining: [`Captured in the grooves on all four sides with ${mmText(s.bottom.groove.clearance)} total play each way.`],
  };
}

function appliedFrontPart(s: DrawerSchedule): DrawerPart | null {
  const f = s.front;
  if (f.style !== 'applied') return null;
  const opening: BoxSize | null = s.size.from === 'opening' ? s.size : null;
  const fromOpening = (o: BoxSize) =>
    f.fit === 'overlay'
      ? { w: o.width + 2 * f.overlay.side, h: o.height + f.overlay.top + f.overlay.bottom }
      : { w: o.width - 2 * f.reveal, h: o.height - 2 * f.reveal };
  const derived = opening ? fromOpening(opening) : null;
  // frontStyleErrors has made sure an explicit size exists when there is no opening.
  const length = f.width ?? derived!.w;
  const width = f.height ?? derived!.h;
  return {
    ...partBase(s, 'applied-front', 1),
    length,
    width,
    thickness: f.thickness,
    material: f.material,
    grain: 'along-length',
    jointAllowance: 0,
    endEngagement: [],
    overhang: 0,
    machining: [
      f.fit === 'overlay'
        ? `Overlay front: laps the opening ${mmText(f.overlay.side)} each side, ${mmText(f.overlay.top)} top, ${mmText(f.overlay.bottom)} bottom; screwed on from inside the box.`
        : `Inset front: ${mmText(f.reveal)} reveal on each edge; screwed on from inside the box.`,
    ],
  };
}

function scheduleNotes(s: DrawerSchedule, t: BoxThickness): string[] {
  const notes: string[] = [];
  const model = s.slide.type === 'side-mount' || s.slide.type === 'undermount' ? s.slide.model : undefined;
  if (model && s.size.from === 'box' && !model.lengths.some((l) => Math.abs(l - s.size.depth) < 0.5))
    notes.push(
      `The box is ${mmText(s.size.depth)} long, and the ${model.name} comes ${model.lengths.map(specText).join(', ')} long: a box on it is usually as long as its slide.`,
    );
  // Without a model there is no maker's limit to hold the sides to, only the usual one.
  if (s.slide.type === 'undermount' && !s.slide.model && t.side > UNDERMOUNT_MAX_SIDE + SLIDE_SIDE_TOLERANCE_MM)
    notes.push(
      `Undermount slides are usually made for sides up to ${specText(UNDERMOUNT_MAX_SIDE)}; check the maker's spec for ${specText(t.side)} sides, or choose a slide model.`,
    );
  if (s.joint.method === 'butt-pocket-screw' && Math.min(t.side, t.front, t.back) < POCKET_SCREW_MIN_STOCK)
    notes.push(`Pocket-screw jigs usually need stock at least ${mmText(POCKET_SCREW_MIN_STOCK)} thick; check the jig.`);
  if (s.joint.method === 'butt-loose-tenon') {
    const tenons = 4 * s.joint.tenonsPerCorner * s.quantity;
    notes.push(
      `${tenons} loose tenons ${mmText(s.joint.tenonThickness)} thick, each ${mmText(2 * s.joint.mortiseDepth)} long, cut from tenon stock.`,
    );
  }
  if (s.front.style === 'applied' && s.size.from === 'opening' && s.front.fit === 'overlay')
    notes.push('Fronts stacked in one carcass want 3 mm between them: lower the top or bottom overlay by half of that where two fronts meet.');
  return notes;
}
