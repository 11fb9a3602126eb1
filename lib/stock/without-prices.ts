/** Every key that carries money, anywhere in a plan, a stock row or a finishing result. */
const PRICE_KEYS = new Set(['cost', 'costEach', 'costCents', 'valueCents']);

/** Cutters never see prices: a copy of anything leaving the server with every money field removed, at any depth. */
export function withoutPrices<T>(value: T): T {
  return JSON.parse(JSON.stringify(value, (key, v) => (PRICE_KEYS.has(key) ? undefined : v)));
}
