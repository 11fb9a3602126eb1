'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { api } from '@/client/api';

/** A stock-room change: POST/PATCH to the API, then re-render the server page so counts and history are fresh. */
export function useStockAction<T = unknown>(url: string, method: 'POST' | 'PATCH' = 'POST', onDone?: (result: T) => void) {
  const router = useRouter();
  return useMutation({
    mutationFn: (body: unknown) => api<T>(url, { method, body }),
    onSuccess: (result) => {
      onDone?.(result);
      router.refresh();
    },
  });
}
