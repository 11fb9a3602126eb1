'use client';

import { useEffect, useEffectEvent, useMemo, useRef, type KeyboardEvent } from 'react';
import { cutListTotals } from '@/lib/cut-list/totals';
import { offersOf, type StockOffer } from '@/lib/cut-list/stock-match';
import { formatArea } from '@/lib/units/format-area';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import type { ShopUnits } from '@/shared/schemas/units';
import type { ListedPart } from '@/shared/wire/jobs';
import { COLUMN_TITLES, COLUMNS, isLengthColumn } from './cell-parsers';
import { NewPartRow, PartRow, slug } from './cut-list-rows';
import { clampCell, gridKey } from './grid-navigation';
import { duplicateOf, useCellCommits, useUndoableDeletes } from './use-cell-commits';

/**
 * The cut list as a spreadsheet: every cell is typed into and saved when left (Enter, Tab, arrows or a click
 * elsewhere); arrows and Enter move like a spreadsheet (`grid-navigation.ts`); the last row adds a part. Saving and
 * its rollback are `use-cell-commits.ts`, the rows `cut-list-rows.tsx`. Drawer-schedule rows show their sizes read-only.
 */
export function CutListTable({
  jobId,
  parts,
  offers,
  units,
  canWrite,
}: {
  jobId: string;
  parts: ListedPart[];
  offers: StockOffer[];
  units: ShopUnits;
  canWrite: boolean;
}) {
  const { errors, draft, setDraft, commitCell, setGrain, commitDraft, add, remove } = useCellCommits(jobId, offers, units);
  // Deleted rows, newest last: Undo (or Ctrl/Cmd+Z outside a cell being typed in) puts the last one back in its place.
  const { deleted, lastDeleted, deleteRow, undoDelete, forget } = useUndoableDeletes(add, remove);
  const tableRef = useRef<HTMLTableElement>(null);
  const materials = useMemo(() => [...new Set(offers.map((o) => o.material))].sort(), [offers]);
  const totals = useMemo(() => cutListTotals(parts, offers), [parts, offers]);
  const draftRow = parts.length;
  useUndoKey(undoDelete);

  function focusCell(row: number, col: number) {
    const to = clampCell({ row, col }, draftRow, COLUMNS.length);
    tableRef.current?.querySelector<HTMLElement>(`[data-r="${to.row}"][data-c="${to.col}"]`)?.focus();
  }

  function addDraft() {
    if (commitDraft()) setTimeout(() => focusCell(draftRow + 1, 0), 0);
  }

  function onKeyDown(event: KeyboardEvent<HTMLTableElement>) {
    const target = event.target as HTMLElement;
    const row = Number(target.dataset.r);
    const col = Number(target.dataset.c);
    if (Number.isNaN(row) || Number.isNaN(col)) return;
    const caret =
      target instanceof HTMLInputElement
        ? { selectionStart: target.selectionStart, selectionEnd: target.selectionEnd, length: target.value.length }
        : null;
    const outcome = gridKey(event.key, { row, col }, caret, target instanceof HTMLButtonElement, draftRow);
    if (outcome.kind === 'none') return;
    event.preventDefault();
    if (outcome.kind === 'add-part') addDraft();
    else focusCell(outcome.to.row, outcome.to.col);
  }

  return (
    <div className="card relative overflow-x-auto">
      <datalist id="cut-list-materials">
        {materials.map((m) => (
          <option key={m} value={m} />
        ))}
      </datalist>
      {materials.map((m) => (
        <datalist key={m} id={`cut-list-thickness-${slug(m)}`}>
          {[...new Map(offersOf(offers, m).map((o) => [exactLengthText(o.thickness, units), o])).entries()].map(([value, o]) => (
            <option key={value} value={value} label={`${o.nominal || value} ${o.kind}`} />
          ))}
        </datalist>
      ))}
      <table ref={tableRef} className="data-table cut-list" aria-label="Cut list" onKeyDown={onKeyDown}>
        <thead>
          <tr>
            <th className="w-8">#</th>
            {COLUMNS.map((c) => (
              <th key={c} className={isLengthColumn(c) || c === 'quantity' ? 'num' : undefined} scope="col">
                {COLUMN_TITLES[c]}
              </th>
            ))}
            {canWrite && (
              <th className="px-1">
                <span className="sr-only">Row actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {parts.map((part, r) => (
            <PartRow
              key={part.id}
              part={part}
              r={r}
              jobId={jobId}
              offers={offers}
              units={units}
              canWrite={canWrite}
              errors={errors}
              onCommit={(column, text) => commitCell(part, column, text)}
              onGrain={(grain) => setGrain(part, grain)}
              onCopy={() => add.mutate(duplicateOf(part))}
              onDelete={() => deleteRow(part, r + 1)}
            />
          ))}
          {canWrite && <NewPartRow r={draftRow} draft={draft} setDraft={setDraft} errors={errors} onAdd={addDraft} />}
        </tbody>
        <tfoot>
          <tr className="bg-paper-deep text-sm">
            <td colSpan={COLUMNS.length + 2} className="px-3 py-2" data-testid="cut-list-totals">
              <strong className="font-semibold">{totals.pieces.toLocaleString('en-US')}</strong> pieces in {totals.rows} rows ·{' '}
              {formatArea(totals.areaMm2, units)} of faces
              {totals.solidPieces > 0 && (
                <>
                  {' '}
                  · <strong className="font-semibold">{totals.boardFeet.toFixed(2)} bf</strong> net of solid wood ({totals.solidPieces} pieces)
                </>
              )}
            </td>
          </tr>
        </tfoot>
      </table>
      {parts.some((p) => p.drawerScheduleId) && (
        <p className="border-t border-paper-edge px-3 py-2 text-xs text-graphite-mute" data-testid="cut-list-help">
          Shaded rows come from a drawer schedule: edit the schedule to change their sizes.
        </p>
      )}
      {lastDeleted && (
        <div
          role="status"
          className="flex flex-wrap items-center gap-3 border-t border-paper-edge bg-oak-wash px-3 py-2 text-sm"
          data-testid="cut-list-undo"
        >
          <span>
            Deleted row {lastDeleted.row}, “{lastDeleted.part.label}”{deleted.length > 1 ? ` (${deleted.length} deletions to undo)` : ''}.
          </span>
          <button type="button" className="btn-quiet" onClick={undoDelete}>
            Undo
          </button>
          <span className="text-graphite-mute">or press Ctrl+Z (⌘Z on a Mac)</span>
          <button
            type="button"
            className="ml-auto text-graphite-mute hover:text-graphite"
            onClick={forget}
            aria-label="Keep the deletions and hide this"
          >
            Dismiss
          </button>
        </div>
      )}
    </div>
  );
}

/** Ctrl/Cmd+Z anywhere on the page but in text being typed (which keeps the browser's own undo) takes a deletion back. */
function useUndoKey(undo: () => void) {
  const onUndoKey = useEffectEvent(undo);
  useEffect(() => {
    function onKey(event: globalThis.KeyboardEvent) {
      if (!(event.ctrlKey || event.metaKey) || event.shiftKey || event.key.toLowerCase() !== 'z') return;
      const target = event.target as HTMLElement;
      const typing = (target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement) && target.dataset.pristine !== 'true';
      if (typing) return;
      event.preventDefault();
      onUndoKey();
    }
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
