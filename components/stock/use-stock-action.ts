'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { call, type Answer, type CallInit } from '@/client/api';
import type { ApiBody, ApiRoute, PathParams } from '@/shared/wire/api';

/** A stock-room change: a call to the API, then re-render the server page so counts and history are fresh. */
export function useStockAction<K extends ApiRoute>(
  key: K,
  { params, onDone }: { params?: PathParams<K>; onDone?: (result: Answer<K>) => void } = {},
) {
  const router = useRouter();
  return useMutation({
    mutationFn: (body: ApiBody<K>) => call(key, ...([{ params, body }] as [CallInit<K>])),
    onSuccess: (result) => {
      onDone?.(result);
      router.refresh();
    },
  });
}
