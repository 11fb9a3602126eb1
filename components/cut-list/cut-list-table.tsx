'use client';

import Link from 'next/link';
import { useEffect, useEffectEvent, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { ApiError } from '@/client/api';
import { cutListTotals } from '@/lib/cut-list/totals';
import { offersOf, snapThickness, stockMatchWarning, type StockOffer } from '@/lib/cut-list/stock-match';
import { formatArea } from '@/lib/units/format-area';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import type { ShopUnits } from '@/shared/schemas/units';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import { SCHEDULE_OWNED_FIELDS, type PartInput, type PartPatch } from '@/shared/schemas/part';
import { cellText, COLUMN_TITLES, COLUMNS, isLengthColumn, parseCell, type Column, type TextColumn } from './cell-parsers';
import { PENDING_ROW, usePartMutations } from './use-parts';
import type { ListedPart } from '@/shared/wire/jobs';

type CellErrors = Record<string, string>;
const errorKey = (rowId: string, column: Column) => `${rowId}:${column}`;
const DRAFT = 'draft';

type Draft = Record<TextColumn, string> & { grain: GrainRule };
const emptyDraft = (carry?: Partial<Draft>): Draft => ({
  label: '',
  quantity: '1',
  lengthMm: '',
  widthMm: '',
  thicknessMm: carry?.thicknessMm ?? '',
  material: carry?.material ?? '',
  grain: carry?.grain ?? 'along-length',
  jointAllowanceMm: '',
  notes: '',
});

/**
 * The cut list as a spreadsheet: every cell is typed into and saved when left (Enter, Tab, arrows or a click
 * elsewhere); arrows and Enter move like a spreadsheet; the last row adds a part. Drawer-schedule rows show their
 * sizes read-only.
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
  const { update, add, remove } = usePartMutations(jobId);
  const [errors, setErrors] = useState<CellErrors>({});
  const [draft, setDraft] = useState<Draft>(() => emptyDraft());
  const tableRef = useRef<HTMLTableElement>(null);
  const materials = useMemo(() => [...new Set(offers.map((o) => o.material))].sort(), [offers]);
  const totals = useMemo(() => cutListTotals(parts, offers), [parts, offers]);
  const draftRow = parts.length;
  // Deleted rows, newest last: Undo (or Ctrl/Cmd+Z outside a cell being typed in) puts the last one back in its place.
  const [deleted, setDeleted] = useState<{ part: ListedPart; row: number }[]>([]);
  const lastDeleted = deleted.at(-1);

  function deleteRow(part: ListedPart, row: number) {
    setDeleted((d) => [...d, { part, row }].slice(-UNDO_DEPTH));
    remove.mutate(part.id, { onError: () => setDeleted((d) => d.filter((x) => x.part.id !== part.id)) });
  }

  function undoDelete() {
    if (!lastDeleted) return;
    setDeleted((d) => d.slice(0, -1));
    add.mutate({ ...duplicateOf(lastDeleted.part), sort: lastDeleted.part.sort });
  }

  const onUndoKey = useEffectEvent(undoDelete);
  useEffect(() => {
    function onKey(event: globalThis.KeyboardEvent) {
      if (!(event.ctrlKey || event.metaKey) || event.shiftKey || event.key.toLowerCase() !== 'z') return;
      const target = event.target as HTMLElement;
      // Text being typed in a field keeps the browser's own undo.
      const typing = (target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement) && target.dataset.pristine !== 'true';
      if (typing) return;
      event.preventDefault();
      onUndoKey();
    }
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  const setError = (key: string, message: string | null) =>
    setErrors((e) => {
      const next = { ...e };
      if (message) next[key] = message;
      else delete next[key];
      return next;
    });

  function focusCell(row: number, col: number) {
    const r = Math.max(0, Math.min(row, draftRow));
    const c = Math.max(0, Math.min(col, COLUMNS.length - 1));
    const el = tableRef.current?.querySelector<HTMLElement>(`[data-r="${r}"][data-c="${c}"]`);
    el?.focus();
  }

  function commitCell(part: ListedPart, column: TextColumn, text: string) {
    const key = errorKey(part.id, column);
    if (text === cellText(part, column, units)) return setError(key, null);
    const parsed = parseCell(column, text, units);
    if (!parsed.ok) return setError(key, parsed.error);
    setError(key, null);
    // A nominal thickness ("3/4") becomes the stock's actual one, so the part nests on it.
    const patch: PartPatch =
      column === 'thicknessMm'
        ? { thicknessMm: snapThickness(part.material, parsed.value as number, offers) }
        : column === 'material'
          ? { material: parsed.value as string, thicknessMm: snapThickness(parsed.value as string, part.thicknessMm, offers) }
          : { [column]: parsed.value };
    update.mutate(
      { id: part.id, patch },
      { onError: (e) => setError(key, e instanceof ApiError ? (e.fields[column]?.[0] ?? e.message) : 'Not saved: the connection failed.') },
    );
  }

  function commitDraft() {
    const values: Partial<PartInput> = { grain: draft.grain };
    let ok = true;
    for (const column of COLUMNS) {
      if (column === 'grain') continue;
      const text = draft[column];
      if ((column === 'notes' || column === 'jointAllowanceMm') && text.trim() === '') {
        setError(errorKey(DRAFT, column), null);
        continue;
      }
      const parsed = parseCell(column, text, units);
      setError(errorKey(DRAFT, column), parsed.ok ? null : parsed.error);
      if (parsed.ok) Object.assign(values, { [column]: parsed.value });
      else ok = false;
    }
    if (!ok) return;
    values.thicknessMm = snapThickness(values.material!, values.thicknessMm!, offers);
    add.mutate(values as PartInput, {
      onError: (e) =>
        setError(
          errorKey(DRAFT, 'label'),
          e instanceof ApiError ? (Object.values(e.fields).flat()[0] ?? e.message) : 'Not saved: the connection failed.',
        ),
    });
    // Material, thickness and grain carry over: rows of one material are usually typed together.
    setDraft(emptyDraft(draft));
    setTimeout(() => focusCell(draftRow + 1, 0), 0);
  }

  function onKeyDown(event: KeyboardEvent<HTMLTableElement>) {
    const target = event.target as HTMLElement;
    const r = Number(target.dataset.r);
    const c = Number(target.dataset.c);
    if (Number.isNaN(r) || Number.isNaN(c)) return;
    const input = target instanceof HTMLInputElement ? target : null;
    const whole = input ? input.selectionStart === 0 && input.selectionEnd === input.value.length : true;
    switch (event.key) {
      case 'ArrowUp':
        event.preventDefault();
        return focusCell(r - 1, c);
      case 'ArrowDown':
        event.preventDefault();
        return focusCell(r + 1, c);
      case 'ArrowLeft':
        if (whole || (input?.selectionStart === 0 && input.selectionEnd === 0)) {
          event.preventDefault();
          focusCell(r, c - 1);
        }
        return;
      case 'ArrowRight':
        if (whole || (input && input.selectionStart === input.value.length)) {
          event.preventDefault();
          focusCell(r, c + 1);
        }
        return;
      case 'Enter':
        if (target instanceof HTMLButtonElement) return; // a button's Enter presses it
        event.preventDefault();
        if (r === draftRow) return commitDraft();
        return focusCell(r + 1, c);
    }
  }

  const scheduleOwned = (part: ListedPart, column: Column) =>
    part.drawerScheduleId !== null && (SCHEDULE_OWNED_FIELDS as readonly string[]).includes(column);

  return (
    <div className="card relative overflow-x-auto">
      <datalist id="cut-list-materials">
        {materials.map((m) => (
          <option key={m} value={m} />
        ))}
      </datalist>
      {materials.map((m) => (
        <datalist key={m} id={`cut-list-thickness-${slug(m)}`}>
          {[...new Map(offersOf(offers, m).map((o) => [exactLengthText(o.thicknessMm, units), o])).entries()].map(([value, o]) => (
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
              <th>
                <span className="sr-only">Row actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {parts.map((part, r) => (
            <tr key={part.id} className={part.drawerScheduleId ? 'bg-oak-wash/40' : undefined} data-testid="cut-list-row">
              <td className="text-xs text-graphite-mute">{r + 1}</td>
              {COLUMNS.map((column, c) => {
                const readOnly = !canWrite || scheduleOwned(part, column) || part.id.startsWith('pending-');
                const error = errors[errorKey(part.id, column)];
                if (column === 'grain')
                  return (
                    <td key={column}>
                      <GrainToggle
                        value={part.grain}
                        r={r}
                        c={c}
                        disabled={readOnly}
                        onChange={(grain) => update.mutate({ id: part.id, patch: { grain } })}
                      />
                    </td>
                  );
                const warning = column === 'material' ? stockMatchWarning(part, offers, units) : null;
                return (
                  <td key={column} className={isLengthColumn(column) || column === 'quantity' ? 'num' : undefined}>
                    {readOnly ? (
                      <span
                        tabIndex={0}
                        data-r={r}
                        data-c={c}
                        className={`block rounded px-1 py-0.5 focus:bg-paper-deep ${isLengthColumn(column) || column === 'quantity' ? 'whitespace-nowrap' : ''}`}
                      >
                        {cellText(part, column, units) || '—'}
                        {column === 'label' && part.schedule && (
                          <Link
                            href={`/jobs/${jobId}/drawers#schedule-${part.drawerScheduleId}`}
                            className="ml-2 whitespace-nowrap rounded-full bg-oak-wash px-2 text-xs font-medium text-oak-deep no-underline"
                          >
                            drawer schedule
                          </Link>
                        )}
                      </span>
                    ) : (
                      <EditCell
                        key={`${part.id}:${cellText(part, column, units)}`}
                        r={r}
                        c={c}
                        column={column}
                        initial={cellText(part, column, units)}
                        error={error}
                        label={`${COLUMN_TITLES[column]}, row ${r + 1}`}
                        list={
                          column === 'material'
                            ? 'cut-list-materials'
                            : column === 'thicknessMm'
                              ? `cut-list-thickness-${slug(part.material)}`
                              : undefined
                        }
                        onCommit={(text) => commitCell(part, column, text)}
                      />
                    )}
                    {warning && (
                      <span className="mt-0.5 block min-w-48 text-xs text-amber" role="note">
                        ⚠ {warning}
                      </span>
                    )}
                  </td>
                );
              })}
              {canWrite && (
                <td className="whitespace-nowrap">
                  <button
                    type="button"
                    className="px-1 text-xs text-graphite-mute hover:text-graphite"
                    aria-label={`Duplicate row ${r + 1}`}
                    disabled={isPending(part)}
                    onClick={() => add.mutate(duplicateOf(part))}
                  >
                    Copy
                  </button>
                  {part.drawerScheduleId ? null : (
                    <button
                      type="button"
                      className="px-1 text-xs text-brick hover:underline"
                      aria-label={`Delete row ${r + 1}`}
                      disabled={isPending(part)}
                      onClick={() => deleteRow(part, r + 1)}
                    >
                      Delete
                    </button>
                  )}
                </td>
              )}
            </tr>
          ))}
          {canWrite && (
            <tr className="bg-paper/60" data-testid="cut-list-new-row">
              <td className="text-sm font-semibold text-oak">+</td>
              {COLUMNS.map((column, c) =>
                column === 'grain' ? (
                  <td key={column}>
                    <GrainToggle value={draft.grain} r={draftRow} c={c} onChange={(grain) => setDraft((d) => ({ ...d, grain }))} />
                  </td>
                ) : (
                  <td key={column} className={isLengthColumn(column) || column === 'quantity' ? 'num' : undefined}>
                    <input
                      data-r={draftRow}
                      data-c={c}
                      aria-label={`New part: ${COLUMN_TITLES[column]}`}
                      aria-invalid={errors[errorKey(DRAFT, column)] ? true : undefined}
                      className={cellInputClass(Boolean(errors[errorKey(DRAFT, column)]), isLengthColumn(column) || column === 'quantity')}
                      style={{ minWidth: cellWidth(column, draft[column]) }}
                      value={draft[column]}
                      placeholder={column === 'label' ? 'New part…' : ''}
                      list={
                        column === 'material'
                          ? 'cut-list-materials'
                          : column === 'thicknessMm'
                            ? `cut-list-thickness-${slug(draft.material)}`
                            : undefined
                      }
                      onFocus={(e) => e.currentTarget.select()}
                      onChange={(e) => setDraft((d) => ({ ...d, [column]: e.target.value }))}
                    />
                    {errors[errorKey(DRAFT, column)] && (
                      <span className="mt-0.5 block text-xs text-brick" role="alert">
                        {errors[errorKey(DRAFT, column)]}
                      </span>
                    )}
                  </td>
                ),
              )}
              <td>
                <button type="button" className="px-1 text-xs font-medium text-oak-deep" onClick={commitDraft}>
                  Add
                </button>
              </td>
            </tr>
          )}
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
            onClick={() => setDeleted([])}
            aria-label="Keep the deletions and hide this"
          >
            Dismiss
          </button>
        </div>
      )}
    </div>
  );
}

/** A row shown before the server has saved it has no id to delete or copy by yet. */
const isPending = (part: ListedPart) => part.id.startsWith(PENDING_ROW);

/** How many deletions the cut list can take back. */
const UNDO_DEPTH = 20;

const slug = (s: string) =>
  s
    .trim()
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-');

/** Cell widths in characters, so sizes like 1′ 7-3/4″ and names like "Baltic birch" show whole. */
const CELL_CH: Record<Column, number> = {
  label: 12,
  quantity: 3,
  lengthMm: 8,
  widthMm: 8,
  thicknessMm: 8,
  material: 11,
  grain: 8,
  jointAllowanceMm: 6,
  notes: 10,
};

/**
 * A cell's box is as wide as its text (so a length keeps its ″ and a note shows whole), never narrower than the
 * column's usual width. Lengths are monospaced (1ch a character); other text takes about 1.1ch a character.
 */
const cellWidth = (column: Column, text: string) => {
  const numeric = isLengthColumn(column) || column === 'quantity';
  const chars = Math.max(CELL_CH[column], Math.ceil([...text].length * (numeric ? 1 : 1.1)));
  return `calc(${chars + 1}ch + 0.75rem)`;
};

const cellInputClass = (invalid: boolean, numeric: boolean) =>
  `w-full rounded border bg-transparent px-1 py-0.5 text-sm outline-none focus:border-oak focus:bg-white focus:ring-1 focus:ring-oak-light ${numeric ? 'text-right font-mono' : ''} ${invalid ? 'border-brick bg-brick-wash' : 'border-transparent'}`;

function duplicateOf(p: ListedPart): PartInput {
  return {
    label: p.label,
    quantity: p.quantity,
    lengthMm: p.lengthMm,
    widthMm: p.widthMm,
    thicknessMm: p.thicknessMm,
    material: p.material,
    grain: p.grain,
    jointAllowanceMm: p.jointAllowanceMm,
    notes: p.notes,
  };
}

function EditCell({
  r,
  c,
  column,
  initial,
  error,
  label,
  list,
  onCommit,
}: {
  r: number;
  c: number;
  column: Column;
  initial: string;
  error?: string;
  label: string;
  list?: string;
  onCommit: (text: string) => void;
}) {
  const [text, setText] = useState(initial);
  const numeric = isLengthColumn(column) || column === 'quantity';
  return (
    <>
      <input
        data-r={r}
        data-c={c}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        className={cellInputClass(Boolean(error), numeric)}
        style={{ minWidth: cellWidth(column, text) }}
        value={text}
        list={list}
        data-pristine={text === initial}
        onFocus={(e) => e.currentTarget.select()}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => onCommit(text)}
        onKeyDown={(e) => {
          if (e.key === 'Escape') setText(initial);
        }}
      />
      {error && (
        <span className="mt-0.5 block text-left text-xs font-sans text-brick" role="alert">
          {error}
        </span>
      )}
    </>
  );
}

function GrainToggle({
  value,
  r,
  c,
  disabled,
  onChange,
}: {
  value: GrainRule;
  r: number;
  c: number;
  disabled?: boolean;
  onChange: (g: GrainRule) => void;
}) {
  const along = value === 'along-length';
  return (
    <button
      type="button"
      data-r={r}
      data-c={c}
      disabled={disabled}
      aria-pressed={along}
      aria-label={along ? 'Grain runs along the length (press to allow either way)' : 'Grain either way (press to run it along the length)'}
      className={`whitespace-nowrap rounded px-1.5 py-0.5 text-xs font-medium ${along ? 'bg-oak-wash text-oak-deep' : 'bg-paper-deep text-graphite-mute'} disabled:cursor-default`}
      onClick={() => onChange(along ? 'any' : 'along-length')}
    >
      {along ? '↔ along' : '⤡ either'}
    </button>
  );
}
