import { z } from 'zod';
import { parseMoneyCents } from '@/lib/stock/stock-csv';

/** Money as typed in a form ("94", "94.50", "$94.50"), to whole cents; empty is 0. */
export const moneyInput = z.string().transform((v, ctx) => {
  const cents = v.trim() ? parseMoneyCents(v) : 0;
  if (cents === null) {
    ctx.addIssue({ code: 'custom', message: 'Enter an amount such as 94.00.' });
    return z.NEVER;
  }
  return cents;
});

/** A count typed in a form. */
export const wholeInput = (min: number) => z.coerce.number<string | number>({ error: 'Enter a whole number.' }).int('Enter a whole number.').min(min);

/** Cents as a form shows them for editing: 9400 → "94.00". */
export const centsForInput = (cents: number) => (cents / 100).toFixed(2);
