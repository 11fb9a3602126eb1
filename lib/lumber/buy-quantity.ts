/**
 * A quotient such as 70 / 0.7 = 100.00000000000001 counts as whole and is not bumped up a unit. The slack is relative,
 * so a need of a billionth still buys one unit rather than none.
 */
const CEILING_SLACK = 1e-12;

export interface BuyQuantity {
  /** need / (1 − waste), unrounded. */
  exact: number;
  /** `exact` rounded up to the buying step: never buy short. */
  buy: number;
}

/**
 * How much to buy so that `need` is left once `waste` (a fraction of what is bought) is gone:
 * buy = need / (1 − waste). 100 BF at 30 % waste is 142.86, bought as 143. This is not need × (1 + waste),
 * which under-buys (130 here).
 */
export function buyQuantity(need: number, waste: number, { step = 1 }: { step?: number } = {}): BuyQuantity {
  if (!(need >= 0) || !Number.isFinite(need)) throw new RangeError(`The quantity needed must be zero or more (got ${need}).`);
  if (!(waste >= 0 && waste < 1)) throw new RangeError(`The waste factor is a fraction from 0 to below 1 (got ${waste}).`);
  if (!(step > 0) || !Number.isFinite(step)) throw new RangeError(`The buying step must be a finite number greater than zero (got ${step}).`);
  const exact = need / (1 - waste);
  const buy = Math.ceil((exact / step) * (1 - CEILING_SLACK)) * step;
  // A need near the largest number, or a step so fine the count overflows, has no quantity to buy.
  if (!Number.isFinite(exact) || !Number.isFinite(buy) || exact / step > Number.MAX_SAFE_INTEGER)
    throw new RangeError(`Cannot buy ${need} at ${waste} waste in steps of ${step}: check the numbers.`);
  return { exact, buy };
}
