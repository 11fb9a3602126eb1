/**
 * Distinct values for test fixtures without randomness: a counter per test process. Two rows made from it never
 * collide, and a failing run repeats exactly.
 */
let counter = 0;

/** 1, 2, 3, … within this test process. */
export const nextNumber = () => ++counter;

/** An e-mail address no other fixture of this process uses. */
export const uniqueEmail = (prefix = 'person') => `${prefix}-${nextNumber()}@example.com`;

/** A stock thickness in mm that no other fixture of this process uses, each a whole millimetre apart (far beyond
 *  the setup-card tolerance of 0.1 mm). */
export const uniqueThickness = () => 5 + nextNumber();
