'use client';

import { useState } from 'react';
import { STOCK_CSV_COLUMNS } from '@/lib/stock/stock-csv';
import type { StockImportResult } from '@/shared/wire/stock';
import { ActionError } from '@/components/ui/field';
import { useStockAction } from './use-stock-action';

/**
 * Import a stock CSV: the server checks every row first and lists each bad one with its reasons. Nothing is written
 * until the user chooses: all rows (only when every row is valid) or only the valid ones.
 */
export function ImportStockPanel({ onDone }: { onDone: () => void }) {
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState('');
  const [check, setCheck] = useState<StockImportResult | null>(null);
  const [done, setDone] = useState<number | null>(null);
  const checking = useStockAction('POST /api/stock/import', { onDone: setCheck });
  const writing = useStockAction('POST /api/stock/import', { onDone: (r) => setDone(r.imported) });

  async function choose(file: File | undefined) {
    setCheck(null);
    setDone(null);
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    setFileName(file.name);
    checking.mutate({ csv: text, commit: 'none' });
  }

  return (
    <section className="card mb-4 space-y-3 p-4" aria-label="Import stock from CSV">
      <div>
        <label htmlFor="import-file" className="field-label">
          Stock file (CSV)
        </label>
        <input id="import-file" type="file" accept=".csv,text/csv" className="text-sm" onChange={(e) => choose(e.target.files?.[0])} />
        <p className="mt-1 text-xs text-graphite-mute">
          One size per row. Needs a header naming kind, material, thickness, length, width, quantity; may also give{' '}
          {STOCK_CSV_COLUMNS.slice(6).join(', ')}. Lengths in any form (96, 8′, 2440 mm); thickness 3/4&quot; or 4/4.
        </p>
      </div>
      {checking.isPending && <p className="text-sm text-graphite-mute">Checking {fileName}…</p>}
      <ActionError error={checking.error ?? writing.error} />
      {check && done === null && (
        <div className="space-y-2" data-testid="import-check">
          <p className="text-sm">
            <strong>{check.valid}</strong> row{check.valid === 1 ? '' : 's'} ready; <strong>{check.errors.length}</strong> with problems.
          </p>
          {check.errors.length > 0 && (
            <table className="data-table" aria-label="Rows with problems">
              <thead>
                <tr>
                  <th className="num">Line</th>
                  <th>Problems</th>
                </tr>
              </thead>
              <tbody>
                {check.errors.map((e) => (
                  <tr key={e.line}>
                    <td className="num">{e.line}</td>
                    <td>{e.messages.join('; ')}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          <div className="flex gap-2">
            <button
              type="button"
              className="btn-accent"
              disabled={!csv || check.errors.length > 0 || check.valid === 0 || writing.isPending}
              onClick={() => csv && writing.mutate({ csv, commit: 'all' })}
            >
              Import all rows
            </button>
            {check.errors.length > 0 && check.valid > 0 && (
              <button
                type="button"
                className="btn-quiet"
                disabled={writing.isPending}
                onClick={() => csv && writing.mutate({ csv, commit: 'valid' })}
              >
                Import only the {check.valid} valid row{check.valid === 1 ? '' : 's'}
              </button>
            )}
            <button type="button" className="btn-quiet" onClick={onDone}>
              Close
            </button>
          </div>
        </div>
      )}
      {done !== null && (
        <p className="text-sm text-sage" role="status">
          Imported {done} size{done === 1 ? '' : 's'}.{' '}
          <button type="button" className="underline" onClick={onDone}>
            Close
          </button>
        </p>
      )}
    </section>
  );
}
