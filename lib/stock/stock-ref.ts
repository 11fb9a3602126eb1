/**
 * Stock ids in a nesting request name where the piece comes from, so a plan can be traced back to the rack:
 * `stock:<stock item id>` (on hand), `buy:<stock item id>` (more of that size, bought), `offcut:<offcut id>`.
 */
export interface StockRef {
  source: 'stock' | 'buy' | 'offcut';
  id: string;
}

export const stockRef = {
  onHand: (id: string) => `stock:${id}`,
  buy: (id: string) => `buy:${id}`,
  offcut: (id: string) => `offcut:${id}`,
  parse(ref: string): StockRef | null {
    const m = /^(stock|buy|offcut):([0-9a-f-]{36})$/.exec(ref);
    return m ? { source: m[1] as StockRef['source'], id: m[2] } : null;
  },
};
