import { quoteLength, quoteNominal } from '@/lib/quotes/quote-text';
import type { ShopUnits } from '@/shared/schemas/units';
import type { DescribedSize, PurchaseOrderStatus } from '@/shared/wire/buying';

export type { DescribedSize };

/**
 * A stock size as a purchase order writes it, in the shop's unit with quarters as glyphs (the screen and the PDF's
 * font both carry them): "Baltic birch ¾″, 60″ × 60″", "White oak 4/4 S2S FAS, 96″ × 6½″", "MDF 18 mm, 2440 mm × 1220 mm".
 */
export function describeSize(s: DescribedSize, units: ShopUnits): string {
  const len = (mm: number) => quoteLength(mm, units);
  const thick = s.nominalThickness ? quoteNominal(s.nominalThickness) : len(s.thickness);
  const board = s.kind === 'board' ? [s.surfacing, s.grade].filter(Boolean).join(' ') : '';
  return `${s.material} ${thick}${board ? ` ${board}` : ''}, ${len(s.length)} × ${len(s.width)}`;
}

/** The unit a line's cost is per: each sheet or board, or per board foot for boards. */
export const costUnit = (kind: 'sheet' | 'board') => (kind === 'board' ? 'bd ft' : 'sheet');

/** PO-0007. */
export const poNumber = (n: number) => `PO-${String(n).padStart(4, '0')}`;

export const PO_STATUS_LABELS = {
  draft: 'Draft',
  sent: 'Sent',
  'part-received': 'Part received',
  received: 'Received',
  cancelled: 'Cancelled',
} as const satisfies Record<PurchaseOrderStatus, string>;
export type PoStatus = PurchaseOrderStatus;
