'use client';

import { useState } from 'react';
import type { ShopUnits } from '@/shared/schemas/units';
import { ImportStockPanel } from './import-stock-panel';
import { NewStockForm } from './new-stock-form';
import { RecordOffcutForm } from './record-offcut-form';

type Open = 'new' | 'import' | 'offcut' | null;

/** The stock room's top actions: owners add sizes and import; cutters and owners record offcuts. */
export function StockRoomActions({ units, canWrite, canRecord }: { units: ShopUnits; canWrite: boolean; canRecord: boolean }) {
  const [open, setOpen] = useState<Open>(null);
  const toggle = (what: Open) => setOpen(open === what ? null : what);
  if (!canWrite && !canRecord) return null;
  return (
    <div className="mb-2">
      <div className="mb-3 flex flex-wrap gap-2">
        {canWrite && (
          <button type="button" className="btn-accent" onClick={() => toggle('new')}>
            New stock size
          </button>
        )}
        {canWrite && (
          <button type="button" className="btn-quiet" onClick={() => toggle('import')}>
            Import CSV
          </button>
        )}
        {canRecord && (
          <button type="button" className="btn-quiet" onClick={() => toggle('offcut')}>
            Record an offcut
          </button>
        )}
      </div>
      {open === 'new' && <NewStockForm units={units} onDone={() => setOpen(null)} />}
      {open === 'import' && <ImportStockPanel onDone={() => setOpen(null)} />}
      {open === 'offcut' && <RecordOffcutForm units={units} onDone={() => setOpen(null)} />}
    </div>
  );
}
