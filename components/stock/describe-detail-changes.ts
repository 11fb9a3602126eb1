import type { StockDetailChanges } from '@/shared/wire/stock';
import { STOCK_DETAIL_FIELDS, type StockDetailField } from '@/shared/schemas/stock';

const LABELS: Record<StockDetailField, string> = {
  material: 'Material',
  nominalThickness: 'Thickness called',
  surfacing: 'Surfacing',
  grade: 'Grade',
  costCents: 'Cost',
  supplier: 'Supplier',
  location: 'Location',
  lowStockAt: 'Low-stock mark',
  buyable: 'Can buy more',
};

/**
 * A detail change in words for the history: "Location Rack B1 → Rack B2; Cost $94.00 → $99.00". Without a money
 * formatter (people who may not see prices) a cost change is named without its figures.
 */
export function describeDetailChanges(changes: StockDetailChanges, money: ((cents: number) => string) | null): string {
  const show = (field: StockDetailField, value: unknown) => {
    if (value === undefined || value === null || value === '') return '—';
    if (field === 'buyable') return value ? 'yes' : 'no';
    if (field === 'costCents' && money && typeof value === 'number') return money(value);
    return String(value);
  };
  return STOCK_DETAIL_FIELDS.flatMap((field) => {
    const change = changes[field];
    if (!change) return [];
    if (field === 'costCents' && !money) return ['Cost changed'];
    return [`${LABELS[field]} ${change.from === undefined ? '' : `${show(field, change.from)} → `}${show(field, change.to)}`];
  }).join('; ');
}
