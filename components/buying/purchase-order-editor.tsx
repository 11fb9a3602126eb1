'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { ApiError, call } from '@/client/api';
import { formatMoney, toMinorUnits, minorPerMajor } from '@/lib/costing/money';

export interface EditorSize {
  id: string;
  description: string;
  supplier: string;
  kind: 'sheet' | 'board';
  costCents: number;
  /** Boards: board feet of one board (the cost is per board foot); null for sheets. */
  boardFeetEach: number | null;
}

export interface EditorLine {
  id: string;
  stockItemId: string;
  quantity: number;
  unitCostCents: number;
  received: number;
  totalCents: number;
}

export interface EditorOrder {
  id: string;
  title: string;
  status: 'draft' | 'sent' | 'part-received' | 'received' | 'cancelled';
  supplier: string;
  supplierEmail: string;
  note: string;
  currency: string;
  lines: EditorLine[];
  totalCents: number;
}

interface Row {
  stockItemId: string;
  qtyText: string;
  costText: string;
}

const each = (size: EditorSize | undefined, unitCents: number) =>
  size && size.kind === 'board' && size.boardFeetEach !== null ? Math.round(unitCents * size.boardFeetEach) : unitCents;

/** A purchase order: its lines editable while a draft, then sent, received against, or cancelled. */
export function PurchaseOrderEditor({
  order,
  sizes,
  canWrite,
  canReceive,
}: {
  order: EditorOrder;
  sizes: EditorSize[];
  canWrite: boolean;
  canReceive: boolean;
}) {
  const router = useRouter();
  const money = (m: number) => formatMoney(m, order.currency);
  const major = (m: number) => (m / minorPerMajor(order.currency)).toFixed(Math.log10(minorPerMajor(order.currency)));
  const bySize = useMemo(() => new Map(sizes.map((s) => [s.id, s])), [sizes]);
  const editable = canWrite && order.status === 'draft';
  const [supplier, setSupplier] = useState(order.supplier);
  const [email, setEmail] = useState(order.supplierEmail);
  const [note, setNote] = useState(order.note);
  const [rows, setRows] = useState<Row[]>(
    order.lines.map((l) => ({ stockItemId: l.stockItemId, qtyText: String(l.quantity), costText: major(l.unitCostCents) })),
  );
  const [receiving, setReceiving] = useState<Record<string, string>>({});
  const [updateCosts, setUpdateCosts] = useState(false);

  const parsed = rows.map((r) => {
    const q = Number(r.qtyText);
    const c = Number(r.costText);
    const okQ = /^\s*\d+\s*$/.test(r.qtyText) && q > 0;
    let cents: number | null = null;
    try {
      cents = r.costText.trim() !== '' && Number.isFinite(c) && c >= 0 ? toMinorUnits(c, order.currency) : null;
    } catch {
      cents = null;
    }
    return { ...r, quantity: okQ ? q : null, unitCostCents: cents };
  });
  const rowsOk = parsed.every((p) => p.quantity !== null && p.unitCostCents !== null);
  const draftTotal = parsed.reduce((n, p) => n + (p.quantity ?? 0) * each(bySize.get(p.stockItemId), p.unitCostCents ?? 0), 0);
  const dirty =
    supplier !== order.supplier ||
    email !== order.supplierEmail ||
    note !== order.note ||
    JSON.stringify(parsed.map((p) => [p.stockItemId, p.quantity, p.unitCostCents])) !==
      JSON.stringify(order.lines.map((l) => [l.stockItemId, l.quantity, l.unitCostCents]));

  const patchBody = () => ({
    supplier,
    supplierEmail: email.trim(),
    note,
    // Save and Send are enabled only when every row reads (rowsOk).
    lines: parsed.map(({ stockItemId, quantity, unitCostCents }) => {
      if (quantity === null || unitCostCents === null) throw new Error('Every line needs a whole quantity and a cost.');
      return { stockItemId, quantity, unitCostCents };
    }),
  });
  const save = useMutation({
    mutationFn: () => call('PATCH /api/purchase-orders/:id', { params: { id: order.id }, body: patchBody() }),
    onSuccess: () => router.refresh(),
  });
  const send = useMutation({
    mutationFn: async () => {
      if (dirty) await call('PATCH /api/purchase-orders/:id', { params: { id: order.id }, body: patchBody() });
      return call('POST /api/purchase-orders/:id/send', { params: { id: order.id }, body: { supplierEmail: email.trim() } });
    },
    onSuccess: () => router.refresh(),
  });
  const cancel = useMutation({
    mutationFn: () => call('POST /api/purchase-orders/:id/cancel', { params: { id: order.id } }),
    onSuccess: () => router.refresh(),
  });
  const receive = useMutation({
    mutationFn: () =>
      call('POST /api/purchase-orders/:id/receive', {
        params: { id: order.id },
        body: {
          updateCosts,
          lines: order.lines.filter((l) => (receiving[l.id] ?? '').trim() !== '').map((l) => ({ lineId: l.id, quantity: Number(receiving[l.id]) })),
        },
      }),
    onSuccess: () => {
      setReceiving({});
      router.refresh();
    },
  });
  const error = [save.error, send.error, cancel.error, receive.error].find(Boolean) as Error | undefined;
  const fields = error instanceof ApiError ? error.fields : {};
  const update = (i: number, patch: Partial<Row>) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const onOrder = new Set(rows.map((r) => r.stockItemId));
  const addable = sizes.filter((s) => !onOrder.has(s.id));
  const sameSupplier = addable.filter((s) => s.supplier.trim().toLowerCase() === supplier.trim().toLowerCase());
  const others = addable.filter((s) => !sameSupplier.includes(s));
  const receivable = canReceive && (order.status === 'sent' || order.status === 'part-received');
  const receiveRows = order.lines.filter((l) => (receiving[l.id] ?? '').trim() !== '');
  const receiveOk = receiveRows.length > 0 && receiveRows.every((l) => /^\s*\d+\s*$/.test(receiving[l.id]));

  // A phone shows a finished order's lines without the unit cost, so each line fits; the PDF and wider screens have it.
  const unitCostCell = editable || receivable ? '' : 'hidden sm:table-cell';

  return (
    <div className="grid gap-4">
      {editable ? (
        <fieldset className="card grid gap-3 p-4 sm:grid-cols-2">
          <legend className="sr-only">Supplier</legend>
          <div>
            <label htmlFor="po-supplier" className="field-label">
              Supplier
            </label>
            <input id="po-supplier" className="field-input" value={supplier} onChange={(e) => setSupplier(e.target.value)} />
            {fields.supplier && <p className="field-error">{fields.supplier[0]}</p>}
          </div>
          <div>
            <label htmlFor="po-email" className="field-label">
              Supplier’s e-mail
            </label>
            <input
              id="po-email"
              type="email"
              className="field-input"
              value={email}
              onChange={(e) => setEmail(e.target.value)}
              placeholder={editable ? 'orders@supplier.example' : ''}
            />
            {fields.supplierEmail && <p className="field-error">{fields.supplierEmail[0]}</p>}
          </div>
          <div className="sm:col-span-2">
            <label htmlFor="po-note" className="field-label">
              Note for the supplier
            </label>
            <textarea
              id="po-note"
              rows={2}
              className="field-input"
              value={note}
              onChange={(e) => setNote(e.target.value)}
              placeholder={editable ? 'Delivery by Friday, please' : ''}
            />
          </div>
        </fieldset>
      ) : (
        // A sent, received or cancelled order's supplier details are what went out: shown, not offered for editing.
        <dl className="card grid gap-3 p-4 sm:grid-cols-2">
          <div>
            <dt className="field-label">Supplier</dt>
            <dd>{order.supplier}</dd>
          </div>
          <div>
            <dt className="field-label">Supplier’s e-mail</dt>
            <dd className="break-all">{order.supplierEmail || '—'}</dd>
          </div>
          {order.note && (
            <div className="sm:col-span-2">
              <dt className="field-label">Note for the supplier</dt>
              <dd className="whitespace-pre-line">{order.note}</dd>
            </div>
          )}
        </dl>
      )}

      <div className="card overflow-x-auto">
        <table className={`data-table ${editable || receivable ? 'min-w-[40rem]' : ''}`} aria-label="Order lines">
          <thead>
            <tr>
              <th>Stock size</th>
              <th className="num">Qty</th>
              <th className={`num ${unitCostCell}`}>Unit cost</th>
              <th className="num">Amount</th>
              {order.status !== 'draft' && <th className="num">Received</th>}
              {receivable && <th className="num">Receiving now</th>}
              {editable && (
                <th>
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {editable
              ? parsed.map((r, i) => {
                  const s = bySize.get(r.stockItemId);
                  return (
                    <tr key={r.stockItemId}>
                      <td className="min-w-[16rem]">
                        {s?.description ?? 'A size no longer in the stock room'}
                        {s && s.supplier.trim().toLowerCase() !== supplier.trim().toLowerCase() && (
                          <span className="block text-xs text-graphite-mute">Usually from {s.supplier || 'no supplier named'}</span>
                        )}
                      </td>
                      <td className="num">
                        <input
                          aria-label={`Line ${i + 1} quantity`}
                          inputMode="numeric"
                          className="field-input w-20 text-right font-mono"
                          value={r.qtyText}
                          onChange={(e) => update(i, { qtyText: e.target.value })}
                        />
                        {r.quantity === null && <span className="field-error block text-left">A whole number, 1 or more</span>}
                      </td>
                      <td className="num">
                        <span className="inline-flex items-center gap-1">
                          <input
                            aria-label={`Line ${i + 1} unit cost`}
                            inputMode="decimal"
                            className="field-input w-24 text-right font-mono"
                            value={r.costText}
                            onChange={(e) => update(i, { costText: e.target.value })}
                          />
                          <span className="text-xs text-graphite-mute">/ {s?.kind === 'board' ? 'bd ft' : 'sheet'}</span>
                        </span>
                        {r.unitCostCents === null && <span className="field-error block text-left">An amount such as 68.50</span>}
                      </td>
                      <td className="num">{r.quantity !== null && r.unitCostCents !== null ? money(r.quantity * each(s, r.unitCostCents)) : '—'}</td>
                      <td>
                        <button
                          type="button"
                          className="btn-quiet"
                          aria-label={`Remove line ${i + 1}`}
                          onClick={() => setRows((rs) => rs.filter((_, j) => j !== i))}
                        >
                          Remove
                        </button>
                      </td>
                    </tr>
                  );
                })
              : order.lines.map((l, i) => {
                  const s = bySize.get(l.stockItemId);
                  const open = l.quantity - l.received;
                  return (
                    <tr key={l.id}>
                      <td className={receivable ? 'min-w-[16rem]' : ''}>{s?.description}</td>
                      <td className="num">{l.quantity}</td>
                      <td className={`num ${unitCostCell}`}>
                        {money(l.unitCostCents)} <span className="text-xs text-graphite-mute">/ {s?.kind === 'board' ? 'bd ft' : 'sheet'}</span>
                      </td>
                      <td className="num">{money(l.totalCents)}</td>
                      {order.status !== 'draft' && (
                        <td className="num">
                          {l.received} of {l.quantity}
                        </td>
                      )}
                      {receivable && (
                        <td className="num">
                          {open > 0 ? (
                            <input
                              aria-label={`Line ${i + 1} pieces received now`}
                              inputMode="numeric"
                              className="field-input w-20 text-right font-mono"
                              placeholder="0"
                              value={receiving[l.id] ?? ''}
                              onChange={(e) => setReceiving((r) => ({ ...r, [l.id]: e.target.value }))}
                            />
                          ) : (
                            <span className="text-xs text-sage">All in</span>
                          )}
                        </td>
                      )}
                    </tr>
                  );
                })}
            {(editable ? parsed.length : order.lines.length) === 0 && (
              <tr>
                <td colSpan={6} className="text-sm text-graphite-mute">
                  No lines yet: add the sizes to order below.
                </td>
              </tr>
            )}
          </tbody>
          <tfoot>
            <tr>
              <td className="font-medium">Total</td>
              <td />
              <td className={unitCostCell} />
              <td className="num font-semibold" data-testid="po-total">
                {money(editable ? draftTotal : order.totalCents)}
              </td>
            </tr>
          </tfoot>
        </table>
        {editable && (
          <div className="flex flex-wrap items-center gap-2 border-t border-paper-edge px-3 py-2">
            <label htmlFor="po-add-line" className="text-sm text-graphite-mute">
              Add a size
            </label>
            <select
              id="po-add-line"
              className="field-input w-auto max-w-full"
              value=""
              onChange={(e) => {
                const s = bySize.get(e.target.value);
                if (s) setRows((rs) => [...rs, { stockItemId: s.id, qtyText: '1', costText: major(s.costCents) }]);
              }}
            >
              <option value="">Choose a stock size…</option>
              {sameSupplier.length > 0 && (
                <optgroup label={`From ${supplier || 'this supplier'}`}>
                  {sameSupplier.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.description}
                    </option>
                  ))}
                </optgroup>
              )}
              {others.length > 0 && (
                <optgroup label="Other sizes">
                  {others.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.description}
                      {s.supplier ? ` (${s.supplier})` : ''}
                    </option>
                  ))}
                </optgroup>
              )}
            </select>
          </div>
        )}
      </div>

      {error && (
        <p role="alert" className="field-error">
          {error.message}
        </p>
      )}

      {editable && (
        <div className="flex flex-wrap items-center gap-2">
          <button type="button" className="btn-quiet" disabled={!dirty || !rowsOk || save.isPending} onClick={() => save.mutate()}>
            {save.isPending ? 'Saving…' : 'Save draft'}
          </button>
          <button
            type="button"
            className="btn-accent"
            disabled={!rowsOk || rows.length === 0 || !email.trim() || send.isPending}
            onClick={() => send.mutate()}
          >
            {send.isPending ? 'Sending…' : 'Send to supplier'}
          </button>
          {!email.trim() && <span className="text-sm text-graphite-mute">Add the supplier’s e-mail to send it.</span>}
          {save.isSuccess && !dirty && (
            <span role="status" className="text-sm text-sage">
              Saved.
            </span>
          )}
        </div>
      )}

      {receivable && (
        <form
          className="card grid gap-3 p-4"
          aria-label="Receive against this order"
          onSubmit={(e) => {
            e.preventDefault();
            receive.mutate();
          }}
        >
          <h2 className="text-base">Receive a delivery</h2>
          <p className="text-sm text-graphite-mute">
            Type how many pieces of each line came in (above). They go onto the stock room’s counts with a receipt naming {order.title}.
          </p>
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              className="btn-quiet"
              onClick={() =>
                setReceiving(
                  Object.fromEntries(order.lines.filter((l) => l.quantity > l.received).map((l) => [l.id, String(l.quantity - l.received)])),
                )
              }
            >
              Everything still to come
            </button>
          </div>
          <label className="flex items-start gap-2 text-sm">
            <input type="checkbox" className="mt-1" checked={updateCosts} onChange={(e) => setUpdateCosts(e.target.checked)} />
            <span>Update each received size’s cost in the stock room to this order’s price</span>
          </label>
          <div>
            <button type="submit" className="btn-accent" disabled={!receiveOk || receive.isPending}>
              {receive.isPending ? 'Receiving…' : 'Receive'}
            </button>
          </div>
        </form>
      )}

      {canWrite && (order.status === 'draft' || order.status === 'sent') && (
        <div>
          <button
            type="button"
            className="btn-danger"
            disabled={cancel.isPending}
            onClick={() => {
              if (window.confirm(`Cancel ${order.title}? It stays in the list as cancelled.`)) cancel.mutate();
            }}
          >
            Cancel this order
          </button>
        </div>
      )}
    </div>
  );
}
