/**
 * Kerfwise's canonical length unit is the millimetre, as a plain number.
 * Every length stored, computed or sent between server, client and worker is in mm;
 * conversion to the shop's unit happens only when parsing input and formatting output.
 */
export type Mm = number;

/** Exactly 25.4 mm to the inch (NIST SP 811; 1959 international yard and pound agreement). */
export const MM_PER_INCH = 25.4;

export const inches = (n: number): Mm => n * MM_PER_INCH;
export const toInches = (mm: Mm): number => mm / MM_PER_INCH;
