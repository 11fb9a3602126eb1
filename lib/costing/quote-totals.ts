import { assertMinor, divideRounded, maxMinor, toSteps } from './money';

/** What a quote line is: markup applies to material and hardware; labour is sold at its hourly rate. */
export const LINE_KINDS = ['material', 'hardware', 'labour', 'other'] as const;
export type LineKind = (typeof LINE_KINDS)[number];

/** The most of anything one line may count (sheets, pairs, hours, m²). */
export const MAX_QUANTITY = 1_000_000;
/** Percentages are typed with at most two decimals; a markup may pass 100 % (up to 1000 %), the others may not. */
export const MAX_MARKUP_PERCENT = 1000;

export interface QuoteLineInput {
  kind: LineKind;
  /** How many (up to three decimals: 2.35 h, 4.125 m²). */
  quantity: number;
  /** Cost of one unit in minor units (what the shop pays, or the hourly rate for labour). */
  unitCostMinor: number;
  taxable: boolean;
}

export interface QuoteTotalsInput {
  currency: string;
  lines: QuoteLineInput[];
  /** Percent added to the cost of material lines, and of hardware lines. */
  markupPercent: { material: number; hardware: number };
  /** Off the subtotal: a percent, or a fixed amount in minor units. */
  discount: { kind: 'percent'; percent: number } | { kind: 'amount'; minor: number };
  /** Sales tax on the taxable lines, after their share of the discount. */
  taxPercent: number;
  /** Deposit asked on acceptance: percent of the total (50 % by default). */
  depositPercent: number;
}

export interface PricedLine {
  /** quantity × unit cost, rounded to the minor unit (step 1). */
  costMinor: number;
  /** Markup on the line's cost, rounded (step 2); 0 for labour and other lines. */
  markupMinor: number;
  /** costMinor + markupMinor: what the customer pays for the line before discount and tax. */
  priceMinor: number;
  /** The price of one unit as printed (price ÷ quantity, rounded): shown only, never summed. */
  unitPriceMinor: number;
}

export interface QuoteTotals {
  lines: PricedLine[];
  /** Sum of the line prices. */
  subtotalMinor: number;
  /** Rounded once (step 3); never more than the subtotal. */
  discountMinor: number;
  /** Taxable lines' prices less their share of the discount, rounded (step 4). */
  taxableMinor: number;
  /** taxableMinor × tax percent, rounded (step 5). */
  taxMinor: number;
  /** subtotal − discount + tax. */
  totalMinor: number;
  /** total × deposit percent, rounded to the minor unit (step 6). */
  depositMinor: number;
  /** total − deposit, so the two always add up to the total. */
  balanceMinor: number;
  /** The estimator's figures, never the customer's: cost of the lines and what is left over it before tax. */
  costMinor: number;
  marginMinor: number;
  /** Margin as a percent of the price before tax, to one decimal (null when that price is 0). */
  marginPercent: number | null;
}

/** A percent with at most two decimals, as hundredths of a percent (basis points): 8.25 % → 825. */
export function percentToBasisPoints(percent: number, what: string, max = 100): number {
  return toSteps(percent, 2, what, { max });
}

/** Quantities with at most three decimals, as thousandths. */
export const quantityToThousandths = (quantity: number, what = 'A quantity') => toSteps(quantity, 3, what, { max: MAX_QUANTITY });

/** Step 1: a line's cost = quantity × unit cost, rounded half up to the minor unit. */
export function lineCost(quantity: number, unitCostMinor: number, currency: string): number {
  const q = quantityToThousandths(quantity);
  assertMinor(unitCostMinor, 'A unit cost', currency);
  const product = q * unitCostMinor;
  if (!Number.isSafeInteger(product)) throw new RangeError(`A line of ${quantity} × ${unitCostMinor} is too large to price exactly.`);
  return assertMinor(divideRounded(product, 1000), 'A line total', currency);
}

/** Step 2: markup on a cost, rounded half up. */
export function markupOn(costMinor: number, markupPercent: number, currency: string): number {
  assertMinor(costMinor, 'A cost', currency);
  const bp = percentToBasisPoints(markupPercent, 'A markup', MAX_MARKUP_PERCENT);
  return assertMinor(divideRounded(costMinor * bp, 10_000), 'A markup', currency);
}

/** A share of an amount at a percent (basis points), rounded half up: the tax and deposit steps. */
export function percentOf(amountMinor: number, percent: number, what: string, currency: string): number {
  assertMinor(amountMinor, 'An amount', currency);
  const bp = percentToBasisPoints(percent, what);
  return divideRounded(amountMinor * bp, 10_000);
}

/** Step 6: the deposit (percent of the total, rounded to the minor unit) and the balance that makes up the rest. */
export function depositAndBalance(totalMinor: number, depositPercent: number, currency: string): { depositMinor: number; balanceMinor: number } {
  const depositMinor = percentOf(totalMinor, depositPercent, 'A deposit', currency);
  return { depositMinor, balanceMinor: totalMinor - depositMinor };
}

/** Prices every line and totals the quote, in the order and with the rounding of RULES.md. */
export function quoteTotals(input: QuoteTotalsInput): QuoteTotals {
  if (!input || typeof input !== 'object' || !Array.isArray(input.lines)) throw new RangeError('A quote needs a list of lines.');
  const { currency } = input;
  if (input.lines.length > 500) throw new RangeError(`A quote of ${input.lines.length} lines is over 500: split the job.`);
  const markups = input.markupPercent ?? ({} as never);
  const lines = input.lines.map((line, i): PricedLine => {
    if (!line || !(LINE_KINDS as readonly string[]).includes(line.kind))
      throw new RangeError(`Line ${i + 1} has no kind (material, hardware, labour or other).`);
    const costMinor = lineCost(line.quantity, line.unitCostMinor, currency);
    const percent = line.kind === 'material' ? markups.material : line.kind === 'hardware' ? markups.hardware : 0;
    const markupMinor = markupOn(costMinor, percent, currency);
    const priceMinor = assertMinor(costMinor + markupMinor, `Line ${i + 1}`, currency);
    const q = quantityToThousandths(line.quantity);
    return { costMinor, markupMinor, priceMinor, unitPriceMinor: q === 0 ? 0 : divideRounded(priceMinor * 1000, q) };
  });
  const subtotalMinor = assertMinor(
    lines.reduce((n, l) => n + l.priceMinor, 0),
    'The subtotal',
    currency,
  );
  const costMinor = lines.reduce((n, l) => n + l.costMinor, 0);

  const discount = input.discount ?? { kind: 'amount', minor: 0 };
  let discountMinor: number;
  if (discount.kind === 'percent') discountMinor = percentOf(subtotalMinor, discount.percent, 'A discount', currency);
  else if (discount.kind === 'amount') discountMinor = assertMinor(discount.minor, 'A discount', currency);
  else throw new RangeError('A discount is a percent or an amount.');
  if (discountMinor > subtotalMinor) throw new RangeError(`A discount of ${discountMinor} is more than the subtotal of ${subtotalMinor}.`);

  const taxableSubtotal = input.lines.reduce((n, line, i) => n + (line.taxable ? lines[i].priceMinor : 0), 0);
  // Step 4: the taxable lines carry the discount in proportion to their share of the subtotal.
  const taxableDiscount = subtotalMinor === 0 ? 0 : divideRounded(discountMinor * taxableSubtotal, subtotalMinor);
  const taxableMinor = taxableSubtotal - taxableDiscount;
  const taxMinor = percentOf(taxableMinor, input.taxPercent, 'A sales tax', currency);
  const totalMinor = assertMinor(subtotalMinor - discountMinor + taxMinor, 'The total', currency);
  const { depositMinor, balanceMinor } = depositAndBalance(totalMinor, input.depositPercent, currency);
  const beforeTax = subtotalMinor - discountMinor;
  const marginMinor = beforeTax - costMinor;
  const marginPercent = beforeTax === 0 ? null : divideRounded(marginMinor * 1000, beforeTax) / 10;
  if (!Number.isFinite(maxMinor(currency))) throw new RangeError('Unknown currency.');
  return {
    lines,
    subtotalMinor,
    discountMinor,
    taxableMinor,
    taxMinor,
    totalMinor,
    depositMinor,
    balanceMinor,
    costMinor,
    marginMinor,
    marginPercent,
  };
}
