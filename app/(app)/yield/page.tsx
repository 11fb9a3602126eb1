import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { listYieldLedger } from '@/db/queries/stock-yield';
import { YieldLedger } from '@/components/yield/yield-ledger';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';
import { shopDay } from '@/lib/dates/shop-time';
import { formatMoney } from '@/lib/money';
import { formatArea } from '@/lib/units/format-area';

export const metadata: Metadata = { title: 'Yield ledger' };

export default async function YieldPage() {
  const user = await requirePageUser('yield:read');
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [settings, ledger] = await Promise.all([getShopSettings(scope), listYieldLedger(scope)]);
  return (
    <>
      <PageHeader
        title="Yield ledger"
        lead={`How much of the stock each finished plan turned into parts, what went back on the rack as offcuts, what the saw wasted (trim, kerf, scraps too small to keep), what was spoiled in parts damaged at the saw, and what the material cost. Dates are on the shop’s clock (${settings.timeZone.replace(/_/g, ' ')}).`}
      />
      {ledger.plans.length === 0 ? (
        <EmptyState title="No finished plans yet.">
          A plan’s yield, waste and material cost are recorded here when the cutter marks it done.
        </EmptyState>
      ) : (
        <YieldLedger
          ledger={ledger}
          money={(c) => formatMoney(c, settings.currency)}
          area={(a) => formatArea(a, settings.units)}
          day={(at) => shopDay(at, settings.timeZone)}
        />
      )}
    </>
  );
}
