/**
 * Every key that carries money, anywhere in a plan, a stock row, an offcut or a finishing result: cost, costEach,
 * costCents, valueCents, and any price… or amount… a later feature adds (not a drawer front's lip amount).
 */
const PRICE_KEY = /^(cost|price|amount)|cents$/i;

export const isPriceKey = (key: string) => PRICE_KEY.test(key);

/** Cutters never see prices: a copy of anything leaving the server with every money field removed, at any depth. */
export function withoutPrices<T>(value: T): T {
  return JSON.parse(JSON.stringify(value, (key, v) => (key !== '' && PRICE_KEY.test(key) ? undefined : v)));
}
