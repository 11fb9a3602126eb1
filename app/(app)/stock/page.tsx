import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { listDetailChanges, listMovements, listOffcuts, listStock, stockValue } from '@/db/queries/stock';
import { MovementHistory } from '@/components/stock/movement-history';
import { OffcutRack } from '@/components/stock/offcut-rack';
import { StockFilters } from '@/components/stock/stock-filters';
import { StockRoomActions } from '@/components/stock/stock-room-actions';
import { StockTable } from '@/components/stock/stock-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FigureCard } from '@/components/ui/figure-card';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';
import { can } from '@/lib/auth/permissions';
import { formatLength } from '@/lib/units/format-length';
import { formatMoney } from '@/lib/money';
import { stockFilterSchema } from '@/shared/schemas/stock';

export const metadata: Metadata = { title: 'Stock room' };

const VIEWS = [
  { id: 'stock', label: 'Sheets and boards' },
  { id: 'rack', label: 'Offcut rack' },
  { id: 'history', label: 'History' },
] as const;

export default async function StockPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('stock:read');
  const raw = await searchParams;
  const view = VIEWS.find((v) => v.id === raw.view)?.id ?? 'stock';
  const parsed = stockFilterSchema.safeParse(Object.fromEntries(Object.entries(raw).filter(([, v]) => typeof v === 'string' && v !== '')));
  const filter = parsed.success ? parsed.data : {};
  // One size's history: /stock?view=history&item=<id>
  const historyItem = typeof raw.item === 'string' && /^[0-9a-f-]{36}$/.test(raw.item) ? raw.item : undefined;
  const db = await getDb();
  const scope = scopeOf(db, user);
  const showPrices = can(user.role, 'prices:read');
  const [settings, allItems, items, rack, movements, changes, value] = await Promise.all([
    getShopSettings(scope),
    listStock(scope),
    view === 'stock' ? listStock(scope, filter) : [],
    view === 'rack' ? listOffcuts(scope, filter) : [],
    view === 'history' ? listMovements(scope, { stockItemId: historyItem }) : [],
    view === 'history' ? listDetailChanges(scope, { stockItemId: historyItem }) : [],
    showPrices ? stockValue(scope) : null,
  ]);
  if (!settings) return null;
  const len = (mm: number) => formatLength(mm, settings.units);
  const thick = (mm: number) => exactLengthText(mm, settings.units);
  const money = showPrices ? (cents: number) => formatMoney(cents, settings.currency) : null;
  const lowCount = allItems.filter((i) => i.low).length;
  const materials = [...new Set(allItems.map((i) => i.material))].sort();
  const locations = [...new Set(allItems.map((i) => i.location).filter(Boolean))].sort();

  return (
    <>
      <PageHeader
        title="Stock room"
        lead="Sheets, boards and offcuts on the rack. Released plans reserve what they use; finished plans take it and rack their offcuts."
      />
      <div className="mb-5 grid gap-3 sm:grid-cols-3">
        {value && money && (
          <FigureCard
            label="Stock value at cost"
            value={money(value.totalCents)}
            detail={`${money(value.stockCents)} in sheets and boards · ${money(value.offcutCents)} in offcuts`}
            testId="stock-value"
          />
        )}
        <FigureCard label="Sizes running low" value={lowCount} tone={lowCount ? 'text-amber' : ''} detail="free count at or below the size’s mark" />
      </div>

      <StockRoomActions units={settings.units} canWrite={can(user.role, 'stock:write')} canRecord={can(user.role, 'offcuts:record')} />

      <nav aria-label="Stock room views" className="mb-4 flex gap-1 border-b border-paper-edge">
        {VIEWS.map((v) => (
          <Link
            key={v.id}
            href={v.id === 'stock' ? '/stock' : `/stock?view=${v.id}`}
            aria-current={v.id === view ? 'page' : undefined}
            className={`-mb-px border-b-2 px-4 py-2 text-sm font-medium no-underline ${v.id === view ? 'border-oak text-graphite' : 'border-transparent text-graphite-mute hover:text-graphite'}`}
          >
            {v.label}
          </Link>
        ))}
      </nav>

      {view !== 'history' && <StockFilters key={view} showStatus={view === 'rack'} materials={materials} locations={locations} />}

      {view === 'stock' &&
        (items.length === 0 ? (
          <EmptyState title={allItems.length ? 'Nothing matches these filters.' : 'The rack is empty.'}>
            {allItems.length ? 'Clear a filter to see more.' : 'Add a stock size or import a CSV to start.'}
          </EmptyState>
        ) : (
          <StockTable items={items} len={len} thick={thick} money={money} currency={settings.currency} canWrite={can(user.role, 'stock:write')} />
        ))}
      {view === 'rack' &&
        (rack.length === 0 ? (
          <EmptyState title="No offcuts here.">Finished plans put their usable offcuts on the rack; cutters can record others.</EmptyState>
        ) : (
          <OffcutRack rack={rack} len={len} thick={thick} money={money} canScrap={can(user.role, 'offcuts:record')} />
        ))}
      {view === 'history' && historyItem && (
        <p className="mb-3 text-sm">
          History of one size. <Link href="/stock?view=history">Show every movement</Link>
        </p>
      )}
      {view === 'history' &&
        (movements.length + changes.length === 0 ? (
          <EmptyState title="No stock has moved yet." />
        ) : (
          <MovementHistory movements={movements} changes={changes} money={money} timeZone={settings.timeZone} />
        ))}
    </>
  );
}
