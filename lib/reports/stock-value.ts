/**
 * Stock value over time, rebuilt from the movement ledger rather than a stored running total: each period's
 * closing count of every stock size and offcut is the sum of its movements up to the period's end, valued at the
 * piece's cost today (the stock room keeps no price history). On hand and reserved are rebuilt alike.
 */

/** The net change of one piece's counts within one period (`period` is the period's first day). */
export interface LedgerChange {
  period: string;
  pieceId: string;
  onHand: number;
  reserved: number;
}

export interface ValuedPiece {
  id: string;
  material: string;
  /** Minor units per piece. */
  costEach: number;
}

export interface StockValuePoint {
  period: string;
  onHandCents: number;
  reservedCents: number;
  byMaterial: Record<string, number>;
}

/**
 * Closing values for each of `periods` (sorted period starts). Changes dated before the first period make the
 * opening balance; changes after the last are ignored. A piece the ledger names but `pieces` lacks is reported,
 * never silently valued at zero.
 */
export function stockValueOverTime(
  periods: readonly string[],
  changes: readonly LedgerChange[],
  pieces: readonly ValuedPiece[],
): { points: StockValuePoint[]; unknownPieces: string[] } {
  const byId = new Map(pieces.map((p) => [p.id, p]));
  const unknown = new Set<string>();
  const sorted = [...changes].sort((a, b) => a.period.localeCompare(b.period));
  const count = new Map<string, { onHand: number; reserved: number }>();
  const points: StockValuePoint[] = [];
  let next = 0;
  for (const period of periods) {
    while (next < sorted.length && sorted[next].period <= period) {
      const c = sorted[next++];
      if (!byId.has(c.pieceId)) unknown.add(c.pieceId);
      const had = count.get(c.pieceId) ?? { onHand: 0, reserved: 0 };
      count.set(c.pieceId, { onHand: had.onHand + c.onHand, reserved: had.reserved + c.reserved });
    }
    let onHandCents = 0;
    let reservedCents = 0;
    const byMaterial: Record<string, number> = {};
    for (const [id, n] of count) {
      const piece = byId.get(id);
      if (!piece) continue;
      onHandCents += n.onHand * piece.costEach;
      reservedCents += n.reserved * piece.costEach;
      byMaterial[piece.material] = (byMaterial[piece.material] ?? 0) + n.onHand * piece.costEach;
    }
    points.push({ period, onHandCents, reservedCents, byMaterial });
  }
  return { points, unknownPieces: [...unknown].sort() };
}

/** The stock value report's CSV: one line per period, then one column per material (on hand). */
export function stockValueCsv(
  points: readonly StockValuePoint[],
  currency: string,
  unparse: (rows: { fields: string[]; data: string[][] }) => string,
): string {
  const decimals = new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  const money = (minor: number) => (minor / 10 ** decimals).toFixed(decimals);
  const materials = [...new Set(points.flatMap((p) => Object.keys(p.byMaterial)))].sort();
  const fields = ['Period from', `On hand (${currency})`, `Reserved (${currency})`, ...materials.map((m) => `${m} on hand (${currency})`)];
  return unparse({
    fields,
    data: points.map((p) => [p.period, money(p.onHandCents), money(p.reservedCents), ...materials.map((m) => money(p.byMaterial[m] ?? 0))]),
  });
}
