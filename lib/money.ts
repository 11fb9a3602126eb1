/** Money is kept in minor units (cents) as integers; shown in the shop's currency. */
export function formatMoney(cents: number, currency: string, locale = 'en-US'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(cents / 100);
}
