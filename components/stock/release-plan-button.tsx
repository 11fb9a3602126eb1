'use client';

import Link from 'next/link';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { ApiError, call } from '@/client/api';
import type { StockShortage } from '@/shared/wire/plans';

/**
 * Release a draft plan: its stock is reserved all at once. When a piece is gone, nothing is reserved and the
 * refusal lists each piece with a way back to re-nest against what is left.
 */
export function ReleasePlanButton({ planId, describe }: { planId: string; describe?: Record<string, string> }) {
  const router = useRouter();
  const release = useMutation({
    mutationFn: async () => {
      try {
        await call('POST /api/plans/:id/release', { params: { id: planId } });
        return { refused: null };
      } catch (e) {
        // A 409 that names the pieces gone is an answer to show, not an error.
        if (e instanceof ApiError && e.status === 409 && e.details.missing) return { refused: e.details as unknown as StockShortage };
        throw e;
      }
    },
    onSuccess: (r) => {
      if (!r.refused) router.refresh();
    },
  });
  const refused = release.data?.refused;
  return (
    <div className="space-y-2">
      <button type="button" className="btn-accent" disabled={release.isPending} onClick={() => release.mutate()}>
        {release.isPending ? 'Reserving stock…' : 'Release plan to the saw'}
      </button>
      {release.isError && (
        <p className="field-error" role="alert">
          {release.error.message}
        </p>
      )}
      {refused && (
        <div className="rounded-md border border-brick/40 bg-brick-wash p-3 text-sm" role="alert">
          <p className="font-medium text-brick">{refused.error}</p>
          <ul className="my-2 ml-4 list-disc">
            {refused.missing.map((m) => (
              <li key={m.stockId}>
                {describe?.[m.stockId] ?? m.material}: needs {m.needed}, {m.free} free
              </li>
            ))}
          </ul>
          <Link href={refused.renest} className="btn-quiet">
            Nest again against what is left
          </Link>
        </div>
      )}
    </div>
  );
}
