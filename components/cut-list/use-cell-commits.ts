'use client';

import { PART_KEYS } from '@/shared/part-fields';
import { useState } from 'react';
import { ApiError } from '@/client/api';
import { snapThickness, type StockOffer } from '@/lib/cut-list/stock-match';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import type { PartInput, PartPatch } from '@/shared/schemas/part';
import type { ShopUnits } from '@/shared/schemas/units';
import type { ListedPart } from '@/shared/wire/jobs';
import { cellText, COLUMNS, parseCell, type Column, type TextColumn } from './cell-parsers';
import { usePartMutations } from './use-parts';

/** A cell's message (what does not read, or why the server refused it), by `errorKey`. */
export type CellErrors = Record<string, string>;
export const errorKey = (rowId: string, column: Column) => `${rowId}:${column}`;
/** The new-part row's id in `errorKey`. */
export const DRAFT = 'draft';

/** The new-part row as typed. */
export type Draft = Record<TextColumn, string> & { grain: GrainRule };
export const emptyDraft = (carry?: Partial<Draft>): Draft => ({
  label: '',
  quantity: '1',
  length: '',
  width: '',
  thickness: carry?.thickness ?? '',
  material: carry?.material ?? '',
  grain: carry?.grain ?? 'along-length',
  jointAllowance: '',
  notes: '',
});

const NOT_SAVED = 'Not saved: the connection failed.';

/**
 * Saving the cut list's cells: a cell left with new text is read (its message shown when it does not read), sent,
 * and shown at once — the list in the cache changes before the server answers and goes back if it refuses
 * (`usePartMutations`), with the server's message on the cell. The new-part row is read whole and added.
 */
export function useCellCommits(jobId: string, offers: StockOffer[], units: ShopUnits) {
  const { update, add, remove } = usePartMutations(jobId);
  const [errors, setErrors] = useState<CellErrors>({});
  const [draft, setDraft] = useState<Draft>(() => emptyDraft());

  const setError = (key: string, message: string | null) =>
    setErrors((e) => {
      const next = { ...e };
      if (message) next[key] = message;
      else delete next[key];
      return next;
    });

  function commitCell(part: ListedPart, column: TextColumn, text: string) {
    const key = errorKey(part.id, column);
    if (text === cellText(part, column, units)) return setError(key, null);
    const parsed = parseCell(column, text, units);
    if (!parsed.ok) return setError(key, parsed.error);
    setError(key, null);
    update.mutate(
      { id: part.id, patch: patchOf(part, column, parsed.value, offers) },
      { onError: (e) => setError(key, e instanceof ApiError ? (e.fields[column]?.[0] ?? e.message) : NOT_SAVED) },
    );
  }

  const setGrain = (part: ListedPart, grain: GrainRule) => update.mutate({ id: part.id, patch: { grain } });

  /** Adds the new-part row when every cell reads (true), carrying its material, thickness and grain to the next. */
  function commitDraft(): boolean {
    const values = readDraft(draft, units, setError);
    if (!values) return false;
    add.mutate(
      { ...values, thickness: snapThickness(values.material, values.thickness, offers) },
      { onError: (e) => setError(errorKey(DRAFT, 'label'), e instanceof ApiError ? (Object.values(e.fields).flat()[0] ?? e.message) : NOT_SAVED) },
    );
    // Material, thickness and grain carry over: rows of one material are usually typed together.
    setDraft(emptyDraft(draft));
    return true;
  }

  return { errors, draft, setDraft, commitCell, setGrain, commitDraft, add, remove };
}

/** A cell's new value as a patch; a nominal thickness ("3/4") becomes the stock's actual one, so the part nests on it. */
function patchOf(part: ListedPart, column: TextColumn, value: unknown, offers: StockOffer[]): PartPatch {
  if (column === 'thickness') return { thickness: snapThickness(part.material, value as number, offers) };
  if (column === 'material') return { material: value as string, thickness: snapThickness(value as string, part.thickness, offers) };
  return { [column]: value };
}

/** Every cell of the new-part row read, each message set or cleared; null while any cell does not read. */
function readDraft(draft: Draft, units: ShopUnits, setError: (key: string, message: string | null) => void): PartInput | null {
  const values: Partial<PartInput> = { grain: draft.grain };
  let ok = true;
  for (const column of COLUMNS) {
    if (column === 'grain') continue;
    const text = draft[column];
    if ((column === 'notes' || column === 'jointAllowance') && text.trim() === '') {
      setError(errorKey(DRAFT, column), null);
      continue;
    }
    const parsed = parseCell(column, text, units);
    setError(errorKey(DRAFT, column), parsed.ok ? null : parsed.error);
    if (parsed.ok) Object.assign(values, { [column]: parsed.value });
    else ok = false;
  }
  return ok ? (values as PartInput) : null;
}

/** How many deletions the cut list can take back. */
const UNDO_DEPTH = 20;

/**
 * Deleting rows with a way back: each deletion is kept (newest last, at most UNDO_DEPTH) so Undo puts the last one
 * back at its place; one the server refused is forgotten (the row came back already).
 */
export function useUndoableDeletes(add: ReturnType<typeof usePartMutations>['add'], remove: ReturnType<typeof usePartMutations>['remove']) {
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

  return { deleted, lastDeleted, deleteRow, undoDelete, forget: () => setDeleted([]) };
}

/** A row's values, to add again (a copy, or a deleted row put back): every field of the part table, nothing else. */
export function duplicateOf(p: ListedPart): PartInput {
  return Object.fromEntries(PART_KEYS.map((k) => [k, p[k]])) as PartInput;
}
