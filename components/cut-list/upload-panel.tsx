'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { ApiError, call } from '@/client/api';
import { guessMapping, looksLikeHeader, TEMPLATE_COLUMNS } from '@/lib/cut-list/column-mapping';
import { detectUnit } from '@/lib/cut-list/detect-unit';
import { UPLOAD_LIMITS } from '@/lib/cut-list/limits';
import { readCutListFileInWorker } from '@/client/spreadsheet-worker';
import { importSummary } from '@/lib/cut-list/import-summary';
import { toUploadRows } from '@/lib/cut-list/upload-rows';
import { countOf } from '@/lib/plural';
import type { UploadRowResult } from '@/lib/cut-list/validate-rows';
import type { LengthUnit } from '@/lib/units/parse-length';
import { CUT_LIST_FIELD_LABELS, CUT_LIST_FIELDS, type CutListField } from '@/shared/schemas/cut-list-upload';
import { partsKey } from './use-parts';

const PREVIEW_ROWS_SHOWN = 8;

/**
 * Upload a CSV or XLSX: the file is read in the browser, its columns mapped (guessed from the header), the unit
 * detected or chosen; the server checks every row and nothing is written until the person imports — all rows when
 * all are valid, or explicitly only the valid ones.
 */
export function UploadPanel({
  jobId,
  shopUnit,
  onClose,
  onImported,
}: {
  jobId: string;
  shopUnit: LengthUnit;
  onClose: () => void;
  onImported: (message: string) => void;
}) {
  const qc = useQueryClient();
  const [fileError, setFileError] = useState<string | null>(null);
  const [file, setFile] = useState<{ name: string; grid: string[][] } | null>(null);
  const [hasHeader, setHasHeader] = useState(true);
  const [mapping, setMapping] = useState<(CutListField | null)[]>([]);
  const [unit, setUnit] = useState<LengthUnit>(shopUnit);
  const [unitReason, setUnitReason] = useState('');

  async function choose(f: File | undefined) {
    setFile(null);
    setFileError(null);
    if (!f) return;
    if (f.size > UPLOAD_LIMITS.maxFileBytes) {
      setFileError(
        `“${f.name}” is ${Math.round(f.size / 1024)} KB; the limit is ${UPLOAD_LIMITS.maxFileBytes / 1024} KB. Split it into smaller files.`,
      );
      return;
    }
    const read = await readCutListFileInWorker({ name: f.name, bytes: await f.arrayBuffer() });
    if (!read.ok) return setFileError(read.error);
    const header = looksLikeHeader(read.grid[0]);
    const map = header ? guessMapping(read.grid[0]) : read.grid[0].map((_, i) => TEMPLATE_COLUMNS[i] ?? null);
    setHasHeader(header);
    setMapping(map);
    const upload = toUploadRows(read.grid, map, { hasHeader: header });
    const at = (field: CutListField) => upload.columns.indexOf(field);
    const guess = detectUnit({
      lengths: upload.rows.flatMap((r) => [r.cells[at('length')] ?? '', r.cells[at('width')] ?? '']),
      thicknesses: upload.rows.map((r) => r.cells[at('thickness')] ?? ''),
    });
    setUnit(guess.unit ?? shopUnit);
    setUnitReason(guess.reason);
    setFile({ name: f.name, grid: read.grid });
  }

  const upload = useMemo(() => (file ? toUploadRows(file.grid, mapping, { hasHeader }) : null), [file, mapping, hasHeader]);
  const body = upload ? { columns: upload.columns, rows: upload.rows, unit } : null;

  const preview = useQuery({
    queryKey: ['cut-list-preview', jobId, body],
    // Enabled only once a file is read.
    queryFn: () =>
      body ? call('POST /api/jobs/:id/cut-list/preview', { params: { id: jobId }, body }) : Promise.reject(new Error('Choose a file first.')),
    enabled: Boolean(body && body.rows.length),
    retry: false,
    staleTime: Infinity,
  });

  const importRows = useMutation({
    mutationFn: (mode: 'all' | 'valid-only') => {
      if (!body) throw new Error('Choose a file first.');
      return call('POST /api/jobs/:id/cut-list/import', { params: { id: jobId }, body: { ...body, mode } });
    },
    onSuccess: (res) => {
      qc.invalidateQueries({ queryKey: partsKey(jobId) });
      onImported(importSummary(res, file?.name ?? 'the file'));
    },
  });

  const bad = preview.data?.rows.filter((r): r is Extract<UploadRowResult, { ok: false }> => !r.ok) ?? [];
  const previewError =
    preview.error instanceof ApiError
      ? [preview.error.message, ...Object.values(preview.error.fields).flat()]
      : preview.error
        ? [preview.error.message]
        : [];
  const widest = file ? Math.max(...file.grid.map((r) => r.length)) : 0;

  return (
    <section aria-labelledby="upload-title" className="card mb-4 p-5">
      <div className="mb-3 flex items-center justify-between">
        <h3 id="upload-title" className="font-semibold">
          Upload a cut list
        </h3>
        <button type="button" className="btn-quiet" onClick={onClose}>
          Close
        </button>
      </div>
      <p className="mb-3 text-sm text-graphite-mute">
        CSV or Excel (.xlsx), up to {UPLOAD_LIMITS.maxFileBytes / 1024} KB, {UPLOAD_LIMITS.maxRows.toLocaleString('en-US')} rows and{' '}
        {UPLOAD_LIMITS.maxCellLength} characters a cell. Nothing is added until you import.{' '}
        <a href={`/templates/cut-list-${shopUnit === 'in' ? 'imperial' : 'metric'}.csv`} download>
          Download the template
        </a>
        .
      </p>
      <label className="field-label" htmlFor="cut-list-file">
        File
      </label>
      <input
        id="cut-list-file"
        type="file"
        accept=".csv,.txt,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
        onChange={(e) => choose(e.target.files?.[0])}
        className="text-sm"
      />
      {fileError && (
        <p role="alert" className="field-error">
          {fileError}
        </p>
      )}

      {file && upload && (
        <div className="mt-4 space-y-4">
          <div className="flex flex-wrap items-end gap-4 text-sm">
            <label className="flex items-center gap-2">
              <input type="checkbox" checked={hasHeader} onChange={(e) => setHasHeader(e.target.checked)} /> First row is a header
            </label>
            <div>
              <label htmlFor="upload-unit" className="field-label">
                Bare numbers are
              </label>
              <select id="upload-unit" className="field-input" value={unit} onChange={(e) => setUnit(e.target.value as LengthUnit)}>
                <option value="in">inches</option>
                <option value="mm">millimetres</option>
              </select>
            </div>
            <p className="max-w-md text-graphite-mute">{unitReason}</p>
          </div>

          <div className="overflow-x-auto">
            <table className="data-table" aria-label="Column mapping">
              <thead>
                <tr>
                  <th>Row</th>
                  {Array.from({ length: widest }, (_, i) => (
                    <th key={i}>
                      <select
                        aria-label={`Column ${i + 1} holds`}
                        className="rounded border border-paper-edge bg-white px-1 py-0.5 text-xs normal-case"
                        value={mapping[i] ?? ''}
                        onChange={(e) => setMapping((m) => setColumn(m, i, (e.target.value || null) as CutListField | null, widest))}
                      >
                        <option value="">(skip)</option>
                        {CUT_LIST_FIELDS.map((f) => (
                          <option key={f} value={f}>
                            {CUT_LIST_FIELD_LABELS[f]}
                          </option>
                        ))}
                      </select>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {file.grid.slice(0, PREVIEW_ROWS_SHOWN + 1).map((row, r) => (
                  <tr key={r} className={hasHeader && r === 0 ? 'text-graphite-mute italic' : undefined}>
                    <td className="text-xs text-graphite-mute">{r + 1}</td>
                    {Array.from({ length: widest }, (_, i) => (
                      <td key={i} className={mapping[i] ? '' : 'text-graphite-faint'}>
                        {row[i] ?? ''}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
            {file.grid.length > PREVIEW_ROWS_SHOWN + 1 && (
              <p className="mt-1 text-xs text-graphite-mute">…and {countOf(file.grid.length - PREVIEW_ROWS_SHOWN - 1, 'more row')}.</p>
            )}
          </div>

          <div aria-live="polite">
            {preview.isFetching && (
              <p role="status" className="text-sm text-graphite-mute">
                Checking every row…
              </p>
            )}
            {previewError.length > 0 && (
              <ul role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
                {previewError.map((m) => (
                  <li key={m}>{m}</li>
                ))}
              </ul>
            )}
            {preview.data && (
              <div className="space-y-3">
                <p className="text-sm">
                  <strong>{countOf(preview.data.validCount, 'row')}</strong> ready ·{' '}
                  <strong className={preview.data.invalidCount ? 'text-brick' : ''}>{countOf(preview.data.invalidCount, 'row')}</strong> with problems
                  {upload.blankRows > 0 && <> · {countOf(upload.blankRows, 'blank row')} left out</>}
                </p>
                {bad.length > 0 && (
                  <div className="rounded-md border border-brick/30 bg-brick-wash/50 p-3">
                    <h4 className="mb-1 text-sm font-semibold text-brick">Rows that cannot be imported</h4>
                    <ul aria-label="Rows with problems" className="space-y-1 text-sm">
                      {bad.map((row) => (
                        <li key={row.line}>
                          <span className="font-medium">Row {row.line}:</span> {row.problems.map((p) => p.message).join(' ')}
                        </li>
                      ))}
                    </ul>
                  </div>
                )}
                {preview.data.warnings.length > 0 && (
                  <div className="rounded-md border border-amber/30 bg-amber-wash/60 p-3">
                    <h4 className="mb-1 text-sm font-semibold text-amber">Not in the stock room (imported all the same)</h4>
                    <ul className="space-y-1 text-sm">
                      {preview.data.warnings.map((w) => (
                        <li key={w.line}>
                          <span className="font-medium">Row {w.line}:</span> {w.message}
                        </li>
                      ))}
                    </ul>
                  </div>
                )}
                {importRows.error && (
                  <p role="alert" className="field-error">
                    {importRows.error.message}
                  </p>
                )}
                <div className="flex flex-wrap gap-2">
                  {preview.data.invalidCount === 0 ? (
                    <button type="button" className="btn-accent" disabled={importRows.isPending} onClick={() => importRows.mutate('all')}>
                      Import {countOf(preview.data.validCount, 'row')}
                    </button>
                  ) : (
                    <button
                      type="button"
                      className="btn-accent"
                      disabled={importRows.isPending || preview.data.validCount === 0}
                      onClick={() => importRows.mutate('valid-only')}
                    >
                      {preview.data.validCount === 1 ? 'Import only the valid row' : `Import only the ${preview.data.validCount} valid rows`}
                    </button>
                  )}
                  <button type="button" className="btn-quiet" onClick={onClose}>
                    Cancel
                  </button>
                </div>
              </div>
            )}
          </div>
        </div>
      )}
    </section>
  );
}

/** Maps column `i` to `field`; a field already mapped elsewhere is taken from that column. */
function setColumn(mapping: (CutListField | null)[], i: number, field: CutListField | null, width: number) {
  const next = Array.from({ length: width }, (_, k) => (mapping[k] === field && field !== null ? null : (mapping[k] ?? null)));
  next[i] = field;
  return next;
}
