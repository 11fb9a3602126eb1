'use client';

import Link from 'next/link';
import { useState, type Dispatch, type SetStateAction } from 'react';
import { stockMatchWarning, type StockOffer } from '@/lib/cut-list/stock-match';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import { SCHEDULE_OWNED_FIELDS } from '@/shared/schemas/part';
import type { ShopUnits } from '@/shared/schemas/units';
import type { ListedPart } from '@/shared/wire/jobs';
import { cellText, COLUMN_TITLES, COLUMNS, isLengthColumn, type Column, type TextColumn } from './cell-parsers';
import { DRAFT, errorKey, type CellErrors, type Draft } from './use-cell-commits';
import { PENDING_ROW } from './use-parts';

/** A row shown before the server has saved it has no id to delete or copy by yet. */
const isPending = (part: ListedPart) => part.id.startsWith(PENDING_ROW);

const scheduleOwned = (part: ListedPart, column: Column) =>
  part.drawerScheduleId !== null && (SCHEDULE_OWNED_FIELDS as readonly string[]).includes(column);

const isNumeric = (column: Column) => isLengthColumn(column) || column === 'quantity';

/** The datalist a cell suggests from: the stock room's materials, or the thicknesses it has of the row's material. */
const listOf = (column: Column, material: string) =>
  column === 'material' ? 'cut-list-materials' : column === 'thickness' ? `cut-list-thickness-${slug(material)}` : undefined;

export const slug = (s: string) =>
  s
    .trim()
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-');

/** One saved row: its cells (typed into, or read-only for a schedule's sizes and for those who may not write), Copy and Delete. */
export function PartRow({
  part,
  r,
  jobId,
  offers,
  units,
  canWrite,
  errors,
  onCommit,
  onGrain,
  onCopy,
  onDelete,
}: {
  part: ListedPart;
  r: number;
  jobId: string;
  offers: StockOffer[];
  units: ShopUnits;
  canWrite: boolean;
  errors: CellErrors;
  onCommit: (column: TextColumn, text: string) => void;
  onGrain: (grain: GrainRule) => void;
  onCopy: () => void;
  onDelete: () => void;
}) {
  return (
    <tr className={part.drawerScheduleId ? 'bg-oak-wash/40' : undefined} data-testid="cut-list-row">
      <td className="text-xs text-graphite-mute">{r + 1}</td>
      {COLUMNS.map((column, c) => {
        const readOnly = !canWrite || scheduleOwned(part, column) || part.id.startsWith('pending-');
        if (column === 'grain')
          return (
            <td key={column}>
              <GrainToggle value={part.grain} r={r} c={c} disabled={readOnly} onChange={onGrain} />
            </td>
          );
        const warning = column === 'material' ? stockMatchWarning(part, offers, units) : null;
        return (
          <td key={column} className={isNumeric(column) ? 'num' : undefined}>
            {readOnly ? (
              <ReadOnlyCell part={part} column={column} r={r} c={c} jobId={jobId} units={units} />
            ) : (
              <EditCell
                key={`${part.id}:${cellText(part, column, units)}`}
                r={r}
                c={c}
                column={column}
                initial={cellText(part, column, units)}
                error={errors[errorKey(part.id, column)]}
                label={`${COLUMN_TITLES[column]}, row ${r + 1}`}
                list={listOf(column, part.material)}
                onCommit={(text) => onCommit(column, text)}
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
        <td className="whitespace-nowrap px-1">
          <button
            type="button"
            className="px-1 text-xs text-graphite-mute hover:text-graphite"
            aria-label={`Duplicate row ${r + 1}`}
            disabled={isPending(part)}
            onClick={onCopy}
          >
            Copy
          </button>
          {part.drawerScheduleId ? null : (
            <button
              type="button"
              className="px-1 text-xs text-brick hover:underline"
              aria-label={`Delete row ${r + 1}`}
              disabled={isPending(part)}
              onClick={onDelete}
            >
              Delete
            </button>
          )}
        </td>
      )}
    </tr>
  );
}

function ReadOnlyCell({
  part,
  column,
  r,
  c,
  jobId,
  units,
}: {
  part: ListedPart;
  column: TextColumn;
  r: number;
  c: number;
  jobId: string;
  units: ShopUnits;
}) {
  return (
    <span
      tabIndex={0}
      data-r={r}
      data-c={c}
      className={`block rounded px-1 py-0.5 focus:bg-paper-deep ${isNumeric(column) ? 'whitespace-nowrap' : ''}`}
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
  );
}

/** The last row: a new part typed cell by cell, added with Enter or Add. */
export function NewPartRow({
  r,
  draft,
  setDraft,
  errors,
  onAdd,
}: {
  r: number;
  draft: Draft;
  setDraft: Dispatch<SetStateAction<Draft>>;
  errors: CellErrors;
  onAdd: () => void;
}) {
  return (
    <tr className="bg-paper/60" data-testid="cut-list-new-row">
      <td className="text-sm font-semibold text-oak">+</td>
      {COLUMNS.map((column, c) => {
        if (column === 'grain')
          return (
            <td key={column}>
              <GrainToggle value={draft.grain} r={r} c={c} onChange={(grain) => setDraft((d) => ({ ...d, grain }))} />
            </td>
          );
        const error = errors[errorKey(DRAFT, column)];
        return (
          <td key={column} className={isNumeric(column) ? 'num' : undefined}>
            <input
              data-r={r}
              data-c={c}
              aria-label={`New part: ${COLUMN_TITLES[column]}`}
              aria-invalid={error ? true : undefined}
              className={cellInputClass(Boolean(error), isNumeric(column))}
              style={{ minWidth: cellWidth(column, draft[column]) }}
              value={draft[column]}
              placeholder={column === 'label' ? 'New part…' : ''}
              list={listOf(column, draft.material)}
              onFocus={(e) => e.currentTarget.select()}
              onChange={(e) => setDraft((d) => ({ ...d, [column]: e.target.value }))}
            />
            {error && (
              <span className="mt-0.5 block text-xs text-brick" role="alert">
                {error}
              </span>
            )}
          </td>
        );
      })}
      <td className="px-1">
        <button type="button" className="px-1 text-xs font-medium text-oak-deep" onClick={onAdd}>
          Add
        </button>
      </td>
    </tr>
  );
}

/** Cell widths in characters, so sizes like 1′ 7-3/4″ and names like "Baltic birch" show whole. */
const CELL_CH: Record<Column, number> = {
  label: 12,
  quantity: 3,
  length: 8,
  width: 8,
  thickness: 8,
  material: 11,
  grain: 8,
  jointAllowance: 6,
  notes: 9,
};

/**
 * A cell's box is as wide as its text (so a length keeps its ″ and a note shows whole), never narrower than the
 * column's usual width. Lengths are monospaced (1ch a character); other text takes about 1.1ch a character.
 */
const cellWidth = (column: Column, text: string) => {
  const chars = Math.max(CELL_CH[column], Math.ceil([...text].length * (isNumeric(column) ? 1 : 1.1)));
  return `calc(${chars + 1}ch + 0.75rem)`;
};

const cellInputClass = (invalid: boolean, numeric: boolean) =>
  `w-full rounded border bg-transparent px-1 py-0.5 text-sm outline-none focus:border-oak focus:bg-white focus:ring-1 focus:ring-oak-light ${numeric ? 'text-right font-mono' : ''} ${invalid ? 'border-brick bg-brick-wash' : 'border-transparent'}`;

/** A saved cell being typed in: saved when left, Escape puts its text back. */
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
  return (
    <>
      <input
        data-r={r}
        data-c={c}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        className={cellInputClass(Boolean(error), isNumeric(column))}
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
