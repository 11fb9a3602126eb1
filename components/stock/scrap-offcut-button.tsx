'use client';

import { useState } from 'react';
import { ActionError } from '@/components/ui/field';
import { useStockAction } from './use-stock-action';

/** Takes an available offcut off the rack for good, with a reason, after a second click. */
export function ScrapOffcutButton({ id, label }: { id: string; label: string }) {
  const [confirming, setConfirming] = useState(false);
  const [reason, setReason] = useState('');
  const action = useStockAction('POST /api/offcuts/:id/scrap', { params: { id }, onDone: () => setConfirming(false) });
  if (!confirming) {
    return (
      <button type="button" className="btn-danger px-2 py-1 text-xs" onClick={() => setConfirming(true)} aria-label={`Scrap ${label}`}>
        Scrap
      </button>
    );
  }
  return (
    <form
      className="flex flex-col items-end gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        action.mutate({ reason });
      }}
      aria-label={`Scrap ${label}`}
    >
      <input
        className="field-input w-44 py-1 text-xs"
        placeholder="Why (split, warped…)"
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        aria-label="Reason for scrapping"
        autoFocus
      />
      <div className="flex gap-1">
        <button type="submit" className="btn-danger px-2 py-1 text-xs" disabled={action.isPending}>
          Scrap it
        </button>
        <button type="button" className="btn-quiet px-2 py-1 text-xs" onClick={() => setConfirming(false)}>
          Keep
        </button>
      </div>
      <ActionError error={action.error} />
    </form>
  );
}
