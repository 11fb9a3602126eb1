/**
 * A size runs low when what is free (on hand less reserved) is at or below the shop's mark. A mark of 0 means the
 * shop does not watch that size.
 */
export function isLowStock({ onHand, reserved, lowStockAt }: { onHand: number; reserved: number; lowStockAt: number }): boolean {
  return lowStockAt > 0 && onHand - reserved <= lowStockAt;
}
