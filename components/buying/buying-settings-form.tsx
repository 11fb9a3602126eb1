'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ApiError, call } from '@/client/api';

export function BuyingSettingsForm({
  initial,
  timeZone,
}: {
  initial: { purchaseOrderDetails: string; lowStockDigestTime: string };
  timeZone: string;
}) {
  const router = useRouter();
  const [details, setDetails] = useState(initial.purchaseOrderDetails);
  const [on, setOn] = useState(initial.lowStockDigestTime !== '');
  const [time, setTime] = useState(initial.lowStockDigestTime || '07:00');
  const save = useMutation({
    mutationFn: () => call('PATCH /api/settings/buying', { body: { purchaseOrderDetails: details, lowStockDigestTime: on ? time : '' } }),
    onSuccess: () => router.refresh(),
  });
  const fields = save.error instanceof ApiError ? save.error.fields : {};
  return (
    <form
      className="card grid gap-3 p-4"
      aria-label="Buying settings"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      <h2 className="text-base">Buying settings</h2>
      <div>
        <label htmlFor="po-details" className="field-label">
          Printed under the shop’s name on purchase orders
        </label>
        <textarea
          id="po-details"
          rows={3}
          className="field-input"
          value={details}
          onChange={(e) => setDetails(e.target.value)}
          placeholder="Address, phone, delivery hours"
        />
        {fields.purchaseOrderDetails && <p className="field-error">{fields.purchaseOrderDetails[0]}</p>}
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={on} onChange={(e) => setOn(e.target.checked)} /> Mail the owners a low-stock digest each day at
        </label>
        <input
          aria-label="Digest time"
          type="time"
          className="field-input w-32"
          value={time}
          disabled={!on}
          onChange={(e) => setTime(e.target.value)}
        />
        <span className="text-sm text-graphite-mute">shop time ({timeZone})</span>
      </div>
      {fields.lowStockDigestTime && <p className="field-error">{fields.lowStockDigestTime[0]}</p>}
      <p className="text-xs text-graphite-mute">
        It lists the sizes at or below their low mark that no open order brings, and is not sent on a day nothing is low.
      </p>
      <div className="flex items-center gap-3">
        <button type="submit" className="btn-quiet" disabled={save.isPending}>
          Save buying settings
        </button>
        {save.isSuccess && (
          <span role="status" className="text-sm text-sage">
            Saved.
          </span>
        )}
        {save.error && !Object.keys(fields).length && (
          <span role="alert" className="field-error">
            {save.error.message}
          </span>
        )}
      </div>
    </form>
  );
}
