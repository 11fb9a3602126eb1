import { divideRounded, toSteps } from './money';

/** The shop's labour figures (Shop settings), in minutes with at most two decimals. */
export interface LabourRates {
  minutesPerCut: number;
  minutesPerPiece: number;
  setupMinutesPerCard: number;
  minutesPerJointCorner: number;
  assemblyMinutesPerBox: number;
  /** Minutes per square metre of part faces; null leaves finishing off the quote. */
  finishingMinutesPerM2: number | null;
}

/** What the job asks of the shop, counted from its plan and its joinery. */
export interface LabourCounts {
  /** Saw cuts in the chosen plan (rips and crosscuts). */
  cuts: number;
  /** Stock pieces (sheets, boards, offcuts) the saw handles. */
  piecesHandled: number;
  /** Setup cards the job's joinery needs (each one a machine setup). */
  setupCards: number;
  /** Joint corners of the drawer boxes. */
  jointCorners: number;
  drawerBoxes: number;
  /** Area of part faces to finish, in mm² (both faces if the shop finishes both: the caller decides). */
  faceAreaMm2: number;
}

/** One labour line: minutes worked out exactly (in hundredths of a minute) and the hours printed (to 0.01 h). */
export interface LabourLine {
  kind: 'saw' | 'machining' | 'assembly' | 'finishing';
  /** Hundredths of a minute, exact: counts × minutes. */
  centiMinutes: number;
  /** Hours to two decimals, rounded half up from the minutes (step L1): what is printed and priced. */
  hours: number;
  /** For finishing: the face area in m², rounded to 0.01 m² first (step L0). */
  areaM2?: number;
}

/** Past these a count is a slip, not a job. */
export const MAX_COUNT = 1_000_000;
export const MAX_MINUTES_PER_UNIT = 10_000;
/** 10,000 m² of faces. */
export const MAX_FACE_AREA_MM2 = 1e10;

const count = (n: number, what: string) => toSteps(n, 0, what, { max: MAX_COUNT, integerOnly: true });
const minutes = (n: number, what: string) => toSteps(n, 2, what, { max: MAX_MINUTES_PER_UNIT });

/** Step L1: hundredths of a minute to hundredths of an hour (÷ 60, rounded half up), then hours. */
export const hoursFromCentiMinutes = (centiMinutes: number) => divideRounded(centiMinutes, 60) / 100;

/**
 * Labour for a job (RULES.md "Labour"): saw = cuts × minutes per cut + pieces handled × minutes per piece;
 * machining = setup cards × setup minutes + joint corners × minutes per corner; assembly = boxes × minutes per box;
 * finishing (only when the shop sets a rate) = face area (m², to 0.01) × minutes per m².
 */
export function labourLines(counts: LabourCounts, rates: LabourRates): LabourLine[] {
  if (!counts || !rates) throw new RangeError('Labour needs the job’s counts and the shop’s rates.');
  const line = (kind: LabourLine['kind'], centiMinutes: number, extra: Partial<LabourLine> = {}): LabourLine => {
    if (!Number.isSafeInteger(centiMinutes)) throw new RangeError(`The ${kind} time is too large to work out exactly.`);
    return { kind, centiMinutes, hours: hoursFromCentiMinutes(centiMinutes), ...extra };
  };
  const saw =
    count(counts.cuts, 'Cuts') * minutes(rates.minutesPerCut, 'Minutes per cut') +
    count(counts.piecesHandled, 'Pieces handled') * minutes(rates.minutesPerPiece, 'Minutes per piece');
  const machining =
    count(counts.setupCards, 'Setup cards') * minutes(rates.setupMinutesPerCard, 'Setup minutes per card') +
    count(counts.jointCorners, 'Joint corners') * minutes(rates.minutesPerJointCorner, 'Minutes per joint corner');
  const assembly = count(counts.drawerBoxes, 'Drawer boxes') * minutes(rates.assemblyMinutesPerBox, 'Assembly minutes per box');
  const lines = [line('saw', saw), line('machining', machining), line('assembly', assembly)];
  if (rates.finishingMinutesPerM2 !== null && rates.finishingMinutesPerM2 !== undefined) {
    const area = counts.faceAreaMm2;
    if (typeof area !== 'number' || !Number.isFinite(area) || area < 0)
      throw new RangeError(`A face area must be a finite area, not negative; got ${String(area)}.`);
    if (area > MAX_FACE_AREA_MM2) throw new RangeError(`A face area over 10,000 m² looks like a slipped unit.`);
    // Step L0: the area in hundredths of a m² (1 m² = 10⁶ mm²), rounded half up.
    const centiM2 = Math.round(area / 10_000);
    lines.push(
      line('finishing', divideRounded(centiM2 * minutes(rates.finishingMinutesPerM2, 'Finishing minutes per m²'), 100), { areaM2: centiM2 / 100 }),
    );
  }
  return lines;
}
