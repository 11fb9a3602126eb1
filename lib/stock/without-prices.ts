/** Cutters never see prices: strip every money field from a row before it leaves the server. */
export function withoutPrices<T extends Record<string, unknown>>(row: T): Omit<T, 'costCents' | 'valueCents'> {
  const { costCents: _c, valueCents: _v, ...rest } = row;
  return rest;
}
