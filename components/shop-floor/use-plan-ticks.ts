'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '@/client/api';
import type { PlanTicks, StepRef } from '@/shared/wire/plans';

export type Toggle = StepRef & { done: boolean };

/**
 * A plan's ticked steps, refreshed every few seconds (several cutters may work one plan), and the tick itself: shown
 * at once, saved, and rolled back if the server refuses it. A refresh that left before a tick was saved never paints
 * over it.
 */
export function usePlanTicks(planId: string, initial: PlanTicks) {
  const key = ['saw-steps', planId];
  const client = useQueryClient();
  const ticksQuery = useQuery({
    queryKey: key,
    queryFn: () => call('GET /api/plans/:id/steps', { params: { id: planId } }),
    initialData: initial,
    refetchInterval: 10_000,
  });

  const toggle = useMutation({
    mutationFn: ({ piece, step, done }: Toggle) =>
      call(done ? 'POST /api/plans/:id/steps' : 'DELETE /api/plans/:id/steps', { params: { id: planId }, body: { piece, step } }),
    onMutate: async ({ piece, step, done }) => {
      await client.cancelQueries({ queryKey: key });
      const before = client.getQueryData<PlanTicks>(key);
      client.setQueryData<PlanTicks>(
        key,
        (old) =>
          old && {
            ...old,
            ticks: done
              ? [
                  ...old.ticks.filter((t) => !(t.piece === piece && t.step === step)),
                  { piece, step, doneAt: new Date().toISOString(), doneBy: 'You' },
                ]
              : old.ticks.filter((t) => !(t.piece === piece && t.step === step)),
          },
      );
      return { before };
    },
    onError: (_e, _v, ctx) => ctx?.before && client.setQueryData(key, ctx.before),
    onSuccess: async (fresh) => {
      await client.cancelQueries({ queryKey: key });
      client.setQueryData(key, fresh);
    },
  });

  return { ticks: ticksQuery.data, refreshFailed: ticksQuery.isError, toggle };
}
