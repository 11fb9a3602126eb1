'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '@/client/api';
import type { PartInput, PartPatch } from '@/shared/schemas/part';
import type { ListedPart } from '@/shared/wire/jobs';

export const partsKey = (jobId: string) => ['parts', jobId] as const;

/** Ids for rows shown before the server has answered: `pending-1`, `pending-2`, … */
export const PENDING_ROW = 'pending-';
let pendingRows = 0;

export function useParts(jobId: string) {
  return useQuery({ queryKey: partsKey(jobId), queryFn: () => call('GET /api/jobs/:id/parts', { params: { id: jobId } }) });
}

export function useMaterials() {
  return useQuery({ queryKey: ['materials'], queryFn: () => call('GET /api/materials'), staleTime: 60_000 });
}

/**
 * Row changes go to the server at once and show at once: the list is updated optimistically and put back as it was
 * when the server refuses (the caller shows the refusal on the cell).
 */
export function usePartMutations(jobId: string) {
  const qc = useQueryClient();
  const key = partsKey(jobId);
  const snapshot = async () => {
    await qc.cancelQueries({ queryKey: key });
    return { previous: qc.getQueryData<ListedPart[]>(key) };
  };
  const rollback = (_e: unknown, _v: unknown, context: { previous?: ListedPart[] } | undefined) => qc.setQueryData(key, context?.previous);
  const settle = () => qc.invalidateQueries({ queryKey: key });

  const update = useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: PartPatch }) =>
      call('PATCH /api/jobs/:id/parts/:partId', { params: { id: jobId, partId: id }, body: patch }),
    onMutate: async ({ id, patch }) => {
      const context = await snapshot();
      qc.setQueryData<ListedPart[]>(key, (list) => list?.map((p) => (p.id === id ? { ...p, ...patch } : p)));
      return context;
    },
    onError: rollback,
    onSettled: settle,
  });

  const add = useMutation({
    mutationFn: (input: PartInput) => call('POST /api/jobs/:id/parts', { params: { id: jobId }, body: input }),
    onMutate: async (input) => {
      const context = await snapshot();
      const temp: ListedPart = {
        ...input,
        id: `${PENDING_ROW}${++pendingRows}`,
        jobId,
        drawerScheduleId: null,
        role: null,
        machining: [],
        sort: input.sort ?? Number.MAX_SAFE_INTEGER,
        schedule: null,
      };
      // A row put back by undo shows at its old place at once; a new row at the end.
      qc.setQueryData<ListedPart[]>(key, (list) => [...(list ?? []), temp].sort((a, b) => a.sort - b.sort));
      return context;
    },
    onError: rollback,
    onSettled: settle,
  });

  const remove = useMutation({
    mutationFn: (id: string) => call('DELETE /api/jobs/:id/parts/:partId', { params: { id: jobId, partId: id } }),
    onMutate: async (id) => {
      const context = await snapshot();
      qc.setQueryData<ListedPart[]>(key, (list) => list?.filter((p) => p.id !== id));
      return context;
    },
    onError: rollback,
    onSettled: settle,
  });

  return { update, add, remove };
}
