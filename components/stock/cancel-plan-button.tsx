'use client';

import { useState } from 'react';
import { ActionError } from '@/components/ui/field';
import { useStockAction } from './use-stock-action';

/** Cancel a released plan after a second click: every sheet, board and offcut it reserved goes back to free stock. */
export function CancelPlanButton({ planId }: { planId: string }) {
  const [confirming, setConfirming] = useState(false);
  const cancel = useStockAction('POST /api/plans/:id/cancel', { params: { id: planId }, onDone: () => setConfirming(false) });
  return (
    <div className="space-y-2">
      {confirming ? (
        <div className="flex gap-2">
          <button type="button" className="btn-danger" disabled={cancel.isPending} onClick={() => cancel.mutate(undefined)}>
            Cancel the plan and free its stock
          </button>
          <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>
            Keep it
          </button>
        </div>
      ) : (
        <button type="button" className="btn-quiet" onClick={() => setConfirming(true)}>
          Cancel plan…
        </button>
      )}
      <ActionError error={cancel.error} />
    </div>
  );
}
